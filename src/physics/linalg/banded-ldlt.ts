/**
 * LDLᵀ factorisation of a symmetric banded matrix without pivoting, with its inertia.
 *
 * By Sylvester's law of inertia the number of negative pivots of A = K − μM equals the number
 * of eigenvalues of K x = λ M x below μ (M positive definite): the Sturm sequence count used
 * to check that an eigen-solver missed no mode, and to detect buckling (K not positive definite).
 * Without pivoting the factorisation is backward stable for positive definite A (as Cholesky is);
 * for indefinite A it is used only for the count, which is the common practice in structural
 * eigen-solvers (K.-J. Bathe, Finite Element Procedures, Sturm sequence check).
 */
import type { SymBanded } from './banded';

/**
 * Factor of A = L D Lᵀ in the same layout as SymBanded: row k holds
 * `[d_k, l_{k+1,k}, …, l_{k+b,k}]` at `data[k·(b + 1) + 0 … b]` (L unit lower triangular, stored by columns).
 */
export interface LdltFactor {
  n: number;
  halfBandwidth: number;
  data: Float64Array;
  /** Number of pivots d_k < 0 (= eigenvalues below the shift). */
  negativePivots: number;
  /** Smallest |d_k| / |a_kk| over all k: near zero means A is (numerically) singular. */
  smallestPivotRatio: number;
}

export function createLdltFactor(n: number, halfBandwidth: number): LdltFactor {
  return { n, halfBandwidth, data: new Float64Array(n * (halfBandwidth + 1)), negativePivots: 0, smallestPivotRatio: Infinity };
}

/**
 * Factors A into `out` (A is not modified). An exactly zero pivot is replaced by a tiny
 * value (1e-14·|a_kk|, or 1e-300) so the count and solves still proceed; the ratio reports it.
 */
export function factorLdltInto(a: SymBanded, out: LdltFactor): LdltFactor {
  const { n, halfBandwidth: b } = a;
  if (out.n !== n || out.halfBandwidth !== b) throw new RangeError('factorLdltInto: factor buffer has the wrong size');
  const w = b + 1;
  const u = out.data;
  u.set(a.data);
  let negative = 0;
  let smallest = Infinity;
  for (let k = 0; k < n; k++) {
    const rk = k * w;
    const akk = Math.abs(a.data[rk]);
    let d = u[rk];
    if (d === 0) {
      d = akk > 0 ? 1e-14 * akk : 1e-300;
      u[rk] = d;
    }
    if (d < 0) negative++;
    const ratio = akk > 0 ? Math.abs(d) / akk : Math.abs(d) > 0 ? Infinity : 0;
    if (ratio < smallest) smallest = ratio;
    const last = Math.min(b, n - 1 - k);
    // Right-looking update of the trailing rows with the unscaled row k, then scale it into multipliers.
    for (let p = 1; p <= last; p++) {
      const ukp = u[rk + p];
      if (ukp === 0) continue;
      const l = ukp / d;
      const ri = (k + p) * w; // row i = k + p; entry (i, j) for j = k + q at slot q − p
      for (let q = p; q <= last; q++) u[ri + (q - p)] -= l * u[rk + q];
    }
    for (let p = 1; p <= last; p++) u[rk + p] /= d;
  }
  out.negativePivots = negative;
  out.smallestPivotRatio = smallest;
  return out;
}

export function factorLdlt(a: SymBanded): LdltFactor {
  return factorLdltInto(a, createLdltFactor(a.n, a.halfBandwidth));
}

/** Solves A x = rhs with the factor; `out` may be the same array as `rhs`. */
export function solveLdltInto(f: LdltFactor, rhs: Float64Array, out: Float64Array): Float64Array {
  const { n, halfBandwidth: b, data } = f;
  const w = b + 1;
  if (out !== rhs) out.set(rhs.subarray(0, n));
  // Half-bandwidth 3 (every beam matrix): the loops over the band written out, rows clear of the end only.
  const full = b === 3 ? n - 3 : 0;
  // L y = rhs (column-oriented: l_{k+p,k} sits in row k).
  for (let k = 0; k < n; k++) {
    const yk = out[k];
    if (yk === 0) continue;
    const rk = k * w;
    if (k < full) {
      out[k + 1] -= data[rk + 1] * yk;
      out[k + 2] -= data[rk + 2] * yk;
      out[k + 3] -= data[rk + 3] * yk;
      continue;
    }
    const last = Math.min(b, n - 1 - k);
    for (let p = 1; p <= last; p++) out[k + p] -= data[rk + p] * yk;
  }
  // D z = y and Lᵀ x = z in one backward pass (z_k = y_k / d_k is formed just before it is used).
  for (let k = n - 1; k >= 0; k--) {
    const rk = k * w;
    let s = out[k] / data[rk];
    if (k < full) {
      s -= data[rk + 1] * out[k + 1];
      s -= data[rk + 2] * out[k + 2];
      s -= data[rk + 3] * out[k + 3];
    } else {
      const last = Math.min(b, n - 1 - k);
      for (let p = 1; p <= last; p++) s -= data[rk + p] * out[k + p];
    }
    out[k] = s;
  }
  return out;
}

export function solveLdlt(f: LdltFactor, rhs: Float64Array): Float64Array {
  return solveLdltInto(f, rhs, new Float64Array(f.n));
}
