import { describe, it, expect } from 'vitest';
import { dryModes, flexuralRigidity } from '../../../src/physics/plate/dry';
import type { EdgeCondition, PlateInput } from '../../../src/physics/plate/types';
import { expectClose } from '../../helpers/expect-close';
import { bfsExtrapolated } from './bfs-plate';

const C: EdgeCondition = 'clamped';
const S: EdgeCondition = 'simply-supported';
const F: EdgeCondition = 'free';

/** Edges in Leissa's order for a plate with side a along x: x = 0, y = 0, x = a, y = b (left, bottom, right, top). */
function plate(aOverB: number, left: EdgeCondition, bottom: EdgeCondition, right: EdgeCondition, top: EdgeCondition): PlateInput {
  return { widthM: aOverB, heightM: 1, thicknessM: 0.01, youngsModulusPa: 2.1e11, poissonRatio: 0.3, densityKgPerM3: 7850, edges: { left, right, bottom, top } };
}

/** λ = ω a² √(ρh/D), a the width (A.W. Leissa, Vibration of Plates, NASA SP-160, 1969, eq. 4.3). */
function lambdas(p: PlateInput, count: number, terms = 12): number[] {
  const r = dryModes(p, terms);
  if (!r.ok) throw new Error(r.message);
  const s = p.widthM ** 2 * Math.sqrt((p.densityKgPerM3 * p.thicknessM) / flexuralRigidity(p));
  return Array.from(r.modes.omega2.subarray(0, count), (w2) => Math.sqrt(w2) * s);
}

describe('dry modes of rectangular plates by Rayleigh–Ritz', () => {
  it('a simply supported plate gives Navier’s exact frequencies at a/b = 1, 2 and 0.5', () => {
    for (const r of [1, 2, 0.5]) {
      // Navier solution, exact (classical; Leissa, NASA SP-160, eq. 4.20): λ = π² (m² + n² (a/b)²).
      const exact: number[] = [];
      for (let m = 1; m <= 6; m++) for (let n = 1; n <= 6; n++) exact.push(Math.PI ** 2 * (m * m + n * n * r * r));
      exact.sort((x, y) => x - y);
      const got = lambdas(plate(r, S, S, S, S), 6);
      // The sine modes lie in the polynomial space to within round-off at 12 terms: 1e-6 is quadrature and round-off.
      got.forEach((g, i) => expectClose(g, exact[i], { rtol: 1e-6, label: `SSSS a/b=${r} mode ${i + 1}` }));
    }
  });

  it('a clamped square plate matches Leissa’s table (35.992, 73.413, 108.27)', () => {
    const got = lambdas(plate(1, C, C, C, C), 4);
    // A.W. Leissa, J. Sound Vib. 31 (1973) 257, C-C-C-C, a/b = 1 (from memory): 35.992, 73.413, 73.413, 108.27.
    // His beam-function Ritz values are upper bounds a little above the converged ones; 0.5 % is the criterion we set.
    [35.992, 73.413, 73.413, 108.27].forEach((v, i) => expectClose(got[i], v, { rtol: 0.005, label: `CCCC square mode ${i + 1}` }));
    expect(got[0]).toBeLessThanOrEqual(35.992); // both are upper bounds; ours has the richer basis
  });

  it('a clamped 1.5 : 1 plate matches Leissa (60.772 at a/b = 1.5, 27.010 at a/b = 2/3)', () => {
    // Leissa (1973), C-C-C-C, a/b = 1.5 and 2/3 (from memory); the two are one plate turned, λ scaling by (a/b)².
    expectClose(lambdas(plate(1.5, C, C, C, C), 1)[0], 60.772, { rtol: 0.005, label: 'CCCC a/b = 1.5' });
    expectClose(lambdas(plate(2 / 3, C, C, C, C), 1)[0], 27.01, { rtol: 0.005, label: 'CCCC a/b = 2/3' });
  });

  it('a square cantilever plate (C-F-F-F) lies just below Leissa’s upper bound 3.4917 and on a converged finite-element cross-check', () => {
    const got = lambdas(plate(1, C, F, F, F), 5);
    // Leissa (1973), C-F-F-F, a/b = 1, ν = 0.3: 3.4917, 8.5246, 21.429, 27.331, 31.111 (from memory). His
    // beam-function Ritz series converges slowly at free corners: his values sit 0.3–0.6 % above converged ones,
    // so this check allows 0.7 % and demands ours be lower (both are Ritz upper bounds).
    [3.4917, 8.5246, 21.429, 27.331, 31.111].forEach((v, i) => {
      expectClose(got[i], v, { rtol: 0.007, label: `CFFF square mode ${i + 1}` });
      expect(got[i]).toBeLessThan(v);
    });
    // Cross-check: Bogner–Fox–Schmit elements, 4 and 8 per side, Richardson-extrapolated (h⁴).
    const bfs = bfsExtrapolated(plate(1, C, F, F, F), 4, 5);
    got.forEach((g, i) => expectClose(g, bfs[i], { rtol: 0.001, label: `CFFF square vs BFS mode ${i + 1}` }));
  }, 30_000);

  it('cantilever plates 2 : 1 and 1 : 2 agree with the finite-element cross-check', () => {
    for (const r of [2, 0.5]) {
      const got = lambdas(plate(r, C, F, F, F), 4);
      const bfs = bfsExtrapolated(plate(r, C, F, F, F), 4, 4);
      // Cross-check, not a published value: BFS extrapolated from 4 and 8 elements per side; 0.2 % covers both methods' residuals.
      got.forEach((g, i) => expectClose(g, bfs[i], { rtol: 0.002, label: `CFFF a/b=${r} mode ${i + 1}` }));
    }
  }, 30_000);

  it('plates with a free edge or two (S-S-S-F, C-F-C-F) and S-C-S-C match Leissa at a/b = 1', () => {
    // Leissa (1973), a/b = 1, ν = 0.3 (from memory). SSSF and SCSC are his exact Lévy-type solutions.
    // Edges in his order (x = 0, y = 0, x = a, y = b).
    expectClose(lambdas(plate(1, S, S, S, F), 1)[0], 11.685, { rtol: 0.005, label: 'SSSF square (free edge y = b)' });
    expectClose(lambdas(plate(1, S, C, S, C), 1)[0], 28.951, { rtol: 0.005, label: 'SCSC square' });
    // C-F-C-F is a Ritz value in Leissa (upper bound, 22.272); converged values are about 0.5 % lower.
    const cfcf = lambdas(plate(1, C, F, C, F), 2);
    expectClose(cfcf[0], 22.272, { rtol: 0.006, label: 'CFCF square mode 1' });
    expectClose(cfcf[1], 26.529, { rtol: 0.006, label: 'CFCF square mode 2' });
  });

  it('the mixed cases at a/b = 2 and 0.5 agree with the finite-element cross-check', () => {
    const cases: [string, EdgeCondition[]][] = [
      ['SSSF', [S, S, S, F]],
      ['CFCF', [C, F, C, F]],
      ['SCSC', [S, C, S, C]],
      ['CCCF', [C, C, C, F]],
    ];
    for (const [name, e] of cases) {
      for (const r of [2, 0.5]) {
        const p = plate(r, e[0], e[1], e[2], e[3]);
        const got = lambdas(p, 3);
        const bfs = bfsExtrapolated(p, 4, 3);
        // Cross-check (two different trial spaces converging to one answer): 0.2 %.
        got.forEach((g, i) => expectClose(g, bfs[i], { rtol: 0.002, label: `${name} a/b=${r} mode ${i + 1}` }));
      }
    }
  }, 60_000);

  it('a rotational edge spring runs from simply supported (no spring) to clamped (very stiff) and matches the finite-element cross-check between', () => {
    const base = plate(1, C, S, C, S);
    const D = flexuralRigidity(base);
    const withSpring = (kOverD: number) => ({ ...base, edges: { ...base.edges, bottom: { rotationalSpringNmPerRadPerM: kOverD * D }, top: { rotationalSpringNmPerRadPerM: kOverD * D } } });
    // Limits (classical: the spring term k_r/2 ∫ w_n² ds vanishes, or forces w_n → 0): SCSC rotated (28.951, Leissa
    // 1973, from memory) and CCCC (35.992, Leissa 1973, from memory).
    expectClose(lambdas(withSpring(0), 1)[0], lambdas(base, 1)[0], { rtol: 1e-12, label: 'no spring = simply supported' });
    expectClose(lambdas(withSpring(0), 1)[0], 28.951, { rtol: 0.005, label: 'no spring vs Leissa SCSC' });
    // k_r a / D = 1e5 leaves an edge slope ~1e-5 of the clamped moment (≪ 0.1 %); Leissa's value sits ~0.02 % above
    // the converged one: 0.15 %.
    expectClose(lambdas(withSpring(1e5), 1)[0], 35.992, { rtol: 0.0015, label: 'stiff spring vs Leissa CCCC' });
    const mid = lambdas(withSpring(10), 2);
    const bfs = bfsExtrapolated({ ...base, springs: { bottom: 10, top: 10 } }, 4, 2);
    // Cross-check (BFS elements with the same spring on the edge slope degrees of freedom): 0.2 %.
    mid.forEach((g, i) => expectClose(g, bfs[i], { rtol: 0.002, label: `k_r a/D = 10, mode ${i + 1}` }));
    expect(mid[0]).toBeGreaterThan(28.951);
    expect(mid[0]).toBeLessThan(35.992);
  }, 30_000);

  it('turning a plate a quarter turn leaves its frequencies unchanged', () => {
    const a = dryModes(plate(2, C, S, F, C), 12);
    const b = dryModes({ ...plate(0.5, C, S, F, C), widthM: 1, heightM: 2, edges: { left: S, right: C, bottom: F, top: C } }, 12);
    if (!a.ok || !b.ok) throw new Error('solve failed');
    // Same plate, axes swapped: identical eigenvalues to round-off.
    for (let i = 0; i < 6; i++) expectClose(b.modes.omega2[i], a.modes.omega2[i], { rtol: 1e-9, label: `mode ${i + 1}` });
  });

  it('frequencies fall as Ritz terms are added (upper bounds) and settle by the default 10 terms', () => {
    const p = plate(1, C, F, F, F);
    const f6 = lambdas(p, 3, 6);
    const f10 = lambdas(p, 3, 10);
    const f16 = lambdas(p, 3, 16);
    for (let i = 0; i < 3; i++) {
      expect(f10[i]).toBeLessThanOrEqual(f6[i] * (1 + 1e-12));
      expect(f16[i]).toBeLessThanOrEqual(f10[i] * (1 + 1e-12));
      // Convergence criterion (common practice, no source): the default resolution within 0.05 % of a finer one.
      expectClose(f10[i], f16[i], { rtol: 5e-4, label: `CFFF convergence mode ${i + 1}` });
    }
  });
});
