/**
 * Symmetric tridiagonal eigenproblem by the implicit QL method with shifts
 * (J.H. Wilkinson & C. Reinsch, Handbook for Automatic Computation II, 1971; G.H. Golub & C.F. Van Loan,
 * Matrix Computations, §8.3). Used by the Lanczos solver on its small projected matrix and by the dense
 * reference solver after Householder reduction.
 */
import { hypot2 } from './hypot';

export type TridiagonalOutcome = { ok: true } | { ok: false; reason: 'not-converged'; index: number };

const EPS = 2.220446049250313e-16;
const MAX_SWEEPS = 60;
/** Squares of magnitude within these bounds neither overflow nor lose bits to underflow. */
const SQUARE_MIN = 1e-290;
const SQUARE_MAX = 1e290;

/**
 * √(a² + b²) by the plain formula when the squares are safely in range (the common case), else by `hypot2`:
 * within an ulp or so of it, about three times faster. For callers that need a decision from the eigenvalues
 * (a convergence test), not eigenvalues to the last bit.
 */
function quickHypot(a: number, b: number): number {
  const s = a * a + b * b;
  return s > SQUARE_MIN && s < SQUARE_MAX ? Math.sqrt(s) : hypot2(a, b);
}

/**
 * In place: on entry `d[0..n)` is the diagonal and `e[i]` = T(i+1, i) for i < n − 1 (e needs length ≥ n;
 * it is destroyed). On exit `d` holds the eigenvalues, unsorted.
 * If `z` is given (row-major, `zRows` × n), its columns are rotated along: start with the identity to get
 * T's eigenvectors, or with the reduction's Q to get the original matrix's. Column i then belongs to d[i].
 * `quick`: rotations from the plain √(f² + g²) (see `quickHypot`), for a result that only feeds a decision;
 * by default they use `hypot2`, bit for bit as Math.hypot.
 */
export function tridiagonalEigenInPlace(
  n: number,
  d: Float64Array,
  e: Float64Array,
  z?: Float64Array,
  zRows = n,
  quick = false,
): TridiagonalOutcome {
  if (n === 0) return { ok: true };
  e[n - 1] = 0;
  for (let l = 0; l < n; l++) {
    let sweeps = 0;
    for (;;) {
      let m = l;
      while (m < n - 1) {
        const dd = Math.abs(d[m]) + Math.abs(d[m + 1]);
        if (Math.abs(e[m]) <= EPS * dd) break;
        m++;
      }
      if (m === l) break;
      if (++sweeps > MAX_SWEEPS) return { ok: false, reason: 'not-converged', index: l };
      // Shift from the leading 2×2 block (the eigenvalue of it closer to d[l]).
      let g = (d[l + 1] - d[l]) / (2 * e[l]);
      let r = hypot2(g, 1);
      g = d[m] - d[l] + e[l] / (g + (g >= 0 ? r : -r));
      let s = 1;
      let c = 1;
      let p = 0;
      let deflated = false;
      // Chase the bulge from the bottom of the unreduced block up to row l with Givens rotations.
      for (let i = m - 1; i >= l; i--) {
        const f = s * e[i];
        const b = c * e[i];
        r = quick ? quickHypot(f, g) : hypot2(f, g);
        e[i + 1] = r;
        if (r === 0) {
          d[i + 1] -= p;
          e[m] = 0;
          deflated = true;
          break;
        }
        s = f / r;
        c = g / r;
        g = d[i + 1] - p;
        r = (d[i] - g) * s + 2 * c * b;
        p = s * r;
        d[i + 1] = g + p;
        g = c * r - b;
        if (z) {
          for (let k = 0; k < zRows; k++) {
            const row = k * n;
            const zi1 = z[row + i + 1];
            const zi = z[row + i];
            z[row + i + 1] = s * zi + c * zi1;
            z[row + i] = c * zi - s * zi1;
          }
        }
      }
      if (deflated) continue;
      d[l] -= p;
      e[l] = g;
      e[m] = 0;
    }
  }
  return { ok: true };
}

/** Indices that sort `values` ascending. */
export function ascendingOrder(values: ArrayLike<number>, n = values.length): number[] {
  const idx = Array.from({ length: n }, (_, i) => i);
  idx.sort((a, b) => values[a] - values[b]);
  return idx;
}
