import { describe, expect, it } from 'vitest';
import { GRAVITY, solveMember } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';
import { uniformMember, uniformProps } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();
const pinned = [
  { atM: 0, kind: 'pinned' as const },
  { atM: L, kind: 'pinned' as const },
];

/** Blevins, beams with axial load (docs/sources.md §S1.3): f_n = (n²π / 2L²) √(EI/m) √(1 + T L² / (n²π² EI)). */
function blevins(n: number, t: number): number {
  return ((n * n * Math.PI) / (2 * L * L)) * Math.sqrt(ei / m) * Math.sqrt(1 + (t * L * L) / (n * n * Math.PI * Math.PI * ei));
}

describe('axial tension', () => {
  it('pinned–pinned under tension matches the exact formula (Blevins)', () => {
    const t = (2 * Math.PI * Math.PI * ei) / (L * L); // twice the Euler load, as tension
    const out = solveMember(uniformMember(L, pinned, { modes: 4, tensionN: t }));
    if (!out.ok) throw new Error(out.message);
    // 0.01 %: the exact formula; mesh converged to 0.05 % change, error ≈ change/15.
    for (let n = 1; n <= 4; n++) expectClose(out.result.dry.frequenciesHz[n - 1], blevins(n, t), { rtol: 1e-4, label: `mode ${n}` });
  });

  it('pinned–pinned under compression below the Euler load matches the same formula with negative T', () => {
    const t = (-0.6 * Math.PI * Math.PI * ei) / (L * L);
    const out = solveMember(uniformMember(L, pinned, { modes: 3, tensionN: t }));
    if (!out.ok) throw new Error(out.message);
    // Classical: f1 = f1,0 √(1 − P/P_E); same exact formula (Blevins), compression as negative T.
    for (let n = 1; n <= 3; n++) expectClose(out.result.dry.frequenciesHz[n - 1], blevins(n, t), { rtol: 1e-4, label: `mode ${n}` });
  });

  it('approaches the taut-string frequencies n/(2L)·√(T/m) when T L² ≫ EI', () => {
    const t = 1e6 * (ei / (L * L));
    const out = solveMember(uniformMember(L, pinned, { modes: 3, tensionN: t }));
    if (!out.ok) throw new Error(out.message);
    for (let n = 1; n <= 3; n++) {
      const string = (n / (2 * L)) * Math.sqrt(t / m); // classical taut string
      // Bending adds a factor √(1 + n²π²EI/(T L²)) ≈ 1 + 5e-6 n² here: 1e-4 covers it and the mesh error.
      expectClose(out.result.dry.frequenciesHz[n - 1], string, { rtol: 1e-4, label: `string mode ${n}` });
    }
  });

  it('a hanging chain (tension from its own weight, negligible EI) matches Bernoulli’s Bessel-zero frequencies', () => {
    // Classical (D. Bernoulli; Lord Rayleigh, Theory of Sound): chain hanging from the top, free at the bottom,
    // ω_n = (j₀,ₙ / 2) √(g / L), j₀,ₙ = 2.404826, 5.520078, 8.653728 (zeros of J₀).
    const seg = { section: { shape: 'rod' as const, diameterM: 0.01 }, youngsModulusPa: 1e3, densityKgPerM3: 7850 };
    const mass = 7850 * Math.PI * 0.005 ** 2;
    const model = uniformMember(L, [{ atM: L, kind: 'pinned' }], { modes: 3, tensionN: GRAVITY * mass * L, tensionVariesWithWeight: true }, seg);
    const out = solveMember(model);
    if (!out.ok) throw new Error(out.message);
    expectClose(out.result.tension.bottomN, 0, { atol: 1e-9 * GRAVITY * mass * L, label: 'tension at the free end' });
    [2.404826, 5.520078, 8.653728].forEach((j, i) => {
      const exact = (j / 2) * Math.sqrt(GRAVITY / L) / (2 * Math.PI);
      // EI = 5e-7 N·m² against T ~ 6 N: bending stiffens the chain by far less than 0.1 %.
      expectClose(out.result.dry.frequenciesHz[i], exact, { rtol: 1e-3, label: `chain mode ${i + 1}` });
    });
  });

  it('tension varying with submerged weight falls by the effective weight per metre times the length', () => {
    const contents = 1025;
    const model = uniformMember(
      L,
      pinned,
      { tensionN: 5e5, tensionVariesWithWeight: true, liquid: { densityKgPerM3: 1025, fromM: 0, toM: 6 } },
      { contentsDensityKgPerM3: contents },
    );
    const out = solveMember(model);
    if (!out.ok) throw new Error(out.message);
    const { m: mDry } = uniformProps({ contentsDensityKgPerM3: contents });
    const displaced = 1025 * Math.PI * 0.25 ** 2;
    // Derived: effective weight g(m − ρA) in the liquid, g m in air; exact for a uniform member.
    const drop = GRAVITY * (mDry * L - displaced * 6);
    expectClose(out.result.tension.bottomN, 5e5 - drop, { rtol: 1e-12, label: 'bottom tension' });
  });

  it('frequencies with varying tension lie between those at the constant bottom and top tensions', () => {
    const top = 4e5;
    const varying = solveMember(uniformMember(L, pinned, { modes: 3, tensionN: top, tensionVariesWithWeight: true }));
    if (!varying.ok) throw new Error(varying.message);
    const bottom = varying.result.tension.bottomN;
    const lo = solveMember(uniformMember(L, pinned, { modes: 3, tensionN: bottom }));
    const hi = solveMember(uniformMember(L, pinned, { modes: 3, tensionN: top }));
    if (!lo.ok || !hi.ok) throw new Error('solve failed');
    // Geometric stiffness grows with T everywhere, so each Rayleigh quotient is bracketed (minimax property).
    for (let i = 0; i < 3; i++) {
      expect(varying.result.dry.frequenciesHz[i]).toBeGreaterThan(lo.result.dry.frequenciesHz[i]);
      expect(varying.result.dry.frequenciesHz[i]).toBeLessThan(hi.result.dry.frequenciesHz[i]);
    }
  });
});
