/** Rayleigh–Ritz refinement of approximate eigenpairs of K x = λ M x on the span of their vectors. */
import { type SymBanded, symBandedMulInto } from './banded';
import { denseGeneralizedEigen } from './eigen-dense';

function dot(a: Float64Array, b: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[i] * b[i];
  return s;
}

/**
 * Final Rayleigh–Ritz step on the span of all pairs found: projects K and M (products only, no solves)
 * and solves the small dense problem. With a nearly singular K − σM (rigid-body modes) each solve
 * carries a relative error of about ε·λmax/|σ|; the Rayleigh quotient squares that error, and the
 * projection restores exact M-orthonormality of the vectors.
 */
export function rayleighRitz(k: SymBanded, m: SymBanded, pairs: readonly { lambda: number; x: Float64Array; mx: Float64Array }[]): { values: Float64Array; vectors: Float64Array } {
  const n = k.n;
  const p = pairs.length;
  const kx = pairs.map((q) => symBandedMulInto(k, q.x, new Float64Array(n)));
  const kp = new Float64Array(p * p);
  const mp = new Float64Array(p * p);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      kp[i * p + j] = kp[j * p + i] = 0.5 * (dot(pairs[i].x, kx[j], n) + dot(pairs[j].x, kx[i], n));
      mp[i * p + j] = mp[j * p + i] = 0.5 * (dot(pairs[i].x, pairs[j].mx, n) + dot(pairs[j].x, pairs[i].mx, n));
    }
  }
  const small = denseGeneralizedEigen(kp, mp, p);
  const vectors = new Float64Array(p * n);
  if (!small.ok) {
    // Cannot happen for M-orthonormal pairs (Mp ≈ I); keep the Lanczos values if it does.
    pairs.forEach((q, i) => vectors.set(q.x, i * n));
    return { values: Float64Array.from(pairs, (q) => q.lambda), vectors };
  }
  for (let a = 0; a < p; a++) {
    const out = vectors.subarray(a * n, (a + 1) * n);
    for (let b = 0; b < p; b++) {
      const c = small.vectors[a * p + b];
      const xb = pairs[b].x;
      for (let i = 0; i < n; i++) out[i] += c * xb[i];
    }
  }
  return { values: small.values, vectors };
}
