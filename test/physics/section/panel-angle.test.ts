/** The panel angle's fast path (Taylor series of atan for far panels) agrees with Math.atan2 to round-off. */
import { describe, expect, test } from 'vitest';
import { panelAngle } from '../../../src/physics/section/assemble';

describe('panel angle', () => {
  test('agrees with Math.atan2 within 4e-16 relative on and around the fast path (|y| ≤ x/8)', () => {
    let worst = 0;
    for (let k = -2000; k <= 2000; k++) {
      const t = k / 8000; // |t| up to 0.25: both sides of the 1/8 switch
      for (const x of [1e-9, 1, 3.7e4]) {
        const y = t * x;
        const exact = Math.atan2(y, x);
        const got = panelAngle(y, x);
        if (exact !== 0) worst = Math.max(worst, Math.abs(got - exact) / Math.abs(exact));
        else expect(got).toBe(0);
      }
    }
    // Series to t¹⁵: first omitted term t¹⁷/17 ≤ 2.3e-16·|t| at |t| = 1/8, plus a few roundings (Abramowitz & Stegun 4.4.42).
    expect(worst).toBeLessThan(4e-16);
  });

  test('outside the fast path it is Math.atan2 itself (negative x, steep angles, zero)', () => {
    for (const [y, x] of [[1, -1], [-1, -1], [1, 0], [0, -2], [5, 1], [-0.2, 1]] as const) {
      expect(panelAngle(y, x)).toBe(Math.atan2(y, x));
    }
  });
});
