/** The section solver's error estimate brackets the true error, also where the asymptotic range is not reached. */
import { describe, expect, test } from 'vitest';
import { RHO, alone, solved } from './helpers';
import { expectClose } from '../../helpers/expect-close';

/** Concentric annulus: m = ρπR1²(R2² + R1²)/(R2² − R1²) (R.J. Fritz, ASME J. Eng. Industry 94 (1972) 167). */
function fritz(r1: number, r2: number): number {
  return (RHO * Math.PI * r1 * r1 * (r2 * r2 + r1 * r1)) / (r2 * r2 - r1 * r1);
}

function annulus(r1: number, r2: number) {
  return { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle' as const, diameterM: 2 * r1 }], boundaries: [{ kind: 'enclosure' as const, shape: 'circle' as const, diameterM: 2 * r2 }] };
}

describe('error estimate of the section solver', () => {
  test.each([1.01, 1.05, 1.2, 2])('annulus R2/R1 = %s: the estimate covers the true error of both the finest and the reported value at every resolution', (ratio) => {
    const r1 = 0.5;
    const exact = fritz(r1, r1 * ratio);
    for (const panelsPerBody of [32, 64, 128, 256]) {
      const r = solved(annulus(r1, r1 * ratio), { panelsPerBody });
      const e = r.errorEstimates[0];
      const label = `R2/R1 = ${ratio}, N = ${panelsPerBody}`;
      // Bracketing is the property claimed: estimate ≥ |error| (no tolerance: it either covers or not).
      expect(e.absoluteError, `${label}: finest level`).toBeGreaterThanOrEqual(Math.abs(e.fine - exact));
      expect(e.absoluteError, `${label}: reported value`).toBeGreaterThanOrEqual(Math.abs(r.addedMass[0][0] - exact));
    }
  });

  test('a 1 % annulus gap at the default resolution: the estimate is at least the true error (it under-stated it 2.4× before)', () => {
    const r = solved(annulus(0.5, 0.505));
    const exact = fritz(0.5, 0.505);
    const e = r.errorEstimates[0];
    expect(e.absoluteError).toBeGreaterThanOrEqual(Math.abs(r.addedMass[0][0] - exact));
    expect(e.absoluteError).toBeGreaterThanOrEqual(Math.abs(e.fine - exact));
  });

  test('a circle in open liquid (Lamb, Ca = 1) is answered from the extrapolated value far inside 0.1 % at the default resolution', () => {
    // The finest level alone is 6.5e-7 off at 128 panels; the extrapolated value must do at least as well.
    const r = solved(alone({ shape: 'circle', diameterM: 0.61 }));
    // Classical (H. Lamb, Hydrodynamics): m = ρπR². Extrapolation from 32/64/128 panels is within 1e-6 here.
    expectClose(r.bodies[0].caX, 1, { rtol: 1e-5, label: 'circle Ca at the default resolution' });
    expect(r.errorEstimates[0].absoluteError).toBeGreaterThanOrEqual(Math.abs(r.addedMass[0][0] - RHO * Math.PI * 0.305 ** 2));
  });
});
