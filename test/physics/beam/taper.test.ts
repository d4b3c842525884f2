import { describe, it } from 'vitest';
import { sectionAt, solveMember, type MemberModel, type MemberSegment } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';

const L = 2;
const steel = { youngsModulusPa: 210e9, densityKgPerM3: 7850 };

function cantilever(seg: Omit<MemberSegment, 'fromM' | 'toM'>, modes = 2): MemberModel {
  return { lengthM: L, segments: [{ ...seg, fromM: 0, toM: L }], supports: [{ atM: 0, kind: 'clamped' }], modes, mesh: { relativeTolerance: 1e-5 } };
}

/**
 * Cross-check by a second, independent route (derived here, not a published source): shooting on
 * (EI w″)″ = ω² m w with classical RK4, clamped at z = 0, bisection on ω for M(L) = V(L) = 0.
 */
function shootingOmega(ei: (z: number) => number, m: (z: number) => number, lo: number, hi: number): number {
  const steps = 4000;
  const h = L / steps;
  const endDet = (omega: number): number => {
    const w2 = omega * omega;
    const rhs = (z: number, y: number[]) => [y[1], y[2] / ei(z), y[3], w2 * m(z) * y[0]];
    const ends = [[0, 0, 1, 0], [0, 0, 0, 1]].map((y0) => {
      let y = y0;
      for (let i = 0; i < steps; i++) {
        const z = i * h;
        const k1 = rhs(z, y);
        const k2 = rhs(z + h / 2, y.map((v, j) => v + (h / 2) * k1[j]));
        const k3 = rhs(z + h / 2, y.map((v, j) => v + (h / 2) * k2[j]));
        const k4 = rhs(z + h, y.map((v, j) => v + h * k3[j]));
        y = y.map((v, j) => v + (h / 6) * (k1[j] + 2 * k2[j] + 2 * k3[j] + k4[j]));
      }
      return y;
    });
    return ends[0][2] * ends[1][3] - ends[0][3] * ends[1][2];
  };
  let a = lo;
  let b = hi;
  let fa = endDet(a);
  if (fa * endDet(b) > 0) throw new Error('no sign change in the bracket');
  for (let i = 0; i < 60; i++) {
    const c = 0.5 * (a + b);
    const fc = endDet(c);
    if (fa * fc <= 0) b = c;
    else {
      a = c;
      fa = fc;
    }
  }
  return 0.5 * (a + b);
}

describe('tapered cantilevers', () => {
  it('a tube tapering 0.3 → 0.15 m matches a shooting-method solution in its first two modes', () => {
    const seg = {
      ...steel,
      section: { shape: 'tube' as const, outerDiameterM: 0.3, wallThicknessM: 0.012 },
      endSection: { shape: 'tube' as const, outerDiameterM: 0.15, wallThicknessM: 0.008 },
    };
    const out = solveMember(cantilever(seg));
    if (!out.ok) throw new Error(out.message);
    const full = { ...seg, fromM: 0, toM: L };
    const ei = (z: number) => sectionAt(full, z / L).eiNm2;
    const m = (z: number) => sectionAt(full, z / L).structureKgPerM;
    out.result.dry.frequenciesHz.forEach((f, i) => {
      const omega = 2 * Math.PI * f;
      const ref = shootingOmega(ei, m, 0.97 * omega, 1.03 * omega);
      // Both routes are converged far below 1e-5 (RK4 with 4000 steps; mesh refined to 1e-5 change).
      expectClose(omega, ref, { rtol: 2e-5, label: `mode ${i + 1} vs shooting` });
    });
  });

  it('a cone (diameter tapering to a point) has ω1 = 8.719 √(EI₀ / (m₀ L⁴)) (Kirchhoff, from memory)', () => {
    // Classical result for a solid cone clamped at its base (G. Kirchhoff 1879; quoted as ω = 4.359 (r₀/L²)√(E/ρ)
    // in vibration texts) — from memory. The tip diameter is 1e-4 of the base: its effect is far below the tolerance.
    const seg = { ...steel, section: { shape: 'rod' as const, diameterM: 0.1 }, endSection: { shape: 'rod' as const, diameterM: 1e-5 } };
    const out = solveMember(cantilever(seg, 1));
    if (!out.ok) throw new Error(out.message);
    const p0 = sectionAt({ ...seg, fromM: 0, toM: L }, 0);
    const omega = 2 * Math.PI * out.result.dry.frequenciesHz[0];
    // The constant is recalled to 4 figures: 0.05 %.
    expectClose(omega / Math.sqrt(p0.eiNm2 / (p0.structureKgPerM * L ** 4)), 8.719, { rtol: 5e-4, label: 'cone coefficient' });
  });

  it('a wedge (plate thickness tapering to an edge) has ω1 = 5.315 √(EI₀ / (m₀ L⁴)) (Kirchhoff, from memory)', () => {
    // Classical wedge of constant width clamped at its thick end (Kirchhoff 1879), from memory.
    const seg = {
      ...steel,
      poissonRatio: 0,
      section: { shape: 'plate-strip' as const, widthM: 0.1, thicknessM: 0.02 },
      endSection: { shape: 'plate-strip' as const, widthM: 0.1, thicknessM: 2e-6 },
    };
    const out = solveMember(cantilever(seg, 1));
    if (!out.ok) throw new Error(out.message);
    const p0 = sectionAt({ ...seg, fromM: 0, toM: L }, 0);
    const omega = 2 * Math.PI * out.result.dry.frequenciesHz[0];
    expectClose(omega / Math.sqrt(p0.eiNm2 / (p0.structureKgPerM * L ** 4)), 5.315, { rtol: 5e-4, label: 'wedge coefficient' });
  });
});
