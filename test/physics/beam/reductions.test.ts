import { describe, expect, it } from 'vitest';
import { cylinderEndEffectFactor, perforationFactor, plateEndEffectFactor, plateTableCa } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';

describe('added-mass reductions (DNV-RP-H103, from memory)', () => {
  it('reproduces the cylinder end-effect table at its points: L/D 1.2, 2.5, 5, 9 → 0.62, 0.78, 0.90, 0.96', () => {
    // DNV-RP-H103 Table A-2 (from memory), docs/sources.md §S4.1.
    const table: [number, number][] = [[1.2, 0.62], [2.5, 0.78], [5, 0.9], [9, 0.96]];
    for (const [ld, ca] of table) expectClose(cylinderEndEffectFactor(ld), ca, { rtol: 1e-12, label: `L/D ${ld}` });
    expectClose(cylinderEndEffectFactor(1e9), 1, { rtol: 1e-8, label: 'long cylinder' });
    expect(cylinderEndEffectFactor(0.5)).toBe(0.62);
  });

  it('reproduces the plate table at b/a = 1, 2, 3, 5, 10 and is continuous at L = w', () => {
    // DNV-RP-H103 Table A-2 (from memory), docs/sources.md §S4.1, Ca on V_R = (π/4) a² b.
    const table: [number, number][] = [[1, 0.579], [2, 0.757], [3, 0.83], [5, 0.897], [10, 0.947]];
    for (const [ba, ca] of table) expectClose(plateTableCa(1 / ba), ca, { rtol: 1e-12, label: `b/a ${ba}` });
    // A plate strip as long as it is wide is a square plate either way.
    expectClose(plateEndEffectFactor(1, 1), 0.579, { rtol: 1e-12, label: 'square' });
    expectClose(plateEndEffectFactor(1 - 1e-9, 1), plateEndEffectFactor(1 + 1e-9, 1), { rtol: 1e-6, label: 'continuity at L = w' });
  });

  it('end-effect factors grow monotonically towards 1 with length', () => {
    let prev = 0;
    for (let ld = 0.5; ld < 50; ld *= 1.3) {
      const f = cylinderEndEffectFactor(ld);
      expect(f).toBeGreaterThanOrEqual(prev);
      expect(f).toBeLessThanOrEqual(1);
      prev = f;
    }
  });

  it('perforation: none up to p = 0.05, the cosine law to 0.34, the exponential to 0.5', () => {
    // DNV-RP-H103 §4.6.4.3 (from memory).
    expect(perforationFactor(0)).toBe(1);
    expect(perforationFactor(0.05)).toBe(1);
    expectClose(perforationFactor(0.2), 0.7 + 0.3 * Math.cos((Math.PI * 0.15) / 0.34), { rtol: 1e-15, label: 'p = 0.2' });
    expectClose(perforationFactor(0.4), Math.exp(-0.3 / 0.28), { rtol: 1e-15, label: 'p = 0.4' });
    // The two branches nearly meet at p = 0.34 (0.4315 vs 0.4244): the recalled law is continuous to 2 %.
    expectClose(perforationFactor(0.34), perforationFactor(0.3400001), { rtol: 0.02, label: 'branch junction' });
    let prev = 1;
    for (let p = 0; p <= 0.5; p += 0.01) {
      const f = perforationFactor(p);
      expect(f).toBeLessThanOrEqual(prev + 1e-12);
      prev = f;
    }
  });
});
