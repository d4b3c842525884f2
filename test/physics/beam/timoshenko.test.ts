import { describe, expect, it } from 'vitest';
import { cowperCircle, cowperRectangle, sectionAt, solveMember, type MemberModel } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';
import { PIPE, uniformMember } from './fixtures';

/**
 * Simply supported Timoshenko beam: with w = W sin kz, ψ = Ψ cos kz (k = nπ/L) the governing equations
 * m ẅ = κGA(w″ − ψ′), J ψ̈ = EI ψ″ + κGA(w′ − ψ) give
 * (κGA k² − m ω²)(EI k² + κGA − J ω²) − (κGA k)² = 0 (classical, S.P. Timoshenko 1921; derived here from the
 * governing equations); the lower root in ω² is the flexural mode.
 */
function timoshenkoPinnedPinned(n: number, L: number, ei: number, kga: number, m: number, j: number): number {
  const k = (n * Math.PI) / L;
  const a = m * j;
  const b = m * (ei * k * k + kga) + j * kga * k * k;
  const c = kga * ei * k ** 4;
  const w2 = (b - Math.sqrt(b * b - 4 * a * c)) / (2 * a);
  return Math.sqrt(w2) / (2 * Math.PI);
}

describe('Timoshenko option (shear deformation and rotary inertia)', () => {
  it('Cowper shear coefficients: solid circle 6(1+ν)/(7+6ν), thin tube 2(1+ν)/(4+3ν), rectangle 10(1+ν)/(12+11ν)', () => {
    // G.R. Cowper, J. Appl. Mech. 33 (1966) 335 (from memory); closed forms, so rounding only.
    expectClose(cowperCircle(0.3, 0), 7.8 / 8.8, { rtol: 1e-15, label: 'solid circle' });
    expectClose(cowperCircle(0.3, 1), 2.6 / 4.9, { rtol: 1e-15, label: 'thin tube limit' });
    expectClose(cowperRectangle(0.3), 13 / 15.3, { rtol: 1e-15, label: 'rectangle' });
  });

  it('a stubby pinned–pinned tube (L/D = 5) matches the exact Timoshenko frequencies in four modes', () => {
    const L = 2.5;
    // The element's shear strain is constant per element, so eigenvalues converge like h² rather than h⁴:
    // a tighter refinement tolerance than the default keeps the mesh error well under the 0.01 % checked.
    const model: MemberModel = {
      ...uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: L, kind: 'pinned' }], { modes: 4, mesh: { relativeTolerance: 2e-5 } }),
      beamTheory: 'timoshenko',
    };
    const out = solveMember(model);
    if (!out.ok) throw new Error(out.message);
    const p = sectionAt({ ...PIPE, toM: L }, 0);
    for (let n = 1; n <= 4; n++) {
      const exact = timoshenkoPinnedPinned(n, L, p.eiNm2, p.shearStiffnessN, p.structureKgPerM, p.rotaryInertiaKgM);
      // 0.01 %: the tolerance for beam eigenvalues; exact reference.
      expectClose(out.result.dry.frequenciesHz[n - 1], exact, { rtol: 1e-4, label: `mode ${n}` });
    }
    // The Euler–Bernoulli answer for the same member is higher, and it warns about the short length.
    const eb = solveMember({ ...model, beamTheory: 'euler-bernoulli' });
    if (!eb.ok) throw new Error(eb.message);
    expect(eb.result.dry.frequenciesHz[0]).toBeGreaterThan(out.result.dry.frequenciesHz[0]);
    expect(eb.result.warnings.join(' ')).toMatch(/below 10: shear deformation/);
    expect(out.result.warnings.join(' ')).not.toMatch(/below 10/);
  });

  it('approaches Euler–Bernoulli for a slender member, and is always below it', () => {
    const diff = (L: number): number => {
      const base = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 3 });
      const eb = solveMember(base);
      const ti = solveMember({ ...base, beamTheory: 'timoshenko' });
      if (!eb.ok || !ti.ok) throw new Error('solve failed');
      for (let i = 0; i < 3; i++) expect(ti.result.dry.frequenciesHz[i]).toBeLessThan(eb.result.dry.frequenciesHz[i]);
      return 1 - ti.result.dry.frequenciesHz[0] / eb.result.dry.frequenciesHz[0];
    };
    const short = diff(5);
    const long = diff(50);
    // Shear and rotary-inertia corrections scale like (D/L)² (classical): ten times longer, ~100× smaller.
    expect(long).toBeLessThan(short / 50);
    expect(long).toBeGreaterThan(0);
  });

  it('a tapered, wet Timoshenko member converges from above as elements double', () => {
    const model: MemberModel = {
      lengthM: 3,
      segments: [{ ...PIPE, fromM: 0, toM: 3, endSection: { shape: 'tube', outerDiameterM: 0.3, wallThicknessM: 0.015 } }],
      supports: [{ atM: 0, kind: 'clamped' }],
      liquid: { densityKgPerM3: 1025, fromM: 0, toM: 2 },
      beamTheory: 'timoshenko',
      modes: 3,
    };
    let prev: number[] | null = null;
    for (const ne of [4, 8, 16, 32]) {
      const out = solveMember({ ...model, mesh: { initialElements: ne, refine: false } });
      if (!out.ok) throw new Error(out.message);
      const f = out.result.wet!.frequenciesHz;
      // Conforming Ritz model on nested meshes: monotone from above (classical); 1e-12 for rounding.
      if (prev) for (let i = 0; i < 3; i++) expect(f[i]).toBeLessThanOrEqual(prev[i] * (1 + 1e-12));
      prev = f;
    }
  });
});
