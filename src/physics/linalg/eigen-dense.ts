/**
 * Dense reference solver for the generalized symmetric eigenproblem K x = λ M x, M positive definite.
 * Cholesky M = L Lᵀ reduces it to the standard problem C y = λ y with C = L⁻¹ K L⁻ᵀ, x = L⁻ᵀ y;
 * C is brought to tridiagonal form by Householder reflections and solved by implicit QL
 * (Golub & Van Loan, Matrix Computations, §8.3 and §8.7). O(n³): a yardstick for tests and benchmarks,
 * not for production sizes.
 */
import { choleskyInPlace } from './dense-cholesky';
import { ascendingOrder, tridiagonalEigenInPlace } from './tridiagonal';

/** Row-major n×n matrices. */
export type DenseEigenOutcome =
  | {
      ok: true;
      /** All eigenvalues, ascending. */
      values: Float64Array;
      /** Eigenvectors, M-orthonormal: vector i at `vectors[i·n … (i+1)·n)`. */
      vectors: Float64Array;
    }
  | { ok: false; reason: 'mass-not-positive-definite' | 'not-converged'; message: string };

/**
 * Householder reduction of symmetric `a` (destroyed) to tridiagonal T = Qᵀ A Q.
 * Writes the diagonal into d, sub-diagonal into e, and Q (row-major) into q.
 */
function householderTridiagonalize(a: Float64Array, n: number, d: Float64Array, e: Float64Array, q: Float64Array): void {
  q.fill(0);
  for (let i = 0; i < n; i++) q[i * n + i] = 1;
  const v = new Float64Array(n);
  const p = new Float64Array(n);
  for (let k = 0; k < n - 2; k++) {
    let norm2 = 0;
    for (let i = k + 1; i < n; i++) norm2 += a[i * n + k] * a[i * n + k];
    if (norm2 === 0) continue;
    const x0 = a[(k + 1) * n + k];
    const alpha = x0 >= 0 ? -Math.sqrt(norm2) : Math.sqrt(norm2);
    // v = x − α e₁, normalised; H = I − 2 v vᵀ maps x to α e₁.
    v.fill(0);
    for (let i = k + 1; i < n; i++) v[i] = a[i * n + k];
    v[k + 1] -= alpha;
    let vn2 = 0;
    for (let i = k + 1; i < n; i++) vn2 += v[i] * v[i];
    if (vn2 === 0) continue;
    const inv = 1 / Math.sqrt(vn2);
    for (let i = k + 1; i < n; i++) v[i] *= inv;
    // H A22 H = A22 − 2 v wᵀ − 2 w vᵀ with p = A22 v, w = p − (vᵀp) v.
    let vp = 0;
    for (let i = k + 1; i < n; i++) {
      let s = 0;
      for (let j = k + 1; j < n; j++) s += a[i * n + j] * v[j];
      p[i] = s;
      vp += v[i] * s;
    }
    for (let i = k + 1; i < n; i++) p[i] -= vp * v[i];
    for (let i = k + 1; i < n; i++) {
      for (let j = k + 1; j < n; j++) a[i * n + j] -= 2 * (v[i] * p[j] + p[i] * v[j]);
    }
    a[(k + 1) * n + k] = alpha;
    a[k * n + k + 1] = alpha;
    for (let i = k + 2; i < n; i++) {
      a[i * n + k] = 0;
      a[k * n + i] = 0;
    }
    // Q ← Q H.
    for (let r = 0; r < n; r++) {
      let s = 0;
      for (let j = k + 1; j < n; j++) s += q[r * n + j] * v[j];
      s *= 2;
      for (let j = k + 1; j < n; j++) q[r * n + j] -= s * v[j];
    }
  }
  for (let i = 0; i < n; i++) d[i] = a[i * n + i];
  for (let i = 0; i < n - 1; i++) e[i] = a[(i + 1) * n + i];
  e[n - 1] = 0;
}

/** All eigenpairs of the symmetric standard problem A y = λ y (A row-major, not modified). */
export function denseSymmetricEigen(aIn: Float64Array, n: number): { ok: true; values: Float64Array; vectors: Float64Array } | { ok: false } {
  const a = Float64Array.from(aIn);
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  const q = new Float64Array(n * n);
  householderTridiagonalize(a, n, d, e, q);
  if (!tridiagonalEigenInPlace(n, d, e, q, n).ok) return { ok: false };
  const order = ascendingOrder(d, n);
  const values = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  order.forEach((src, dst) => {
    values[dst] = d[src];
    for (let r = 0; r < n; r++) vectors[dst * n + r] = q[r * n + src];
  });
  return { ok: true, values, vectors };
}

/** All eigenpairs of K x = λ M x (row-major n×n, not modified), ascending, M-orthonormal vectors. */
export function denseGeneralizedEigen(k: Float64Array, m: Float64Array, n: number): DenseEigenOutcome {
  const l = Float64Array.from(m);
  if (!choleskyInPlace(l, n)) {
    return { ok: false, reason: 'mass-not-positive-definite', message: 'mass matrix is not positive definite' };
  }
  // X = L⁻¹ K (forward substitution column by column), then C = L⁻¹ Xᵀ = L⁻¹ K L⁻ᵀ.
  const x = Float64Array.from(k);
  forwardSolveColumns(l, x, n);
  const c = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) c[i * n + j] = x[j * n + i];
  forwardSolveColumns(l, c, n);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const s = 0.5 * (c[i * n + j] + c[j * n + i]);
      c[i * n + j] = s;
      c[j * n + i] = s;
    }
  }
  const std = denseSymmetricEigen(c, n);
  if (!std.ok) return { ok: false, reason: 'not-converged', message: 'implicit QL did not converge' };
  // x = L⁻ᵀ y for each eigenvector (back substitution with Lᵀ).
  const vectors = std.vectors;
  for (let v = 0; v < n; v++) {
    const off = v * n;
    for (let i = n - 1; i >= 0; i--) {
      let s = vectors[off + i];
      for (let j = i + 1; j < n; j++) s -= l[j * n + i] * vectors[off + j];
      vectors[off + i] = s / l[i * n + i];
    }
  }
  return { ok: true, values: std.values, vectors };
}

/** B ← L⁻¹ B for lower-triangular L (row-major), B row-major n×n. */
function forwardSolveColumns(l: Float64Array, b: Float64Array, n: number): void {
  for (let i = 0; i < n; i++) {
    const lii = l[i * n + i];
    for (let k = 0; k < i; k++) {
      const lik = l[i * n + k];
      if (lik === 0) continue;
      const rowI = i * n;
      const rowK = k * n;
      for (let j = 0; j < n; j++) b[rowI + j] -= lik * b[rowK + j];
    }
    const rowI = i * n;
    for (let j = 0; j < n; j++) b[rowI + j] /= lii;
  }
}

/**
 * Dense reference for the lowest modes when K is positive definite: solves the inverted pair
 * M x = μ K x (λ = 1/μ). A normwise backward-stable dense solver gets each eigenvalue with an absolute
 * error of about ε·(largest eigenvalue); on K x = λ M x that is ε·λmax, which for a fine beam mesh
 * (λmax/λ1 ~ 1e11) ruins the low modes' relative accuracy, while on the inverted pair the low modes are
 * the largest μ and keep full relative accuracy. Returns ascending λ with M-orthonormal vectors.
 */
export function denseLowestModesByInversion(k: Float64Array, m: Float64Array, n: number): DenseEigenOutcome {
  const inv = denseGeneralizedEigen(m, k, n);
  if (!inv.ok) {
    return inv.reason === 'mass-not-positive-definite'
      ? { ok: false, reason: 'mass-not-positive-definite', message: 'stiffness matrix is not positive definite: the inverted pair needs K > 0' }
      : inv;
  }
  const values = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const src = n - 1 - i; // largest μ first = smallest λ
    const mu = inv.values[src];
    values[i] = 1 / mu;
    // Vectors come K-orthonormal (xᵀKx = 1), so xᵀMx = μ: scale by 1/√μ for M-orthonormality.
    const s = 1 / Math.sqrt(mu);
    for (let r = 0; r < n; r++) vectors[i * n + r] = inv.vectors[src * n + r] * s;
  }
  return { ok: true, values, vectors };
}
