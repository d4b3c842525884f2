/**
 * Dry modes of the rectangular plate by the Rayleigh–Ritz method on products of the one-direction
 * orthonormal bases, w(x, y) = Σ c_ij X_i(x) Y_j(y), index (i, j) → i·ny + j. Kirchhoff plate strain energy
 * (A.W. Leissa, Vibration of Plates, NASA SP-160, 1969, eq. 1.5):
 *   U = D/2 ∫∫ [w_xx² + w_yy² + 2ν w_xx w_yy + 2(1 − ν) w_xy²] dA,  D = E h³ / (12 (1 − ν²)),
 * kinetic energy T = ρh/2 ∫∫ ẇ² dA. The energy separates into one-direction integrals, so K is a sum of
 * Kronecker products; the orthonormal bases make M = ρh·I and the problem a standard symmetric one.
 * A rotational edge spring k_r adds k_r/2 ∫ (∂w/∂n)² ds along its edge (Leissa, NASA SP-160, §4.4 on elastically
 * restrained edges).
 */
import { denseSymmetricEigen } from '../linalg/eigen-dense';
import { basisQuadrature, integralMatrix, makeBasis, sampleBasis } from './basis';
import type { Basis1D } from './basis';
import { edgeSpring, geometricCondition } from './types';
import type { PlateInput } from './types';

export interface DryModes {
  bx: Basis1D;
  by: Basis1D;
  /** Unknowns nx·ny. */
  n: number;
  /** ω² of every Ritz mode, ascending (rad²/s²). */
  omega2: Float64Array;
  /** Coefficients of mode k at `[k·n … (k+1)·n)`, normalised to ∫∫ w² dA = 1 (generalised mass ρh). */
  vectors: Float64Array;
}

export type DryOutcome = { ok: true; modes: DryModes } | { ok: false; reason: 'basis-ill-conditioned' | 'not-converged'; message: string };

export function flexuralRigidity(p: PlateInput): number {
  return (p.youngsModulusPa * p.thicknessM ** 3) / (12 * (1 - p.poissonRatio ** 2));
}

function directionMatrices(b: Basis1D) {
  const { x, w } = basisQuadrature(b.count, b.lengthM);
  const s = sampleBasis(b, x);
  return {
    e22: integralMatrix(s.d2, b.count, s.d2, b.count, w),
    e20: integralMatrix(s.d2, b.count, s.v, b.count, w),
    e11: integralMatrix(s.d1, b.count, s.d1, b.count, w),
  };
}

/** All Ritz modes with `terms` functions per direction. */
export function dryModes(p: PlateInput, terms: number): DryOutcome {
  const e = p.edges;
  const bx = makeBasis(terms, p.widthM, geometricCondition(e.left), geometricCondition(e.right));
  const by = makeBasis(terms, p.heightM, geometricCondition(e.bottom), geometricCondition(e.top));
  if (!bx || !by) return { ok: false, reason: 'basis-ill-conditioned', message: `the plate basis of ${terms} terms per direction is numerically singular; use fewer terms` };
  const X = directionMatrices(bx);
  const Y = directionMatrices(by);
  const nx = bx.count;
  const ny = by.count;
  const n = nx * ny;
  const D = flexuralRigidity(p);
  const nu = p.poissonRatio;
  const scale = D / (p.densityKgPerM3 * p.thicknessM);
  const k = new Float64Array(n * n);
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const r = i * ny + j;
      for (let a = 0; a < nx; a++) {
        const ia = i * nx + a;
        const ai = a * nx + i;
        const xi0 = i === a ? 1 : 0;
        for (let b = 0; b < ny; b++) {
          const jb = j * ny + b;
          const bj = b * ny + j;
          const yj0 = j === b ? 1 : 0;
          // E(p,q)_ia = ∫ X_i^(p) X_a^(q) dx; the orthonormal basis makes E(0,0) = I.
          const v =
            X.e22[ia] * yj0 +
            xi0 * Y.e22[jb] +
            nu * (X.e20[ia] * Y.e20[bj] + X.e20[ai] * Y.e20[jb]) +
            2 * (1 - nu) * X.e11[ia] * Y.e11[jb];
          k[r * n + a * ny + b] = scale * v;
        }
      }
    }
  }
  addEdgeSprings(k, bx, by, [edgeSpring(e.left), edgeSpring(e.right)], [edgeSpring(e.bottom), edgeSpring(e.top)], 1 / (p.densityKgPerM3 * p.thicknessM));
  const eig = denseSymmetricEigen(k, n);
  if (!eig.ok) return { ok: false, reason: 'not-converged', message: 'the dense eigen-solver did not converge on the plate stiffness' };
  return { ok: true, modes: { bx, by, n, omega2: eig.values, vectors: eig.vectors } };
}

/**
 * Edge springs: k_r X_i′(edge) X_a′(edge) δ_jb for the left and right edges (k_r Y_j′ Y_b′ δ_ia for bottom and
 * top), the δ from the orthonormal basis along the edge; scaled by 1/(ρh) like the rest of K.
 */
function addEdgeSprings(k: Float64Array, bx: Basis1D, by: Basis1D, kx: number[], ky: number[], scale: number): void {
  const nx = bx.count;
  const ny = by.count;
  const n = nx * ny;
  const sx = sampleBasis(bx, Float64Array.of(0, bx.lengthM));
  const sy = sampleBasis(by, Float64Array.of(0, by.lengthM));
  for (let end = 0; end < 2; end++) {
    if (kx[end] > 0) {
      for (let i = 0; i < nx; i++) for (let a = 0; a < nx; a++) {
        const v = scale * kx[end] * sx.d1[i * 2 + end] * sx.d1[a * 2 + end];
        for (let j = 0; j < ny; j++) k[(i * ny + j) * n + a * ny + j] += v;
      }
    }
    if (ky[end] > 0) {
      for (let j = 0; j < ny; j++) for (let b = 0; b < ny; b++) {
        const v = scale * ky[end] * sy.d1[j * 2 + end] * sy.d1[b * 2 + end];
        for (let i = 0; i < nx; i++) k[(i * ny + j) * n + i * ny + b] += v;
      }
    }
  }
}

/**
 * Deflections of the first `count` modes at the tensor grid xs × ys, layout `[mode][iy·xs.length + ix]`.
 */
export function modeValuesOnGrid(m: DryModes, vectors: Float64Array, count: number, xs: Float64Array, ys: Float64Array): Float64Array[] {
  const sx = sampleBasis(m.bx, xs);
  const sy = sampleBasis(m.by, ys);
  const nx = m.bx.count;
  const ny = m.by.count;
  const gx = xs.length;
  const gy = ys.length;
  const out: Float64Array[] = [];
  const tmp = new Float64Array(nx * gy); // Σ_j c_ij Y_j(y) for each i and y
  for (let k = 0; k < count; k++) {
    const c = vectors.subarray(k * m.n, (k + 1) * m.n);
    tmp.fill(0);
    for (let i = 0; i < nx; i++) {
      for (let j = 0; j < ny; j++) {
        const cij = c[i * ny + j];
        if (cij === 0) continue;
        for (let q = 0; q < gy; q++) tmp[i * gy + q] += cij * sy.v[j * gy + q];
      }
    }
    const w = new Float64Array(gx * gy);
    for (let i = 0; i < nx; i++) {
      for (let q = 0; q < gy; q++) {
        const t = tmp[i * gy + q];
        for (let p = 0; p < gx; p++) w[q * gx + p] += t * sx.v[i * gx + p];
      }
    }
    out.push(w);
  }
  return out;
}
