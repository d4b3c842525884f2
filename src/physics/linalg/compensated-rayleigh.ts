/**
 * Rayleigh quotient xᵀKx / xᵀMx of a symmetric banded pair, with xᵀKx summed as if in twice the working
 * precision. On a fine beam mesh K spans λ1 to λmax ≈ 1e10–1e16 λ1, so a plain double sum of xᵀKx for a low
 * mode cancels terms of size λmax·‖x‖² to a result of size λ1·‖x‖² and keeps only ε·λmax/λ1 of relative
 * accuracy; the Ritz value σ + 1/θ from the shifted-inverted operator carries the same error through the
 * factorisation's backward error. The quotient of an accurate vector summed this way is accurate to the
 * square of the vector's error plus a few ε.
 *
 * Summation: Dot2 of T. Ogita, S.M. Rump & S. Oishi, "Accurate sum and dot product", SIAM J. Sci. Comput. 26
 * (2005) 1955–1988, Algorithm 5.3, with TwoSum (Knuth, TAOCP vol. 2, §4.2.2, Theorem B) and TwoProduct by
 * Dekker's splitting (T.J. Dekker, "A floating-point technique for extending the available precision",
 * Numer. Math. 18 (1971) 224–242), as JavaScript has no fused multiply-add. Each term K_ij·x_i·x_j is formed
 * as K_ij·(x_i·x_j) with both products error-free; the product's own low part adds at first order only.
 */
import type { SymBanded } from './banded';

/** 2^27 + 1, Dekker's splitting constant for binary64. */
const SPLIT = 134217729;
const EPS = 2.220446049250313e-16;

/**
 * Re-reads `values[i]` (i < count) as the Rayleigh quotient of vector i (at `vectors[i·n … (i+1)·n)`) with
 * xᵀKx compensated, wherever the plain value could be off by more than `tolerance` (relative). The test is
 * the condition of the sum, |x|ᵀ|K||x| / xᵀKx, times (b + 2)·ε: a first-order bound on what a banded LDLᵀ
 * with half-bandwidth b (its backward error: G.H. Golub & C.F. Van Loan, Matrix Computations, ch. 4, from memory) or a
 * plain sum leaves in the value; it costs one plain pass. M is positive definite, so xᵀMx is summed plainly
 * (no cancellation). K's entries are split once, on the first vector that needs it. Returns how many were re-read.
 */
export function reReadRayleighQuotients(
  k: SymBanded,
  m: SymBanded,
  vectors: Float64Array,
  values: Float64Array,
  count: number,
  tolerance: number,
): number {
  const n = k.n;
  const bound = (k.halfBandwidth + 2) * EPS;
  let split: SplitBanded | null = null;
  let xh: Float64Array | null = null;
  let xl: Float64Array | null = null;
  let reRead = 0;
  for (let v = 0; v < count; v++) {
    const x = vectors.subarray(v * n, (v + 1) * n);
    const mass = quadraticForm(m, x);
    if (bound * quadraticForm(k, x, true) <= tolerance * Math.abs(values[v]) * mass) continue;
    split ??= splitBanded(k);
    xh ??= new Float64Array(n);
    xl ??= new Float64Array(n);
    values[v] = compensatedQuadraticForm(split, x, xh, xl) / mass;
    reRead++;
  }
  return reRead;
}

/** A banded matrix with each stored entry a = hi + lo (Dekker's split, off-diagonals doubled: they stand for both triangles). */
interface SplitBanded {
  a: SymBanded;
  value: Float64Array;
  hi: Float64Array;
  lo: Float64Array;
}

function splitBanded(a: SymBanded): SplitBanded {
  const { halfBandwidth: b, data } = a;
  const w = b + 1;
  const value = new Float64Array(data.length);
  const hi = new Float64Array(data.length);
  const lo = new Float64Array(data.length);
  for (let p = 0; p < data.length; p++) {
    // Factor 2 is exact, so doubling before the split changes nothing but saves a product per term.
    const v = p % w === 0 ? data[p] : 2 * data[p];
    const t = SPLIT * v;
    value[p] = v;
    hi[p] = t - (t - v);
    lo[p] = v - hi[p];
  }
  return { a, value, hi, lo };
}

/** xᵀAx by Dot2 (Ogita, Rump & Oishi 2005, Alg. 5.3): about the exact value rounded once. xh, xl: scratch of length n. */
function compensatedQuadraticForm(split: SplitBanded, x: Float64Array, xh: Float64Array, xl: Float64Array): number {
  const { n, halfBandwidth: b } = split.a;
  const { value, hi, lo } = split;
  const w = b + 1;
  for (let i = 0; i < n; i++) {
    const t = SPLIT * x[i];
    xh[i] = t - (t - x[i]);
    xl[i] = x[i] - xh[i];
  }
  let s = 0;
  let c = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i];
    const xiH = xh[i];
    const xiL = xl[i];
    const row = i * w;
    const last = Math.min(b, n - 1 - i);
    for (let d = 0; d <= last; d++) {
      const p = row + d;
      const aij = value[p];
      const j = i + d;
      // q = xi·xj exactly as qh + ql (Dekker's TwoProduct).
      const qh = xi * x[j];
      const ql = xiL * xl[j] - (((qh - xiH * xh[j]) - xiL * xh[j]) - xiH * xl[j]);
      // aij·qh exactly as ph + pl.
      const ph = aij * qh;
      const t = SPLIT * qh;
      const qH = t - (t - qh);
      const qL = qh - qH;
      const aH = hi[p];
      const aL = lo[p];
      const pl = aL * qL - (((ph - aH * qH) - aL * qH) - aH * qL);
      // s + ph exactly as sum + err (Knuth's TwoSum); the low parts add at first order only.
      const sum = s + ph;
      const z = sum - s;
      c += (s - (sum - z)) + (ph - z) + pl + aij * ql;
      s = sum;
    }
  }
  return s + c;
}

/**
 * xᵀAx of a symmetric banded A, summed plainly; with `absolute`, Σ |a_ij·x_i·x_j| instead: the size of the
 * terms that xᵀAx cancels.
 */
function quadraticForm(a: SymBanded, x: Float64Array, absolute = false): number {
  const { n, halfBandwidth: b, data } = a;
  const w = b + 1;
  let s = 0;
  for (let i = 0; i < n; i++) {
    const row = i * w;
    const last = Math.min(b, n - 1 - i);
    let r = absolute ? Math.abs(data[row] * x[i]) : data[row] * x[i];
    for (let d = 1; d <= last; d++) {
      const t = 2 * data[row + d] * x[i + d];
      r += absolute ? Math.abs(t) : t;
    }
    s += r * (absolute ? Math.abs(x[i]) : x[i]);
  }
  return s;
}
