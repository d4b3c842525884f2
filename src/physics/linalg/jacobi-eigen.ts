/**
 * Eigenvalues of a small dense symmetric matrix by cyclic Jacobi rotations (Golub & Van Loan,
 * Matrix Computations, §8.5). Robust and accurate for the 3K×3K added-mass matrices (K bodies);
 * O(n³) per sweep, a handful of sweeps.
 */

/** Eigenvalues (ascending) of the symmetric row-major n×n matrix `a` (not modified). */
export function symmetricEigenvalues(a: Float64Array, n: number): Float64Array {
  const m = Float64Array.from(a);
  for (let sweep = 0; sweep < 60; sweep++) {
    let off = 0;
    let diag = 0;
    for (let i = 0; i < n; i++) {
      diag += m[i * n + i] * m[i * n + i];
      for (let j = i + 1; j < n; j++) off += m[i * n + j] * m[i * n + j];
    }
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q];
        if (apq === 0) continue;
        const app = m[p * n + p];
        const aqq = m[q * n + q];
        // Rotation angle that zeroes a_pq (stable form of tan θ).
        const tau = (aqq - app) / (2 * apq);
        const t = Math.sign(tau || 1) / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = m[k * n + p];
          const akq = m[k * n + q];
          m[k * n + p] = c * akp - s * akq;
          m[k * n + q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = m[p * n + k];
          const aqk = m[q * n + k];
          m[p * n + k] = c * apk - s * aqk;
          m[q * n + k] = s * apk + c * aqk;
        }
      }
    }
  }
  const ev = new Float64Array(n);
  for (let i = 0; i < n; i++) ev[i] = m[i * n + i];
  return ev.sort();
}
