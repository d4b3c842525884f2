import { describe, expect, it } from 'vitest';
import jsQR from 'jsqr';
import { qrModules, qrPath } from '../../../src/ui/report/qr';

/** Rasterises the modules (with a 4-module quiet zone) into RGBA pixels, `scale` pixels per module. */
function raster(text: string, scale = 4): { data: Uint8ClampedArray; side: number } {
  const { size, dark } = qrModules(text);
  const side = (size + 8) * scale;
  const data = new Uint8ClampedArray(side * side * 4).fill(255);
  for (let r = 0; r < size; r++)
    for (let c = 0; c < size; c++)
      if (dark[r * size + c])
        for (let y = 0; y < scale; y++)
          for (let x = 0; x < scale; x++) {
            const i = (((r + 4) * scale + y) * side + (c + 4) * scale + x) * 4;
            data[i] = data[i + 1] = data[i + 2] = 0;
          }
  return { data, side };
}

describe('the case link as a QR code', () => {
  it('an 800-character case link decodes back to itself with an independent decoder (jsQR)', () => {
    const link = `https://wetmode.example/#c=${'AbCd-_09'.repeat(96)}xyz`;
    expect(link.length).toBeGreaterThan(790);
    const { data, side } = raster(link);
    const decoded = jsQR(data, side, side);
    expect(decoded?.data).toBe(link);
  });

  it('a link long enough for a version-23 symbol is drawn as version 24 and decodes with jsQR, which misplaces version 23 alignment patterns', () => {
    // 1006 bytes: more than version 22-L holds and less than 23-L. ISO/IEC 18004 Table 9 gives 22-L 1006 data
    // codewords (2 × 111 + 7 × 112) and 23-L 1094 (4 × 121 + 5 × 122); byte mode spends 4 + 16 bits on its
    // header, so 22-L holds 1003 bytes and 23-L 1091 (arithmetic on the table, a cross-check of the library).
    const link = `https://wetmode.example/#/open/${'zA0-_x9Q'.repeat(122)}ab`.slice(0, 1006);
    expect(link.length).toBe(1006);
    const { data, side } = raster(link);
    expect(qrModules(link).size).toBe(17 + 4 * 24);
    expect(jsQR(data, side, side)?.data).toBe(link);
  });

  it('the symbol is square, of a size ISO/IEC 18004 allows (17 + 4 × version), and the path covers every dark module', () => {
    const m = qrModules('https://wetmode.example/#c=short');
    expect((m.size - 17) % 4).toBe(0);
    const path = qrPath(m);
    const runs = path.split('z').filter((s) => s !== '');
    const covered = runs.reduce((n, run) => n + Number(/h(\d+)/.exec(run)![1]), 0);
    expect(covered).toBe(m.dark.reduce((a, b) => a + b, 0));
  });
});
