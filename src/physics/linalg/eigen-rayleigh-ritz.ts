/** Rayleigh–Ritz refinement of approximate eigenpairs on the span of their vectors, for the shift-inverted operator. */
import { type SymBanded, symBandedMulInto } from './banded';
import { type LdltFactor, solveLdltInto } from './banded-ldlt';
import { denseGeneralizedEigen } from './eigen-dense';

function dot(a: Float64Array, b: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[i] * b[i];
  return s;
}

/**
 * Rayleigh–Ritz on the span of the pairs found (from several Lanczos runs after a Sturm restart), for the
 * operator (K − σM)⁻¹M that Lanczos itself used: G = Xᵀ M (K − σM)⁻¹ M X and P = Xᵀ M X, then
 * P s = μ G s with λ = σ + μ. Working with the inverse keeps the accuracy of the Lanczos values: a
 * Rayleigh quotient xᵀKx / xᵀMx on a fine mesh cancels terms of size ‖K‖ (ε λmax/λ relative error), the
 * solves do not. The error of the vectors is squared in the values, and the vectors come out exactly
 * M-orthonormal (B.N. Parlett, The Symmetric Eigenvalue Problem, §11.3).
 */
export function inverseRayleighRitz(
  f: LdltFactor,
  m: SymBanded,
  sigma: number,
  pairs: readonly { lambda: number; x: Float64Array; mx: Float64Array }[],
): { values: Float64Array; vectors: Float64Array } {
  const n = f.n;
  const p = pairs.length;
  const y = new Float64Array(n);
  const g = new Float64Array(p * p);
  const mp = new Float64Array(p * p);
  const ys: Float64Array[] = [];
  for (let i = 0; i < p; i++) ys.push(solveLdltInto(f, pairs[i].mx, new Float64Array(n)));
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      g[i * p + j] = g[j * p + i] = 0.5 * (dot(pairs[i].mx, ys[j], n) + dot(pairs[j].mx, ys[i], n));
      mp[i * p + j] = mp[j * p + i] = 0.5 * (dot(pairs[i].x, pairs[j].mx, n) + dot(pairs[j].x, pairs[i].mx, n));
    }
  }
  const small = denseGeneralizedEigen(mp, g, p);
  const vectors = new Float64Array(p * n);
  if (!small.ok) {
    pairs.forEach((q, i) => vectors.set(q.x, i * n));
    return { values: Float64Array.from(pairs, (q) => q.lambda), vectors };
  }
  // Eigenvectors of P s = μ G s are G-orthonormal; rescale each combination to unit M-norm.
  for (let a = 0; a < p; a++) {
    const out = vectors.subarray(a * n, (a + 1) * n);
    for (let b = 0; b < p; b++) {
      const c = small.vectors[a * p + b];
      const xb = pairs[b].x;
      for (let i = 0; i < n; i++) out[i] += c * xb[i];
    }
    symBandedMulInto(m, out, y);
    const norm = Math.sqrt(Math.max(dot(out, y, n), 0));
    if (norm > 0) for (let i = 0; i < n; i++) out[i] /= norm;
  }
  return { values: Float64Array.from(small.values, (mu) => sigma + mu), vectors };
}
