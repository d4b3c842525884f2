/**
 * Builds link payloads by hand, byte for byte as documented in src/share/link.ts (24-bit length, CRC-32, body),
 * so tests can make well-framed links around chosen content — independently of the encoder they test.
 */
import { toBase64url } from '../../src/share/base64url';
import { crc32 } from '../../src/share/crc32';

export function framed(prefix: string, body: Uint8Array, opts: { length?: number; crc?: number } = {}): string {
  const out = new Uint8Array(7 + body.length);
  const v = new DataView(out.buffer);
  const length = opts.length ?? body.length;
  v.setUint16(0, length >>> 8);
  v.setUint8(2, length & 0xff);
  v.setUint32(3, opts.crc ?? crc32(body));
  out.set(body, 7);
  return prefix + toBase64url(out);
}
