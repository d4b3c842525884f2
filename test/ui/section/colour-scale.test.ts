import { describe, expect, it } from 'vitest';
import { bandOf, legendNumber, luminance, mapPixels, niceStep, potentialScale, speedScale } from '../../../src/ui/section/colour-scale';

describe('colour scales of the flow map', () => {
  it('bands the speed ratio in fixed steps, labelled with numbers', () => {
    const s = speedScale();
    expect(s.labels).toEqual([
      '0 to 0.1',
      '0.1 to 0.25',
      '0.25 to 0.5',
      '0.5 to 0.75',
      '0.75 to 1',
      '1 to 1.25',
      '1.25 to 1.5',
      '1.5 to 2',
      '2 to 3',
      '≥ 3',
    ]);
    expect(s.colours).toHaveLength(s.labels.length);
  });

  it('puts a value on an edge into the band above and NaN in no band', () => {
    const s = speedScale();
    expect(bandOf(s, 0)).toBe(0);
    expect(bandOf(s, 0.0999)).toBe(0);
    expect(bandOf(s, 0.1)).toBe(1);
    expect(bandOf(s, 1)).toBe(5);
    expect(bandOf(s, 2.999)).toBe(8);
    expect(bandOf(s, 3)).toBe(9);
    expect(bandOf(s, 1e9)).toBe(9);
    expect(bandOf(s, NaN)).toBe(-1);
  });

  it('darkens steadily with speed, so the map reads without colour', () => {
    const l = speedScale().colours.map(luminance);
    for (let i = 1; i < l.length; i++) expect(l[i], `band ${i}`).toBeLessThan(l[i - 1]);
    // From near white to near black: a wide contrast range (WCAG relative luminance).
    expect(l[0]).toBeGreaterThan(0.85);
    expect(l[l.length - 1]).toBeLessThan(0.03);
  });

  it('makes the potential bands symmetric about 0 and darker with magnitude on each side', () => {
    const s = potentialScale(0.47);
    // ±5 steps cover 0.47: step 0.1 (the nice step at or above 0.094).
    expect(s.edges).toEqual([-Infinity, -0.4, -0.3, -0.2, -0.1, 0, 0.1, 0.2, 0.3, 0.4, Infinity]);
    expect(s.labels[0]).toBe('< \u22120.4');
    expect(s.labels[9]).toBe('≥ 0.4');
    const l = s.colours.map(luminance);
    for (let i = 1; i < 5; i++) expect(l[i], `negative band ${i}`).toBeGreaterThan(l[i - 1]);
    for (let i = 6; i < 10; i++) expect(l[i], `positive band ${i}`).toBeLessThan(l[i - 1]);
    expect(bandOf(s, -0.05)).toBe(4);
    expect(bandOf(s, 0)).toBe(5);
  });

  it('picks round steps of 1, 2, 2.5 or 5 × 10^k', () => {
    expect([0.094, 0.1, 0.13, 0.21, 0.3, 0.6, 7, 0.0042].map(niceStep)).toEqual([0.1, 0.1, 0.2, 0.25, 0.5, 1, 10, 0.005]);
  });

  it('writes legend numbers with a real minus sign and three figures', () => {
    expect([0, 0.25, -1.5, 1 / 3, 1234.5].map(legendNumber)).toEqual(['0', '0.25', '\u22121.5', '0.333', '1230']);
  });

  it('paints the top row of the grid at the top of the image', () => {
    const s = speedScale();
    // 2 × 2 grid, rows y upwards: bottom row [0.05, 0.6], top row [1.1, 5].
    const px = mapPixels([0.05, 0.6, 1.1, 5], 2, 2, s);
    const rgba = (i: number) => Array.from(px.slice(4 * i, 4 * i + 4));
    const hex = (i: number) => '#' + rgba(i).slice(0, 3).map((c) => c.toString(16).padStart(2, '0')).join('');
    expect([hex(0), hex(1), hex(2), hex(3)]).toEqual([s.colours[5], s.colours[9], s.colours[0], s.colours[3]]);
    expect(rgba(0)[3]).toBe(255);
  });

  it('leaves no-liquid cells transparent, except one cell into an outline from the liquid', () => {
    const s = speedScale();
    // One row of four cells: liquid 0.05, then three cells with no liquid at their centres.
    const px = mapPixels([0.05, NaN, NaN, NaN], 4, 1, s);
    const rgba = (i: number) => Array.from(px.slice(4 * i, 4 * i + 4));
    expect(rgba(1)).toEqual(rgba(0));
    expect(rgba(2)).toEqual([0, 0, 0, 0]);
    expect(rgba(3)).toEqual([0, 0, 0, 0]);
  });

  it('scales values before banding', () => {
    const s = speedScale();
    const px = mapPixels([0.5], 1, 1, s, 4);
    // 0.5 × 4 = 2: band "2 to 3".
    expect('#' + Array.from(px.slice(0, 3)).map((c) => c.toString(16).padStart(2, '0')).join('')).toBe(s.colours[8]);
  });
});
