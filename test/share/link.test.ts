import { afterEach, describe, expect, it, vi } from 'vitest';
import { NEWER_VERSION_MESSAGE, type Case } from '../../src/case';
import { decodeCaseLink, decodeCasePayload, encodeCaseLink, encodeCasePayload, LINK_MESSAGES, linkView } from '../../src/share';
import { framed } from './frame';
import { deflateRaw } from '../../src/share/compression';
import { caseToWire } from '../../src/share/wire';
import { baffleCase, demoCase } from '../case/fixtures';
import { CASE_LIMITS } from '../../src/case';
import { seeded } from '../bench/timing';

const utf8 = (s: string) => new TextEncoder().encode(s);
const jsonPayload = (value: unknown) => framed('j', utf8(JSON.stringify(value)));

afterEach(() => vi.unstubAllGlobals());

describe('case links round trip', () => {
  it('the demo case comes back as it went, less the key result', async () => {
    const link = await encodeCaseLink(demoCase(), 'https://wetmode.example/app/');
    expect(link.startsWith('https://wetmode.example/app/#/open/z')).toBe(true);
    expect(await decodeCaseLink(link)).toEqual({ ok: true, value: linkView(demoCase()) });
  });

  it('keeps the id, so a received case can be recognised as one already saved', async () => {
    const r = await decodeCasePayload(await encodeCasePayload(demoCase()));
    expect(r.ok && r.value.id).toBe(demoCase().id);
  });

  it('drops any fragment already on the base address', async () => {
    const link = await encodeCaseLink(baffleCase(), 'https://wetmode.example/#/cases');
    expect(link.split('#').length).toBe(2);
    expect(link).toMatch(/^https:\/\/wetmode\.example\/#\/open\/[zj][A-Za-z0-9_-]+$/);
  });

  it('the plain fallback (no compression) decodes to the same case', async () => {
    const plain = await encodeCasePayload(demoCase(), { compress: false });
    expect(plain[0]).toBe('j');
    expect(await decodeCasePayload(plain)).toEqual({ ok: true, value: linkView(demoCase()) });
  });

  it('encodes without compression where CompressionStream is missing', async () => {
    vi.stubGlobal('CompressionStream', undefined);
    const p = await encodeCasePayload(demoCase());
    expect(p[0]).toBe('j');
    vi.unstubAllGlobals();
    expect(await decodeCasePayload(p)).toEqual({ ok: true, value: linkView(demoCase()) });
  });

  it('compresses the demo case to a shorter payload than the plain form', async () => {
    const z = await encodeCasePayload(demoCase());
    const j = await encodeCasePayload(demoCase(), { compress: false });
    expect(z[0]).toBe('z');
    expect(z.length).toBeLessThan(j.length);
  });

  it('the demo case link fits in a text message (under 600 characters with a short address)', async () => {
    const link = await encodeCaseLink(demoCase(), 'https://wetmode.example/');
    // Target from the issue: short enough for a text message; measured figure is printed by `npm run bench`.
    expect(link.length).toBeLessThan(600);
  });

  it('carries markup, quotes, emoji and line breaks in text as the same plain strings', async () => {
    const c: Case = { ...demoCase(), name: '<img src=x onerror=alert(1)> "B7" 🌊', note: 'line 1\nline 2\t</textarea>' };
    const r = await decodeCasePayload(await encodeCasePayload(c));
    expect(r.ok && [r.value.name, r.value.note]).toEqual([c.name, c.note]);
  });

  it('tolerates white space inserted by mail or chat apps that wrap long links', async () => {
    const p = await encodeCasePayload(demoCase());
    const wrapped = `${p.slice(0, 70)}\n ${p.slice(70, 140)}\r\n${p.slice(140)} `;
    expect(await decodeCasePayload(wrapped)).toEqual({ ok: true, value: linkView(demoCase()) });
  });

  it('the largest valid case, in incompressible three-byte characters, still makes a link that decodes', async () => {
    // Worst case for the payload limit: every text at its limit, random CJK (3 UTF-8 bytes each, deflate gains little).
    const rnd = seeded(3);
    const text = (n: number) => Array.from({ length: n }, () => String.fromCharCode(0x4e00 + Math.floor(rnd() * 20000))).join('');
    const values = (p: string) =>
      Object.fromEntries(Array.from({ length: CASE_LIMITS.fields }, (_, i) => [`${p}${i}`.padEnd(CASE_LIMITS.fieldNameChars, 'q'), text(CASE_LIMITS.fieldValueChars)]));
    const c: Case = { ...demoCase(), name: text(CASE_LIMITS.nameChars), tag: text(CASE_LIMITS.tagChars), note: text(CASE_LIMITS.noteChars), inputs: values('i'), excitation: values('e') };
    for (const compress of [true, false]) {
      const p = await encodeCasePayload(c, { compress });
      expect(await decodeCasePayload(p)).toEqual({ ok: true, value: linkView(c) });
    }
  });

  it('refuses to encode a case that does not pass parseCase', async () => {
    await expect(encodeCasePayload({ ...demoCase(), kind: 'tower' } as unknown as Case)).rejects.toThrow(
      'encodeCasePayload: the case is not valid: kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "tower"',
    );
  });
});

describe('broken links get a clear message and no case', () => {
  it('an empty payload', async () => {
    expect(await decodeCasePayload('')).toEqual({ ok: false, message: LINK_MESSAGES.empty });
    expect(await decodeCaseLink('https://wetmode.example/#/open/')).toEqual({ ok: false, message: LINK_MESSAGES.empty });
  });

  it('a link cut off at every possible length', async () => {
    const p = await encodeCasePayload(demoCase());
    for (let n = 1; n < p.length; n++) {
      const r = await decodeCasePayload(p.slice(0, n));
      expect(r, `cut at ${n}`).toEqual({ ok: false, message: LINK_MESSAGES.incomplete });
    }
  });

  it('a character that does not belong in a link', async () => {
    const p = await encodeCasePayload(demoCase());
    expect(await decodeCasePayload(`${p.slice(0, 20)}+${p.slice(21)}`)).toEqual({ ok: false, message: LINK_MESSAGES.badChars });
    expect(await decodeCasePayload(`${p}).`)).toEqual({ ok: false, message: LINK_MESSAGES.badChars });
  });

  it('an altered character anywhere after the format letter', async () => {
    const p = await encodeCasePayload(demoCase());
    for (let i = 1; i < p.length; i++) {
      const swapped = p[i] === 'A' ? 'B' : 'A';
      const r = await decodeCasePayload(p.slice(0, i) + swapped + p.slice(i + 1));
      expect(r.ok, `changed at ${i}`).toBe(false);
    }
  });

  it('extra characters at the end', async () => {
    const p = await encodeCasePayload(demoCase());
    const longer = framed('j', utf8(JSON.stringify(caseToWire(demoCase()))), { length: 10 });
    expect(await decodeCasePayload(longer)).toEqual({ ok: false, message: LINK_MESSAGES.extra });
    expect((await decodeCasePayload(`${p}AAAA`)).ok).toBe(false);
  });

  it('a checksum that does not match', async () => {
    const bad = framed('j', utf8(JSON.stringify(caseToWire(demoCase()))), { crc: 12345 });
    expect(await decodeCasePayload(bad)).toEqual({ ok: false, message: LINK_MESSAGES.damaged });
  });

  it('an unknown format letter, as a newer Wetmode might write', async () => {
    const p = await encodeCasePayload(demoCase());
    expect(await decodeCasePayload(`q${p.slice(1)}`)).toEqual({ ok: false, message: LINK_MESSAGES.unknownFormat });
  });

  it('a payload far longer than any case link', async () => {
    expect(await decodeCasePayload('z'.repeat(150_000))).toEqual({ ok: false, message: LINK_MESSAGES.tooLong });
  });

  it('a compressed body that is not deflate data (checksum made to match)', async () => {
    expect(await decodeCasePayload(framed('z', new Uint8Array([0xff, 0xff, 0xff, 0x00, 0x12])))).toEqual({ ok: false, message: LINK_MESSAGES.damaged });
  });

  it('a compressed body that expands beyond any real case ("zip bomb")', async () => {
    const bomb = await deflateRaw(new Uint8Array(2_000_000).fill(32));
    expect(bomb.length).toBeLessThan(100_000);
    expect(await decodeCasePayload(framed('z', bomb))).toEqual({ ok: false, message: LINK_MESSAGES.tooLong });
  });

  it('text that is not UTF-8, or not JSON', async () => {
    expect(await decodeCasePayload(framed('j', new Uint8Array([0xc3, 0x28])))).toEqual({ ok: false, message: LINK_MESSAGES.damaged });
    expect(await decodeCasePayload(framed('j', utf8('[1, "abc"')))).toEqual({ ok: false, message: LINK_MESSAGES.damaged });
  });

  it('JSON that is not the wire form', async () => {
    const msg = 'this link holds a case this Wetmode cannot read: it does not hold a case in the form Wetmode writes';
    expect(await decodeCasePayload(jsonPayload(demoCase()))).toEqual({ ok: false, message: msg });
    expect(await decodeCasePayload(jsonPayload([1, 2, 3]))).toEqual({ ok: false, message: msg });
  });

  it('a well-formed link holding a bad case gives parseCase\'s reason', async () => {
    const wire = caseToWire(demoCase());
    wire[5] = 'tower';
    expect(await decodeCasePayload(jsonPayload(wire))).toEqual({
      ok: false,
      message: 'this link holds a case this Wetmode cannot read: kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "tower"',
    });
  });

  it('a link from a newer case schema asks for an update', async () => {
    const wire = caseToWire(demoCase());
    wire[0] = 4;
    expect(await decodeCasePayload(jsonPayload(wire))).toEqual({ ok: false, message: NEWER_VERSION_MESSAGE });
  });

  it('a compressed link opens where the platform has no DecompressionStream (our own decoder reads it)', async () => {
    const p = await encodeCasePayload(demoCase());
    vi.stubGlobal('DecompressionStream', undefined);
    const r = await decodeCasePayload(p);
    expect(r.ok && r.value.id).toBe(demoCase().id);
  });

  it('a link with spaces, %20, line breaks and %0A in it opens (white space is never part of a payload)', async () => {
    const p = await encodeCasePayload(demoCase());
    const cut = (s: string, at: number, insert: string) => s.slice(0, at) + insert + s.slice(at);
    for (const mangled of [
      cut(p, 10, ' '),
      cut(cut(p, 40, '%20'), 10, '%20'),
      cut(cut(p, 30, '\r\n'), 60, '\n  '),
      cut(p, 25, '%0A'),
      ` ${cut(p, 50, '%0D%0A%20')} `,
    ]) {
      const r = await decodeCasePayload(mangled);
      expect(r.ok && r.value.id, JSON.stringify(mangled.slice(0, 70))).toBe(demoCase().id);
      const whole = await decodeCaseLink(`https://wetmode.example/#/open/${mangled}`);
      expect(whole.ok).toBe(true);
    }
  });

  it('a stray or broken percent sign is refused as a character that does not belong', async () => {
    const p = await encodeCasePayload(demoCase());
    expect(await decodeCasePayload(p.slice(0, 20) + '%' + p.slice(20))).toEqual({ ok: false, message: LINK_MESSAGES.badChars });
    expect(await decodeCasePayload(p.slice(0, 20) + '%E2%82' + p.slice(20))).toEqual({ ok: false, message: LINK_MESSAGES.badChars });
  });

  it('something that is not a link, or not text', async () => {
    expect(await decodeCaseLink('https://wetmode.example/#/cases')).toEqual({ ok: false, message: LINK_MESSAGES.notALink });
    expect(await decodeCaseLink(42)).toEqual({ ok: false, message: LINK_MESSAGES.notALink });
    expect(await decodeCasePayload({ payload: 'z' })).toEqual({ ok: false, message: LINK_MESSAGES.damaged });
  });

  it('a compressed link made with the platform stream decodes from the bytes alone (fixed vector)', async () => {
    // Guards the frame layout: deflate-raw of "[]" is 8b 8e 05 00 on zlib-based platforms; built by hand here.
    const body = new Uint8Array([0x8b, 0x8e, 0x05, 0x00]);
    expect(await decodeCasePayload(framed('z', body))).toEqual({
      ok: false,
      message: 'this link holds a case this Wetmode cannot read: it does not hold a case in the form Wetmode writes',
    });
  });
});

describe('ranges travel in a link', () => {
  it('a case with ranges comes back with the same ranges, and a schema-1 link (12 elements) still opens', async () => {
    const withRanges = { ...demoCase(), ranges: { fixityDepth: { low: '2.1', high: '4.9', on: true }, topMass: { low: '2', high: '3', on: false } } };
    const back = await decodeCasePayload(await encodeCasePayload(withRanges));
    if (!back.ok) throw new Error(back.message);
    expect(back.value.ranges).toEqual(withRanges.ranges);
    const { ranges: _r, ...plain } = withRanges;
    const v1 = caseToWire(plain).slice(0, 12);
    v1[0] = 1;
    const old = await decodeCasePayload(jsonPayload(v1));
    if (!old.ok) throw new Error(old.message);
    expect(old.value.ranges).toBeUndefined();
    expect(old.value.inputs).toEqual(plain.inputs);
  });
});
