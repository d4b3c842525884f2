/**
 * The default resolution (64 panels per body, doubled once to 128 when the estimate misses 0.1 % on the
 * translational terms) reports an error estimate that brackets the true error of the reported value.
 */
import { describe, expect, test } from 'vitest';
import { RHO, alone, solved } from './helpers';
import { expectClose } from '../../helpers/expect-close';
import type { SectionInput, SectionResult } from '../../../src/physics/section/index';
import { MAX_TOTAL_PANELS } from '../../../src/physics/section/solve';

/** Bracketing is the property claimed: estimate ≥ |reported − exact| (no tolerance: it either covers or not). */
function expectBracketed(r: SectionResult, dof: number, exact: number, label: string): void {
  const e = r.errorEstimates[dof];
  const m3 = r.addedMass.length;
  const reported = r.addedMass[dof][dof];
  expect(m3).toBeGreaterThan(dof);
  expect(e.absoluteError, `${label}: estimate ${e.absoluteError} against the true error ${Math.abs(reported - exact)} at N = ${r.panelsPerBody}`).toBeGreaterThanOrEqual(
    Math.abs(reported - exact),
  );
}

/** Concentric annulus: m = ρπR1²(R2² + R1²)/(R2² − R1²) (R.J. Fritz, ASME J. Eng. Industry 94 (1972) 167). */
function fritz(r1: number, r2: number): number {
  return (RHO * Math.PI * r1 * r1 * (r2 * r2 + r1 * r1)) / (r2 * r2 - r1 * r1);
}

/**
 * Circle of radius a, centre at height h above a rigid plane wall, moving along or normal to the wall (in 2D
 * both are equal): Ca = 2 sinh²α Σ_{n≥1} 1/sinh²(nα) − 1, cosh α = h/a. This is the sum over the doublet
 * images reflected between the wall and the circle, in bipolar form (classical image method; L.M.
 * Milne-Thomson, Theoretical Hydrodynamics, images in a circle and in a plane, from memory). It gives
 * Ca → π²/3 − 1 at contact and 1 + a²/(2h²) far away, the two limits already checked in published.test.ts.
 */
function wallSeriesCa(a: number, h: number): number {
  const alpha = Math.acosh(h / a);
  const s1 = Math.sinh(alpha) ** 2;
  let sum = 0;
  for (let n = 1; n < 100000; n++) {
    const t = s1 / Math.sinh(n * alpha) ** 2;
    sum += t;
    if (t < 1e-17 * sum) break;
  }
  return 2 * sum - 1;
}

describe('error estimate at the default resolution brackets the true error', () => {
  test('circle in open liquid (classical, H. Lamb, Hydrodynamics: Ca = 1), met at the 64-panel start', () => {
    const r = solved(alone({ shape: 'circle', diameterM: 0.61 }));
    const exact = RHO * Math.PI * 0.305 ** 2;
    expect(r.panelsPerBody).toBe(64);
    expectBracketed(r, 0, exact, 'circle x');
    expectBracketed(r, 1, exact, 'circle y');
    // Extrapolated from 16/32/64 panels: measured 7e-7 off; 1e-5 is the default's stated goal by a wide margin.
    expectClose(r.bodies[0].caX, 1, { rtol: 1e-5, label: 'circle Ca at the default resolution' });
  });

  test.each([
    [0.5, 'a 50 %'],
    [0.1, 'a 10 %'],
    [0.02, 'a 2 %'],
    [0.01, 'a 1 %'],
  ])('concentric annulus with gap %s of R1 (%s gap), against Fritz (1972)', (gap) => {
    const r1 = 0.5;
    const r = solved({ liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 2 * r1 }], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 2 * r1 * (1 + gap) }] });
    expectBracketed(r, 0, fritz(r1, r1 * (1 + gap)), `annulus gap ${gap}, x`);
    expectBracketed(r, 1, fritz(r1, r1 * (1 + gap)), `annulus gap ${gap}, y`);
  });

  test.each([0.1, 0.5])('circle %s radii above a rigid wall, against the image series', (gap) => {
    const a = 1;
    const r = solved(alone({ shape: 'circle', diameterM: 2 * a, centerM: [0, a + gap * a] }, [{ kind: 'wall', pointM: [0, 0], normal: [0, 1] }]));
    const exact = RHO * Math.PI * a * a * wallSeriesCa(a, a + gap * a);
    expectBracketed(r, 0, exact, `gap ${gap}, along the wall`);
    expectBracketed(r, 1, exact, `gap ${gap}, normal to the wall`);
    // The target is met: 0.1 % on both translations, and the reported value is far closer (measured 2e-5 at 0.1 radii).
    expect(r.errorEstimates[0].relativeError).toBeLessThanOrEqual(1e-3);
    expectClose(r.bodies[0].addedMassX, exact, { rtol: 1e-4, label: `circle ${gap} radii above a wall` });
  });

  test('the image series reproduces the contact limit π²/3 − 1 and the far-field 1 + a²/2h² (cross-check of the helper)', () => {
    // Contact limit: limit of 2D potential theory (A.I. Korotkin, Added Masses of Ship Structures, ch. 5).
    // The series approaches it like √gap (α ≈ √(2·gap)): measured 1.2e-3 below at a gap of 1e-6 radii.
    expectClose(wallSeriesCa(1, 1 + 1e-6), Math.PI ** 2 / 3 - 1, { rtol: 2e-3, label: 'series near contact' });
    // First image dipole (classical): Ca − 1 ≈ a²/(2h²) for h ≫ a; the next term is O((a/h)⁴).
    expectClose(wallSeriesCa(1, 20) - 1, 1 / 800, { rtol: 0.01, label: 'series far from the wall' });
  });

  test('square, against a 512-panel solve (cross-check) that agrees with the DNV table value 1.51', () => {
    const square = alone({ shape: 'rectangle', widthM: 1, heightM: 1 });
    const r = solved(square);
    const ref = solved(square, { panelsPerBody: 512 });
    // DNV-RP-C205 App. D / DNV-RP-H103 Table A-1, square Ca = 1.51 (table, from memory, ±0.01).
    expectClose(ref.bodies[0].caX, 1.51, { atol: 0.01, label: 'square Ca at 512 panels' });
    // The reference's own estimate is counted against the default's: bracketing must hold with it added.
    const e = r.errorEstimates[0];
    expect(ref.errorEstimates[0].absoluteError).toBeLessThan(0.1 * e.absoluteError);
    expect(e.absoluteError).toBeGreaterThanOrEqual(Math.abs(r.addedMass[0][0] - ref.addedMass[0][0]) + ref.errorEstimates[0].absoluteError);
  });

  test('rectangle 1 m × 0.1 m moving across its width (a/b = 10), against a 512-panel solve (cross-check) and the DNV value 1.14', () => {
    const plank = alone({ shape: 'rectangle', widthM: 1, heightM: 0.1 });
    const r = solved(plank);
    const ref = solved(plank, { panelsPerBody: 512 });
    // DNV-RP-C205 App. D / DNV-RP-H103 Table A-1, a/b = 10: Ca = 1.14 (table, from memory, ±0.01); y motion,
    // so a is half the 1 m width across it and b half the 0.1 m height along it.
    expectClose(ref.bodies[0].caY, 1.14, { atol: 0.01, label: 'plank Ca across its width at 512 panels' });
    const e = r.errorEstimates[1];
    expect(e.absoluteError).toBeGreaterThanOrEqual(Math.abs(r.addedMass[1][1] - ref.addedMass[1][1]) + ref.errorEstimates[1].absoluteError);
  });

  test('thin plate t/w = 1/100 normal to itself (classical, Lamb: Ca = 1 for zero thickness)', () => {
    // Constant panels converge on a plate from above, and thickness only adds added mass, so the distance from
    // ρπa² is at least the discretisation error: bracketing it is the stronger claim.
    const r = solved(alone({ shape: 'plate', widthM: 1.2, thicknessM: 0.012, angleDeg: 90 }));
    expectBracketed(r, 0, RHO * Math.PI * 0.6 ** 2, 'plate normal to itself');
    // The plate misses 0.1 % at 64 panels and stops at the cap of one doubling.
    expect(r.panelsPerBody).toBe(128);
  });

  test('four circles 0.1 D above a wall meet 0.1 % at the 64-panel start, and the estimate covers a 256-panel solve (cross-check)', () => {
    const four: SectionInput = {
      liquidDensityKgPerM3: RHO,
      bodies: [0, 1, 2, 3].map((k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [0.8 * k, 0.3] as [number, number] })),
      boundaries: [{ kind: 'wall', pointM: [0, 0], normal: [0, 1] }],
    };
    const r = solved(four);
    const ref = solved(four, { panelsPerBody: 256 });
    expect(r.panelsPerBody).toBe(64);
    for (const e of r.errorEstimates) {
      if (e.motion === 'rotation') continue;
      expect(e.relativeError).toBeLessThanOrEqual(1e-3);
      const i = e.dof;
      expect(e.absoluteError, `dof ${i}`).toBeGreaterThanOrEqual(Math.abs(r.addedMass[i][i] - ref.addedMass[i][i]) + ref.errorEstimates[i].absoluteError);
    }
  });

  test('the default doubling never goes past the total panel limit: nine thin plates stay at 64 panels per body', () => {
    // Nine plates of t/w = 1/500 take 128 panels each at the start (thin outlines get twice the nominal count):
    // 1,152 in all; a doubling would need 2,304, more than MAX_TOTAL_PANELS (2,048), so it is not made.
    const plates: SectionInput = {
      liquidDensityKgPerM3: RHO,
      bodies: Array.from({ length: 9 }, (_, k) => ({ shape: 'plate' as const, widthM: 0.3, thicknessM: 0.0006, centerM: [0.5 * (k % 3), 0.5 * Math.floor(k / 3)] as [number, number] })),
    };
    const r = solved(plates);
    expect(r.panelsPerBody).toBe(64);
    expect(r.panelsFine).toBeLessThanOrEqual(MAX_TOTAL_PANELS);
    // It missed the target, and says so: the estimate is reported, not hidden.
    expect(Math.max(...r.errorEstimates.filter((e) => e.motion !== 'rotation').map((e) => e.relativeError))).toBeGreaterThan(1e-3);
  });

  test('a given panelsPerBody is kept as it is (no doubling)', () => {
    const r = solved(alone({ shape: 'rectangle', widthM: 1, heightM: 1 }), { panelsPerBody: 48 });
    expect(r.panelsPerBody).toBe(48);
  });
});
