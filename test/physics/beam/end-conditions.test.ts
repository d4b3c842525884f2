import { describe, expect, it } from 'vitest';
import { assembleMember, buildMesh, initialCounts, meshBreakpoints, solveMember, type MemberSupport } from '../../../src/physics/beam';
import { lowestModesBanded } from '../../../src/physics/linalg/eigen-lanczos';
import { expectClose } from '../../helpers/expect-close';
import { beamFrequency, uniformMember, uniformProps } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();

/**
 * Euler–Bernoulli eigenvalues λ1..λ4 (docs/sources.md §S1): W.T. Thomson, Theory of Vibration with
 * Applications, Table 9.5-1 and App. D; R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1.
 */
const CASES: { ends: string; supports: MemberSupport[]; lambdas: number[] }[] = [
  { ends: 'clamped–free', supports: [{ atM: 0, kind: 'clamped' }], lambdas: [1.875104, 4.694091, 7.854757, 10.995541] },
  { ends: 'clamped–clamped', supports: [{ atM: 0, kind: 'clamped' }, { atM: L, kind: 'clamped' }], lambdas: [4.730041, 7.853205, 10.995608, 14.137165] },
  { ends: 'pinned–pinned', supports: [{ atM: 0, kind: 'pinned' }, { atM: L, kind: 'pinned' }], lambdas: [Math.PI, 2 * Math.PI, 3 * Math.PI, 4 * Math.PI] },
  { ends: 'clamped–pinned', supports: [{ atM: 0, kind: 'clamped' }, { atM: L, kind: 'pinned' }], lambdas: [3.926602, 7.068583, 10.210176, 13.351769] },
  { ends: 'clamped–guided', supports: [{ atM: 0, kind: 'clamped' }, { atM: L, kind: 'guided' }], lambdas: [2.36502, 5.497804, 8.63938, 11.780972] },
];

describe('uniform beams match the published eigenvalues for every end condition', () => {
  for (const c of CASES) {
    it(`${c.ends}: first four modes within 0.01 % of Thomson / Blevins`, () => {
      const out = solveMember(uniformMember(L, c.supports, { modes: 4 }));
      if (!out.ok) throw new Error(out.message);
      c.lambdas.forEach((lam, i) => {
        // 0.01 %: the acceptance tolerance; the tables give λ to 7 significant figures (λ² error < 1e-6).
        expectClose(out.result.dry.frequenciesHz[i], beamFrequency(lam, L, ei, m), { rtol: 1e-4, label: `${c.ends} mode ${i + 1}` });
      });
    });
  }

  it('clamped–free frequency ratios f2/f1 and f3/f1 match Thomson App. D (6.2669, 17.5475)', () => {
    const out = solveMember(uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 3 }));
    if (!out.ok) throw new Error(out.message);
    const f = out.result.dry.frequenciesHz;
    // Published to 5 significant figures: tolerance 1e-4 relative.
    expectClose(f[1] / f[0], 6.2669, { rtol: 1e-4, label: 'f2/f1' });
    expectClose(f[2] / f[0], 17.5475, { rtol: 1e-4, label: 'f3/f1' });
  });

  it('free–free: exactly two zero modes, then the published elastic eigenvalues (lower-level API, no supports)', () => {
    const model = uniformMember(L, []);
    const breaks = meshBreakpoints(model);
    const system = assembleMember(model, buildMesh(model, breaks, initialCounts(breaks, 80)), null);
    const out = lowestModesBanded(system.kTotal, system.mDry, 7);
    if (!out.ok) throw new Error(out.message);
    const elastic = [4.730041, 7.853205, 10.995608, 14.137165].map((lam) => beamFrequency(lam, L, ei, m));
    const omega1 = 2 * Math.PI * elastic[0];
    // Rigid-body modes: λ = ω² at rounding level relative to the first elastic ω² (1e-8 allows for the shift solve).
    expect(Math.abs(out.values[0])).toBeLessThan(1e-8 * omega1 * omega1);
    expect(Math.abs(out.values[1])).toBeLessThan(1e-8 * omega1 * omega1);
    expect(out.values[2]).toBeGreaterThan(0.5 * omega1 * omega1);
    for (let i = 0; i < 4; i++) {
      const f = Math.sqrt(out.values[i + 2]) / (2 * Math.PI);
      // 80 elements: Hermite-cubic error ~ (kh)⁴ is far below the 0.01 % asked (Blevins Table 8-1).
      expectClose(f, elastic[i], { rtol: 1e-4, label: `free–free elastic mode ${i + 1}` });
    }
  });
});
