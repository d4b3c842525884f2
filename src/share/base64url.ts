/**
 * base64url without padding (RFC 4648 §5), strict on decode: only the URL-safe alphabet, no impossible lengths,
 * and the unused low bits of the last character must be zero (canonical form), so every change to the text
 * changes the bytes — and is then caught by the link's checksum.
 */
const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
const VALUE = new Int8Array(128).fill(-1);
for (let i = 0; i < ALPHABET.length; i++) VALUE[ALPHABET.charCodeAt(i)] = i;

export function toBase64url(bytes: Uint8Array): string {
  let out = '';
  let i = 0;
  for (; i + 2 < bytes.length; i += 3) {
    const n = (bytes[i] << 16) | (bytes[i + 1] << 8) | bytes[i + 2];
    out += ALPHABET[n >>> 18] + ALPHABET[(n >>> 12) & 63] + ALPHABET[(n >>> 6) & 63] + ALPHABET[n & 63];
  }
  const rest = bytes.length - i;
  if (rest === 1) {
    const n = bytes[i] << 16;
    out += ALPHABET[n >>> 18] + ALPHABET[(n >>> 12) & 63];
  } else if (rest === 2) {
    const n = (bytes[i] << 16) | (bytes[i + 1] << 8);
    out += ALPHABET[n >>> 18] + ALPHABET[(n >>> 12) & 63] + ALPHABET[(n >>> 6) & 63];
  }
  return out;
}

export type Base64Decoded =
  /** canonical: false when the unused low bits of the last character are not zero (an altered, or cut, last character). */
  | { ok: true; bytes: Uint8Array; canonical: boolean }
  /** bad-char: outside the alphabet; incomplete: a length no encoder makes (cut off). */
  | { ok: false; reason: 'bad-char' | 'incomplete' };

export function fromBase64url(text: string): Base64Decoded {
  const len = text.length;
  const out = new Uint8Array(Math.floor((len * 6) / 8));
  let acc = 0;
  let bits = 0;
  let o = 0;
  for (let i = 0; i < len; i++) {
    const c = text.charCodeAt(i);
    const v = c < 128 ? VALUE[c] : -1;
    if (v < 0) return { ok: false, reason: 'bad-char' };
    acc = ((acc << 6) | v) & 0xffffff;
    bits += 6;
    if (bits >= 8) {
      bits -= 8;
      out[o++] = (acc >>> bits) & 0xff;
    }
  }
  if (len % 4 === 1) return { ok: false, reason: 'incomplete' };
  return { ok: true, bytes: out, canonical: bits === 0 || (acc & ((1 << bits) - 1)) === 0 };
}
