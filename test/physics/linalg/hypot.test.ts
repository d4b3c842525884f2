import { describe, expect, it } from 'vitest';
import { seededUniform01 } from '../../../src/physics/linalg/seeded';
import { hypot2 } from '../../../src/physics/linalg/hypot';

describe('the QL rotations’ inline hypot', () => {
  it('equals Math.hypot bit for bit on random pairs over the whole exponent range (cross-check)', () => {
    const rnd = seededUniform01(11);
    let differing = 0;
    for (let i = 0; i < 200_000; i++) {
      // Exponents up to ±300 on either side, so scaling, overflow-safe and tiny cases all occur; also the QL's (g, 1).
      const a = (rnd() - 0.5) * 2 ** ((rnd() - 0.5) * (i % 3 === 0 ? 600 : 40));
      const b = i % 7 === 0 ? 1 : (rnd() - 0.5) * 2 ** ((rnd() - 0.5) * (i % 5 === 0 ? 600 : 40));
      if (!Object.is(hypot2(a, b), Math.hypot(a, b))) differing++;
    }
    expect(differing).toBe(0);
  });

  it('equals Math.hypot on zeros, infinities, NaN and subnormals (cross-check)', () => {
    const special = [0, -0, 1, -1, 3, 4, NaN, Infinity, -Infinity, 5e-324, -5e-324, 1e-310, 2.2250738585072014e-308, 1.7976931348623157e308, -1e308];
    for (const a of special) for (const b of special) expect(Object.is(hypot2(a, b), Math.hypot(a, b)), `hypot(${a}, ${b})`).toBe(true);
  });
});
