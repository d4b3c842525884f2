import { describe, expect, it } from 'vitest';
import { normalised } from '../../../src/physics/plate/solve';
import { SHAPE_PEAK_TIE } from '../../../src/physics/linalg/shape-sign';

describe('the sign of a reported plate mode shape', () => {
  it('puts +1 at the first of two equal and opposite peaks in grid order, whichever rounds larger', () => {
    // A 3 × 3 grid holding an antisymmetric shape (a square plate's (1,2)-like mode): −p first, +p later.
    for (const later of [1 + 1e-12, 1, 1 - 1e-12]) {
      const s = Float64Array.from([0, 0, 0, -2, 0, 2 * later, 0, 0, 0]);
      const [shape] = normalised([s]);
      expect(shape[3]).toBeGreaterThan(0);
      expect(shape[5]).toBeLessThan(0);
      expect(Math.max(...Array.from(shape, Math.abs))).toBe(1);
      expect(Math.abs(shape[3] - 1)).toBeLessThan(2e-12);
    }
  });

  it('follows the larger peak beyond the tie tolerance, and a shape and its negative normalise alike', () => {
    const s = Float64Array.from([-1, 0.5, 1 + 10 * SHAPE_PEAK_TIE, 0]);
    const [a, b] = normalised([s, s.map((v) => -v)]);
    expect(a[2]).toBe(1);
    expect(a[0]).toBeLessThan(0);
    expect(Array.from(b)).toEqual(Array.from(a));
  });

  it('leaves an all-zero shape at zero', () => {
    const [z] = normalised([new Float64Array(4)]);
    expect(Array.from(z)).toEqual([0, 0, 0, 0]);
  });
});
