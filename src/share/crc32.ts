/**
 * CRC-32 (the IEEE 802.3 / zip / PNG polynomial, reflected 0xEDB88320, init and final XOR 0xFFFFFFFF).
 * Classical; check value for "123456789" is 0xCBF43926 (Greg Cook, Catalogue of parametrised CRC algorithms,
 * CRC-32/ISO-HDLC). It catches every error burst up to 32 bits, i.e. any one altered link character.
 */
const TABLE = new Uint32Array(256);
for (let n = 0; n < 256; n++) {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  TABLE[n] = c >>> 0;
}

export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (let i = 0; i < bytes.length; i++) c = TABLE[(c ^ bytes[i]) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
