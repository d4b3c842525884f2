/**
 * The case link as a QR code, drawn as one SVG path (no markup strings, so it runs under the app's
 * Content-Security-Policy). Encoding by `qrcode-generator` (MIT, no dependencies, small, long maintained): a QR
 * encoder is a standard (ISO/IEC 18004) best taken from a library that many have already read and tested.
 * Error correction level L: links are long (600–900 characters) and a printed sheet is clean, so the smaller
 * symbol (larger modules) reads better from a phone than more redundancy would.
 */
import qrcode from 'qrcode-generator';

/** Modules of a QR symbol: `size` × `size`, row-major, 1 = dark. */
export interface QrModules {
  size: number;
  dark: Uint8Array;
}

/**
 * Version 23 (109 × 109 modules) is skipped: its alignment patterns sit at 6, 30, 54, 78, 102 (ISO/IEC 18004,
 * Annex E, Table E.1), but some widely copied decoders place the fourth at 74 and cannot read any version-23
 * symbol. Version 24 at level L holds everything version 23 does, four modules wider.
 */
const SKIPPED_VERSION = 23;

function encode(text: string, version: number): ReturnType<typeof qrcode> {
  const q = qrcode(version as Parameters<typeof qrcode>[0], 'L');
  q.addData(text, 'Byte');
  q.make();
  return q;
}

/** Encodes text (byte mode) into the smallest symbol that holds it at level L (never version 23, see above). */
export function qrModules(text: string): QrModules {
  let q = encode(text, 0);
  if (q.getModuleCount() === 17 + 4 * SKIPPED_VERSION) q = encode(text, SKIPPED_VERSION + 1);
  const size = q.getModuleCount();
  const dark = new Uint8Array(size * size);
  for (let r = 0; r < size; r++) for (let c = 0; c < size; c++) dark[r * size + c] = q.isDark(r, c) ? 1 : 0;
  return { size, dark };
}

/** SVG path of the dark modules, one unit per module, runs along a row merged into one rectangle. */
export function qrPath({ size, dark }: QrModules, quietZone = 4): string {
  const parts: string[] = [];
  for (let r = 0; r < size; r++) {
    let c = 0;
    while (c < size) {
      if (!dark[r * size + c]) {
        c++;
        continue;
      }
      const start = c;
      while (c < size && dark[r * size + c]) c++;
      parts.push(`M${start + quietZone} ${r + quietZone}h${c - start}v1h${start - c}z`);
    }
  }
  return parts.join('');
}
