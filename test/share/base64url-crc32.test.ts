import { describe, expect, it } from 'vitest';
import { fromBase64url, toBase64url } from '../../src/share/base64url';
import { crc32 } from '../../src/share/crc32';
import { seeded } from '../bench/timing';

const ascii = (s: string) => new TextEncoder().encode(s);

describe('base64url', () => {
  it('matches the RFC 4648 §10 test vectors, without padding', () => {
    // RFC 4648 §10: "" "Zg==" "Zm8=" "Zm9v" "Zm9vYg==" "Zm9vYmE=" "Zm9vYmFy" (padding dropped, §5 alphabet).
    const vectors: [string, string][] = [['', ''], ['f', 'Zg'], ['fo', 'Zm8'], ['foo', 'Zm9v'], ['foob', 'Zm9vYg'], ['fooba', 'Zm9vYmE'], ['foobar', 'Zm9vYmFy']];
    for (const [plain, enc] of vectors) {
      expect(toBase64url(ascii(plain))).toBe(enc);
      expect(fromBase64url(enc)).toEqual({ ok: true, bytes: ascii(plain), canonical: true });
    }
  });

  it('uses "-" and "_" where standard base64 has "+" and "/"', () => {
    expect(toBase64url(new Uint8Array([0xfb, 0xff]))).toBe('-_8');
  });

  it('round-trips random bytes of every length up to 64 (seeded) and agrees with Node\'s encoder', () => {
    const rnd = seeded(7);
    for (let n = 0; n <= 64; n++) {
      const b = Uint8Array.from({ length: n }, () => Math.floor(rnd() * 256));
      const enc = toBase64url(b);
      expect(enc).toBe(Buffer.from(b).toString('base64url'));
      expect(fromBase64url(enc)).toEqual({ ok: true, bytes: b, canonical: true });
    }
  });

  it('refuses characters outside the alphabet and impossible lengths, and flags altered padding bits', () => {
    expect(fromBase64url('Zm9v+g')).toEqual({ ok: false, reason: 'bad-char' });
    expect(fromBase64url('Zm9v Yg')).toEqual({ ok: false, reason: 'bad-char' });
    expect(fromBase64url('Zm9vé')).toEqual({ ok: false, reason: 'bad-char' });
    expect(fromBase64url('Zm9vY')).toEqual({ ok: false, reason: 'incomplete' });
    // "Zh" decodes to "f" too, but only "Zg" is canonical: flagged so an altered last character cannot slip through.
    expect(fromBase64url('Zh')).toEqual({ ok: true, bytes: ascii('f'), canonical: false });
  });
});

describe('crc32', () => {
  it('gives the published check value for "123456789"', () => {
    // Greg Cook, Catalogue of parametrised CRC algorithms, CRC-32/ISO-HDLC: check = 0xCBF43926.
    expect(crc32(ascii('123456789'))).toBe(0xcbf43926);
  });
  it('is 0 for no bytes', () => {
    // Classical: init 0xFFFFFFFF xor final 0xFFFFFFFF with no data.
    expect(crc32(new Uint8Array(0))).toBe(0);
  });
  it('changes when any single bit of a message changes', () => {
    const m = ascii('Pile B7 — east berth, 610 mm');
    const base = crc32(m);
    for (let i = 0; i < m.length * 8; i++) {
      const f = m.slice();
      f[i >> 3] ^= 1 << (i & 7);
      expect(crc32(f)).not.toBe(base);
    }
  });
});
