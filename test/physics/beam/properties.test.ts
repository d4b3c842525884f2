import { describe, expect, it } from 'vitest';
import { assembleMember, buildMesh, initialCounts, meshBreakpoints, sectionAt, solveMember, type MemberModel } from '../../../src/physics/beam';
import { symBandedMul, symBandedToDense } from '../../../src/physics/linalg/banded';
import { lowestModesBanded } from '../../../src/physics/linalg/eigen-lanczos';
import { denseGeneralizedEigen, denseLowestModesByInversion } from '../../../src/physics/linalg/eigen-dense';
import { expectClose } from '../../helpers/expect-close';
import { PIPE, uniformMember, uniformProps } from './fixtures';

/** A non-uniform member: taper, two materials, contents, growth, a mass, springs and partial submergence. */
const MIXED: MemberModel = {
  lengthM: 18,
  segments: [
    { ...PIPE, fromM: 0, toM: 8, section: { shape: 'tube', outerDiameterM: 0.9, wallThicknessM: 0.025 }, endSection: { shape: 'tube', outerDiameterM: 0.6, wallThicknessM: 0.02 }, contentsDensityKgPerM3: 1025 },
    { ...PIPE, fromM: 8, toM: 18, section: { shape: 'tube', outerDiameterM: 0.6, wallThicknessM: 0.02 }, coating: { thicknessM: 0.05, densityKgPerM3: 1325 } },
  ],
  supports: [
    { atM: 0, kind: 'spring', translationalStiffnessNPerM: 5e7, rotationalStiffnessNmPerRad: 2e8 },
    { atM: 12, kind: 'pinned' },
  ],
  masses: [{ atM: 18, massKg: 1500, rotaryInertiaKgM2: 200 }],
  liquid: { densityKgPerM3: 1025, fromM: 0, toM: 10 },
  tensionN: 2e5,
};

function system(model: MemberModel, elements: number) {
  const breaks = meshBreakpoints(model);
  return assembleMember(model, buildMesh(model, breaks, initialCounts(breaks, elements)), null);
}

describe('properties of the member model', () => {
  for (const theory of ['euler-bernoulli', 'timoshenko'] as const) {
    it(`${theory}: rigid-body motions strain nothing and the mass matrix holds the total mass`, () => {
      // Same member without supports, springs or tension: K (a + b z) must vanish (classical consistency).
      const free: MemberModel = { ...MIXED, supports: [], tensionN: 0, beamTheory: theory };
      const s = system(free, 24);
      const z = s.mesh.z;
      const translate = new Float64Array(s.n);
      const rotate = new Float64Array(s.n);
      for (let i = 0; i < z.length; i++) {
        translate[s.dofMap[2 * i]] = 1;
        rotate[s.dofMap[2 * i]] = z[i];
        rotate[s.dofMap[2 * i + 1]] = 1;
      }
      const scale = Math.max(...s.kTotal.data.map(Math.abs));
      for (const [name, u] of [['translation', translate], ['rotation', rotate]] as const) {
        const ku = symBandedMul(s.kTotal, u);
        // Rounding only: entries of K are O(scale) and cancel.
        for (let i = 0; i < s.n; i++) expectClose(ku[i], 0, { atol: 1e-9 * scale * 20, label: `K·${name} row ${i}` });
      }
      // uᵀ M u for a unit translation = ∫ m dz + Σ lumped masses (consistent mass, 5-point Gauss exact for tapers).
      const mu = symBandedMul(s.mDry, translate);
      let total = 0;
      for (let i = 0; i < s.n; i++) total += translate[i] * mu[i];
      let expected = 1500;
      for (const seg of free.segments) {
        const len = seg.toM - seg.fromM;
        // Simpson's rule is exact for the quadratic mass per metre of a linear taper.
        const mAt = (t: number) => {
          const p = sectionAt(seg, t);
          return p.structureKgPerM + p.contentsKgPerM + p.coatingKgPerM;
        };
        expected += (len / 6) * (mAt(0) + 4 * mAt(0.5) + mAt(1));
      }
      expectClose(total, expected, { rtol: 1e-12, label: 'total mass' });
    });
  }

  it('mode shapes are orthonormal in the mass matrix', () => {
    const s = system(MIXED, 40);
    const out = lowestModesBanded(s.kTotal, s.mDry, 6);
    if (!out.ok) throw new Error(out.message);
    const n = s.n;
    for (let a = 0; a < 6; a++) {
      const mx = symBandedMul(s.mDry, out.vectors.subarray(a * n, (a + 1) * n));
      for (let b = 0; b < 6; b++) {
        let dot = 0;
        for (let i = 0; i < n; i++) dot += out.vectors[b * n + i] * mx[i];
        // Rayleigh–Ritz on M-orthonormal Lanczos vectors: orthonormal to rounding.
        expectClose(dot, a === b ? 1 : 0, { atol: 1e-10, label: `φ${a}ᵀMφ${b}` });
      }
    }
  });

  it('banded Lanczos agrees with the dense reference solvers on a non-uniform member', () => {
    const s = system(MIXED, 60);
    const kd = symBandedToDense(s.kTotal);
    const md = symBandedToDense(s.mDry);
    const lan = lowestModesBanded(s.kTotal, s.mDry, 8);
    const inverted = denseLowestModesByInversion(kd, md, s.n);
    const direct = denseGeneralizedEigen(kd, md, s.n);
    if (!lan.ok || !inverted.ok || !direct.ok) throw new Error('solver failed');
    for (let i = 0; i < 8; i++) {
      // Inverted pair keeps relative accuracy on low modes: agreement near the problem's rounding limit (~ε·N³).
      expectClose(lan.values[i], inverted.values[i], { rtol: 1e-9, label: `λ${i + 1} vs dense inverted pair` });
      // Direct pair: absolute error ~ε·λmax, so the relative error of low modes is larger (λmax/λ1 ~ 1e9 here).
      expectClose(lan.values[i], direct.values[i], { rtol: 1e-5, label: `λ${i + 1} vs dense direct pair` });
    }
  });

  it('frequencies fall monotonically towards the converged value as elements double', () => {
    // Nested meshes (each element halved), as the refinement makes them.
    const breaks = meshBreakpoints(MIXED);
    const base = initialCounts(breaks, 10);
    const lambdas = [1, 2, 4, 8, 16].map((factor) => {
      const s = assembleMember(MIXED, buildMesh(MIXED, breaks, base.map((c) => c * factor)), null);
      const out = lowestModesBanded(s.kTotal, s.mDry, 5);
      if (!out.ok) throw new Error(out.message);
      return out.values;
    });
    const finest = lambdas[lambdas.length - 1];
    for (let level = 1; level < lambdas.length; level++) {
      for (let i = 0; i < 5; i++) {
        // Conforming Hermite elements, consistent mass, exact geometric stiffness: Rayleigh–Ritz upper bounds
        // on nested subspaces (classical). 1e-10 allows for rounding, which grows like ε·N³ with N elements.
        expect(lambdas[level][i]).toBeLessThanOrEqual(lambdas[level - 1][i] * (1 + 1e-10));
        expect(lambdas[level - 1][i]).toBeGreaterThanOrEqual(finest[i] * (1 - 1e-10));
      }
    }
    // And the change shrinks: Hermite cubics converge like h⁴ in the eigenvalue (about 16× per doubling).
    const change = (a: Float64Array, b: Float64Array) => Math.abs(a[4] - b[4]) / b[4];
    expect(change(lambdas[1], lambdas[2])).toBeLessThan(change(lambdas[0], lambdas[1]) / 8);
  });

  it('refinement stops when modes change by less than the tolerance and reports the element count', () => {
    const out = solveMember({ ...MIXED, modes: 5 });
    if (!out.ok) throw new Error(out.message);
    const mesh = out.result.mesh;
    expect(mesh.converged).toBe(true);
    expect(mesh.lastChangePercent!).toBeLessThan(0.05);
    expect(mesh.elements).toBe(mesh.history[mesh.history.length - 1]);
    expect(mesh.history.length).toBeGreaterThan(1);
  });

  it('turning the member end for end leaves the frequencies unchanged', () => {
    const L = MIXED.lengthM;
    const flip = (z: number) => L - z;
    const flipped: MemberModel = {
      ...MIXED,
      segments: [...MIXED.segments].reverse().map((s) => ({
        ...s,
        fromM: flip(s.toM),
        toM: flip(s.fromM),
        section: s.endSection ?? s.section,
        ...(s.endSection ? { endSection: s.section } : {}),
      })),
      supports: MIXED.supports.map((s) => ({ ...s, atM: flip(s.atM) })),
      masses: MIXED.masses!.map((m) => ({ ...m, atM: flip(m.atM) })),
      liquid: { ...MIXED.liquid!, fromM: flip(MIXED.liquid!.toM), toM: flip(MIXED.liquid!.fromM) },
    };
    const a = solveMember({ ...MIXED, mesh: { initialElements: 36, refine: false } });
    const b = solveMember({ ...flipped, mesh: { initialElements: 36, refine: false } });
    if (!a.ok || !b.ok) throw new Error('solve failed');
    // Mirror-image meshes give the same discrete eigenproblem up to DOF sign changes: rounding only.
    for (let i = 0; i < 5; i++) {
      expectClose(b.result.dry.frequenciesHz[i], a.result.dry.frequenciesHz[i], { rtol: 1e-9, label: `dry mode ${i + 1}` });
      expectClose(b.result.wet!.frequenciesHz[i], a.result.wet!.frequenciesHz[i], { rtol: 1e-9, label: `wet mode ${i + 1}` });
    }
  });

  it('splitting a uniform segment in two changes nothing', () => {
    const L = 12;
    const one = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { mesh: { initialElements: 24, refine: false } });
    const two: MemberModel = { ...one, segments: [{ ...PIPE, fromM: 0, toM: 5 }, { ...PIPE, fromM: 5, toM: L }] };
    const a = solveMember(one);
    const b = solveMember(two);
    if (!a.ok || !b.ok) throw new Error('solve failed');
    // The meshes differ (5 m becomes a node of the second), so both are compared with the published values (Thomson Table 9.5-1).
    const ref = beamRef(L);
    for (let i = 0; i < 3; i++) {
      expectClose(a.result.dry.frequenciesHz[i], ref[i], { rtol: 2e-4, label: `one segment mode ${i + 1}` });
      expectClose(b.result.dry.frequenciesHz[i], ref[i], { rtol: 2e-4, label: `two segments mode ${i + 1}` });
    }
  });

  it('shapes are normalised to a largest displacement of +1 and modal mass matches m L / 2 for pinned–pinned', () => {
    const L = 10;
    const out = solveMember(uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: L, kind: 'pinned' }], { modes: 3 }));
    if (!out.ok) throw new Error(out.message);
    const { m } = uniformProps();
    for (const mode of out.result.dry.modes) {
      expect(Math.max(...mode.shape.displacement)).toBeCloseTo(1, 12);
      expect(Math.min(...mode.shape.displacement)).toBeGreaterThanOrEqual(-1 - 1e-12);
      // Classical: ∫ m sin²(nπz/L) dz = m L / 2. Shape peak between nodes makes the node-normalised mass slightly larger.
      expectClose(mode.modalMassKg, (m * L) / 2, { rtol: 2e-3, label: `modal mass mode ${mode.mode}` });
    }
  });
});

/** Clamped–free fixture frequencies from Thomson Table 9.5-1 λ values (first three). */
function beamRef(L: number): number[] {
  const { ei, m } = uniformProps();
  return [1.875104, 4.694091, 7.854757].map((lam) => ((lam * lam) / (2 * Math.PI * L * L)) * Math.sqrt(ei / m));
}
