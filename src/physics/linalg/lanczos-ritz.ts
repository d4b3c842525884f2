/**
 * Ritz pairs of a Lanczos run (src/physics/linalg/eigen-lanczos.ts): the convergence check on the run's
 * tridiagonal, the converged pairs, and their vectors combined from the run's basis when first read.
 */
import type { Workspace } from './lanczos-basis';
import { tridiagonalEigenInPlace } from './tridiagonal';

/** An approximate eigenpair of K x = λ M x with its vector and M times it. */
export interface RitzPair {
  lambda: number;
  x: Float64Array;
  mx: Float64Array;
}

/** The tridiagonal's eigen-decomposition, with buffers reused from check to check. */
export class RitzWork {
  private d = new Float64Array(0);
  private e = new Float64Array(0);
  private z = new Float64Array(0);
  private order: number[] = [];

  private load(ws: Workspace, j: number): void {
    if (this.d.length < j) {
      this.d = new Float64Array(2 * j);
      this.e = new Float64Array(2 * j);
      this.z = new Float64Array(2 * j);
    }
    for (let i = 0; i < j; i++) {
      this.d[i] = ws.alpha[i];
      this.e[i] = i + 1 < j ? ws.beta[i + 1] : 0;
    }
  }

  /**
   * `order[0 … count)`: indices of the `count` largest of d[0 … j), largest first, ties by index — the head
   * of a stable descending sort, by insertion, without sorting (and allocating) all j every step.
   */
  private largestFirst(j: number, count: number): void {
    const d = this.d;
    const order = this.order;
    let len = 0;
    for (let i = 0; i < j; i++) {
      const v = d[i];
      let pos = len;
      while (pos > 0 && d[order[pos - 1]] < v) pos--;
      if (pos >= count) continue;
      for (let k = Math.min(len, count - 1); k > pos; k--) order[k] = order[k - 1];
      order[pos] = i;
      if (len < count) len++;
    }
    order.length = len;
  }

  /**
   * Ritz values and their residual estimates, rotating only the last row of the eigenvector matrix
   * (the residual of pair i is |β_{j+1} s_{j,i}|): O(j²) per check instead of O(j³).
   * The first `tight` pairs are held to tol, the rest to √tol. `worst` is the largest of
   * |β_{j+1} s_{j,i}| / (tol_i θ_i) over the wanted pairs (∞ for a θ ≤ 0): below 1 all have converged; its
   * logarithm says how far the run still is (see `stepsToNextCheck`).
   */
  check(ws: Workspace, j: number, bNext: number, want: number, tight: number, tol: number, exhausted: boolean): { converged: boolean; worst: number } | null {
    this.load(ws, j);
    const z = this.z.subarray(0, j);
    z.fill(0);
    z[j - 1] = 1;
    // Quick rotations: this pass only decides whether to stop; the reported pairs come from `pairs`.
    if (!tridiagonalEigenInPlace(j, this.d.subarray(0, j), this.e.subarray(0, j), z, 1, true).ok) return null;
    this.largestFirst(j, Math.min(want, j));
    let converged = true;
    let worst = 0;
    const loose = Math.sqrt(tol);
    for (let t = 0; t < Math.min(want, j); t++) {
      const col = this.order[t];
      const theta = this.d[col];
      const residual = Math.abs(bNext * z[col]);
      const tolT = t < tight ? tol : loose;
      if (!(theta > 0 && residual <= tolT * theta)) converged = false;
      worst = Math.max(worst, theta > 0 ? residual / (tolT * theta) : Infinity);
    }
    return { converged: exhausted || converged, worst };
  }

  /**
   * The `want` largest Ritz pairs of the converged run: full eigenvectors of T once; x = Q s and M x = (MQ) s
   * are formed only when read (see RitzVector).
   */
  pairs(ws: Workspace, j: number, want: number): RitzVector[] {
    this.load(ws, j);
    // Eigenvalues only here: the QL method's d never reads the rotated vectors, so the eigenvectors formed
    // later by `RunEigenvectors` belong to these very values (the same bits, the same order).
    tridiagonalEigenInPlace(j, this.d.subarray(0, j), this.e.subarray(0, j));
    this.largestFirst(j, Math.min(want, j));
    const run = new RunEigenvectors(ws, j);
    const out: RitzVector[] = [];
    for (let t = 0; t < Math.min(want, j); t++) {
      const col = this.order[t];
      out.push(new RitzVector(this.d[col], run, col));
    }
    return out;
  }
}

/**
 * Eigenvectors of a finished run's tridiagonal T_j (row-major j × j, column i for eigenvalue i), formed on
 * first use: only the run whose vectors are read needs them (O(j³), against O(j²) for the values).
 */
class RunEigenvectors {
  private sv: Float64Array | null = null;
  constructor(
    readonly ws: Workspace,
    readonly j: number,
  ) {}
  get s(): Float64Array {
    if (this.sv) return this.sv;
    const { ws, j } = this;
    const d = new Float64Array(j);
    const e = new Float64Array(j);
    for (let i = 0; i < j; i++) {
      d[i] = ws.alpha[i];
      e[i] = i + 1 < j ? ws.beta[i + 1] : 0;
    }
    const s = new Float64Array(j * j);
    for (let i = 0; i < j; i++) s[i * j + i] = 1;
    tridiagonalEigenInPlace(j, d, e, s, j);
    return (this.sv = s);
  }
}

/**
 * x_t = Σ_r s[r, col_t] · q_r for pairs of one run, into `out` (vector t at `[t·n … (t+1)·n)`): each basis
 * vector is read once for all pairs; each x_t is summed over r in the same order as `RitzVector.x`, so the
 * same bits.
 */
export function combineRitzVectors(pairs: RitzVector[], out: Float64Array): void {
  if (pairs.length === 0) return;
  const { ws, s, j } = pairs[0].basisOf();
  const { n, q } = ws;
  // s is the run's (shared) eigenvector matrix: formed once, on this first read.
  out.fill(0, 0, pairs.length * n);
  for (let r = 0; r < j; r++) {
    const off = r * n;
    for (let t = 0; t < pairs.length; t++) {
      const c = s[r * j + pairs[t].col];
      if (c === 0) continue;
      const o = t * n;
      for (let i = 0; i < n; i++) out[o + i] += c * q[off + i];
    }
  }
}

/**
 * A converged Ritz pair whose vectors are combined from the run's basis on first read: a run converges
 * two pairs beyond those wanted (their values serve the Sturm check) and M x is needed only after a
 * restart, so most combinations are never formed. The basis is not touched after its run ends, and each
 * vector is summed in the same order as when formed at once, so the values are the same to the bit.
 */
export class RitzVector implements RitzPair {
  /** λ = σ + 1/θ, set by the caller that knows σ. */
  lambda = 0;
  private xv: Float64Array | null = null;
  private mxv: Float64Array | null = null;
  constructor(
    readonly theta: number,
    private readonly run: RunEigenvectors,
    readonly col: number,
  ) {}
  /** The run this pair belongs to (its basis, the tridiagonal's eigenvectors and its size). */
  basisOf(): { ws: Workspace; s: Float64Array; j: number } {
    return { ws: this.run.ws, s: this.run.s, j: this.run.j };
  }
  get x(): Float64Array {
    return (this.xv ??= this.combine(this.run.ws.q));
  }
  get mx(): Float64Array {
    return (this.mxv ??= this.combine(this.run.ws.mq));
  }
  /** Σ_r s[r, col] · basis vector r. */
  private combine(basis: Float64Array): Float64Array {
    const { n } = this.run.ws;
    const { s, j } = this.run;
    const { col } = this;
    const out = new Float64Array(n);
    for (let r = 0; r < j; r++) {
      const c = s[r * j + col];
      if (c === 0) continue;
      const off = r * n;
      for (let i = 0; i < n; i++) out[i] += c * basis[off + i];
    }
    return out;
  }
}
