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
import type { EdgeCondition, PlateInput } from './types';
import { BoundedMemo } from '../memo/bounded-memo';

export interface DryModes {
  bx: Basis1D;
  by: Basis1D;
  /** Unknowns nx·ny. */
  n: number;
  /** ω² of every Ritz mode, ascending (rad²/s²). */
  omega2: Float64Array;
  /** Coefficients of mode k at `[k·n … (k+1)·n)`, normalised to ∫∫ w² dA = 1 (generalised mass ρh). Shared: read-only. */
  vectors: Float64Array;
  /** Every input that determines `bx`, `by` and `vectors` (terms, sides, Poisson's ratio, edges), for memos built on them. */
  shapeKey: string;
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

/** Ritz modes of K̂ = K ρh / D (geometry, Poisson's ratio and edges only), shared between plates that differ in E, h or ρ. */
type NormalModes = { ok: true; bx: Basis1D; by: Basis1D; n: number; lambda: Float64Array; vectors: Float64Array } | { ok: false; reason: 'basis-ill-conditioned' | 'not-converged'; message: string };

/** Up to 8 shapes of plate kept (a handful of geometries edited back and forth, each at the default and coarse order). */
const normalMemo = new BoundedMemo<NormalModes>(8);

/** Forgets the memoised shapes (benchmarks of a first solve; tests of the memo). */
export function clearDryMemo(): void {
  normalMemo.clear();
}

/**
 * All Ritz modes with `terms` functions per direction. K = (D/ρh) K̂ with K̂ built from the shape alone (edge
 * springs enter as k_r/D), so the eigenvectors are those of K̂ and ω² = (D/ρh) λ̂; K̂'s modes are memoised.
 */
export function dryModes(p: PlateInput, terms: number): DryOutcome {
  const e = p.edges;
  const D = flexuralRigidity(p);
  const springs = [e.left, e.right, e.bottom, e.top].map((x) => edgeSpring(x) / D);
  const conditions = [e.left, e.right, e.bottom, e.top].map(geometricCondition);
  const key = [terms, p.widthM, p.heightM, p.poissonRatio, ...conditions, ...springs].join('|');
  const m = normalMemo.get(key, () => normalModes(p, terms, conditions, springs));
  if (!m || !m.ok) return m ?? { ok: false, reason: 'not-converged', message: 'the dense eigen-solver did not converge on the plate stiffness' };
  const scale = D / (p.densityKgPerM3 * p.thicknessM);
  const omega2 = new Float64Array(m.lambda.length);
  for (let i = 0; i < omega2.length; i++) omega2[i] = scale * m.lambda[i];
  return { ok: true, modes: { bx: m.bx, by: m.by, n: m.n, omega2, vectors: m.vectors, shapeKey: key } };
}

function normalModes(p: PlateInput, terms: number, c: EdgeCondition[], springs: number[]): NormalModes {
  const bx = makeBasis(terms, p.widthM, c[0], c[1]);
  const by = makeBasis(terms, p.heightM, c[2], c[3]);
  if (!bx || !by) return { ok: false, reason: 'basis-ill-conditioned', message: `the plate basis of ${terms} terms per direction is numerically singular; use fewer terms` };
  const X = directionMatrices(bx);
  const Y = directionMatrices(by);
  const nx = bx.count;
  const ny = by.count;
  const n = nx * ny;
  const nu = p.poissonRatio;
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
          k[r * n + a * ny + b] =
            X.e22[ia] * yj0 +
            xi0 * Y.e22[jb] +
            nu * (X.e20[ia] * Y.e20[bj] + X.e20[ai] * Y.e20[jb]) +
            2 * (1 - nu) * X.e11[ia] * Y.e11[jb];
        }
      }
    }
  }
  addEdgeSprings(k, bx, by, [springs[0], springs[1]], [springs[2], springs[3]], 1);
  // Equal edges at both ends of a direction make the plate symmetric about its mid-line there: the orthonormal
  // functions then alternate even, odd (Legendre parity times a symmetric edge factor), K̂ has no terms between
  // the parities, and the problem splits into independent blocks (a quarter of the work per split direction).
  const eig = blockEigen(k, nx, ny, c[0] === c[1] && springs[0] === springs[1], c[2] === c[3] && springs[2] === springs[3]);
  if (!eig) return { ok: false, reason: 'not-converged', message: 'the dense eigen-solver did not converge on the plate stiffness' };
  return { ok: true, bx, by, n, lambda: eig.values, vectors: eig.vectors };
}

/**
 * All eigenpairs of the symmetric K (row-major, index i·ny + j), solved per parity class of (i, j) in each
 * symmetric direction; ascending values, vector k at [k·n … (k+1)·n), zero outside its class.
 */
function blockEigen(k: Float64Array, nx: number, ny: number, symX: boolean, symY: boolean): { values: Float64Array; vectors: Float64Array } | null {
  const n = nx * ny;
  const classes: number[][] = [[], [], [], []];
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) classes[(symX ? (i & 1) * 2 : 0) + (symY ? j & 1 : 0)].push(i * ny + j);
  const values: number[] = [];
  const parts: { idx: number[]; vectors: Float64Array; at: number }[] = [];
  for (const idx of classes) {
    const m = idx.length;
    if (m === 0) continue;
    const sub = new Float64Array(m * m);
    for (let r = 0; r < m; r++) {
      const row = idx[r] * n;
      for (let s = 0; s < m; s++) sub[r * m + s] = k[row + idx[s]];
    }
    const eig = denseSymmetricEigen(sub, m);
    if (!eig.ok) return null;
    for (let r = 0; r < m; r++) {
      values.push(eig.values[r]);
      parts.push({ idx, vectors: eig.vectors, at: r });
    }
  }
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  const outValues = new Float64Array(n);
  const outVectors = new Float64Array(n * n);
  order.forEach((src, dst) => {
    outValues[dst] = values[src];
    const { idx, vectors, at } = parts[src];
    const m = idx.length;
    for (let s = 0; s < m; s++) outVectors[dst * n + idx[s]] = vectors[at * m + s];
  });
  return { values: outValues, vectors: outVectors };
}

/**
 * Edge springs: k_r X_i′(edge) X_a′(edge) δ_jb for the left and right edges (k_r Y_j′ Y_b′ δ_ia for bottom and
 * top), the δ from the orthonormal basis along the edge; `kx`, `ky` are k_r / D (K̂ = K ρh / D), times `scale`.
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
