/**
 * Lowest eigenpairs of the banded generalized problem K x = λ M x (K symmetric positive semi-definite,
 * M positive definite) by shift-invert Lanczos with full reorthogonalisation
 * (T. Ericsson & A. Ruhe, Math. Comp. 35 (1980) 1251; B.N. Parlett, The Symmetric Eigenvalue Problem, ch. 13).
 *
 * The operator OP = (K − σM)⁻¹ M is self-adjoint in the M inner product; its eigenvalues θ = 1/(λ − σ)
 * are largest for the λ nearest above σ, which Lanczos finds first. Every Lanczos vector is
 * M-orthogonalised twice against all earlier ones ("twice is enough"), so no spurious copies appear.
 * A Krylov space holds one vector per eigenvalue, so a repeated eigenvalue (the two rigid-body modes
 * of a free–free beam) could be missed: after convergence a Sturm count (inertia of K − μM) checks that
 * every eigenvalue below the highest one found is accounted for; if not, the found pairs are locked and
 * Lanczos restarts from a fresh vector orthogonal to them.
 */
import { seededUniform01 } from './seeded';
import { type SymBanded, symBandedGet, symBandedMulInto } from './banded';
import { createLdltFactor, factorLdltInto, type LdltFactor, solveLdltInto } from './banded-ldlt';
import { rayleighRitz } from './eigen-rayleigh-ritz';
import { tridiagonalEigenInPlace } from './tridiagonal';

export interface LowestModesOptions {
  /** Shift σ below the lowest wanted eigenvalue (K − σM must be positive definite). Default: chosen automatically. */
  shift?: number;
  /** Relative residual tolerance of a Ritz pair in the shifted-inverted problem (default 1e-10). */
  tolerance?: number;
  /** Seed of the pseudo-random start vectors (default 1), so results repeat run to run. */
  seed?: number;
}

export type LowestModesOutcome =
  | {
      ok: true;
      /** Lowest `count` eigenvalues λ = ω², ascending. */
      values: Float64Array;
      /** M-orthonormal eigenvectors: vector i at `vectors[i·n … (i+1)·n)`. */
      vectors: Float64Array;
      /** Shift σ used. */
      shift: number;
      /** Lanczos steps taken (= solves with K − σM). */
      steps: number;
      /** Restarts after a Sturm count found a missed eigenvalue. */
      restarts: number;
    }
  | { ok: false; reason: 'not-positive-definite' | 'not-converged'; message: string };

interface RitzPair {
  lambda: number;
  x: Float64Array;
  mx: Float64Array;
}

const MAX_RESTARTS = 8;

function dot(a: Float64Array, b: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += a[i] * b[i];
  return s;
}

/** Seeded uniform in [-0.5, 0.5) for start vectors, so a solve repeats exactly. */
function seededUniform(seed: number): () => number {
  const next = seededUniform01(seed);
  return () => next() - 0.5;
}

/** Largest K_ii / M_ii: of the order of the highest eigenvalue, a scale for shifts. */
function diagonalRatioMax(k: SymBanded, m: SymBanded): number {
  let r = 0;
  for (let i = 0; i < k.n; i++) {
    const mi = symBandedGet(m, i, i);
    if (mi > 0) r = Math.max(r, Math.abs(symBandedGet(k, i, i)) / mi);
  }
  return r > 0 ? r : 1;
}

/** out = K − σM (same half-bandwidth assumed). */
function shiftedInto(k: SymBanded, m: SymBanded, sigma: number, out: SymBanded): SymBanded {
  const kd = k.data;
  const md = m.data;
  const od = out.data;
  for (let i = 0; i < od.length; i++) od[i] = kd[i] - sigma * md[i];
  return out;
}

/** Lowest `count` eigenpairs of K x = λ M x, both banded with the same half-bandwidth. */
export function lowestModesBanded(k: SymBanded, m: SymBanded, count: number, options: LowestModesOptions = {}): LowestModesOutcome {
  const n = k.n;
  if (m.n !== n || m.halfBandwidth !== k.halfBandwidth) throw new RangeError('lowestModesBanded: K and M differ in size or half-bandwidth');
  const want = Math.max(0, Math.min(Math.floor(count), n));
  const tol = options.tolerance ?? 1e-10;
  const rand = seededUniform(options.seed ?? 1);
  const a: SymBanded = { n, halfBandwidth: k.halfBandwidth, data: new Float64Array(k.data.length) };
  const factor = createLdltFactor(n, k.halfBandwidth);
  const scale = diagonalRatioMax(k, m);

  let sigma: number;
  if (options.shift !== undefined) {
    sigma = options.shift;
    factorLdltInto(shiftedInto(k, m, sigma, a), factor);
  } else {
    // σ = 0 when K is safely positive definite; otherwise (rigid-body modes) a small negative shift,
    // so K − σM is positive definite and the zero eigenvalues come out as λ ≈ 0.
    sigma = 0;
    factorLdltInto(shiftedInto(k, m, 0, a), factor);
    if (factor.negativePivots > 0 || factor.smallestPivotRatio < 1e-13) {
      sigma = -1e-8 * scale;
      factorLdltInto(shiftedInto(k, m, sigma, a), factor);
    }
  }
  if (factor.negativePivots > 0) {
    return {
      ok: false,
      reason: 'not-positive-definite',
      message: `K − σM has ${factor.negativePivots} negative pivot(s) at σ = ${sigma}: eigenvalues lie below the shift`,
    };
  }
  if (want === 0) return { ok: true, values: new Float64Array(0), vectors: new Float64Array(0), shift: sigma, steps: 0, restarts: 0 };

  const locked: RitzPair[] = [];
  let steps = 0;
  let restarts = 0;
  const sturm = createLdltFactor(n, k.halfBandwidth);
  for (;;) {
    const need = want - Math.min(locked.length, want) || 1;
    const run = lanczosRun(factor, m, locked, Math.min(need + 2, n - locked.length), tol, rand);
    steps += run.steps;
    if (!run.ok) return { ok: false, reason: 'not-converged', message: `Lanczos did not converge in ${run.steps} steps` };
    for (const theta of run.pairs) locked.push({ lambda: sigma + 1 / theta.theta, x: theta.x, mx: theta.mx });
    locked.sort((p, q) => p.lambda - q.lambda);
    if (locked.length < want && locked.length < n) continue;
    // Sturm check: every eigenvalue below μ must be among the pairs found.
    const top = locked[Math.min(want, locked.length) - 1].lambda;
    const mu = top + 1e-6 * Math.max(Math.abs(top), Math.abs(sigma), 1e-300);
    const below = factorLdltInto(shiftedInto(k, m, mu, a), sturm).negativePivots;
    const found = locked.filter((p) => p.lambda < mu).length;
    if (below <= found || locked.length >= n) break;
    if (++restarts > MAX_RESTARTS) return { ok: false, reason: 'not-converged', message: `Sturm count ${below} below ${mu} but ${found} eigenvalues found` };
  }
  const refined = rayleighRitz(k, m, locked);
  const values = new Float64Array(want);
  const vectors = new Float64Array(want * n);
  for (let i = 0; i < want; i++) {
    values[i] = refined.values[i];
    vectors.set(refined.vectors.subarray(i * n, (i + 1) * n), i * n);
  }
  return { ok: true, values, vectors, shift: sigma, steps, restarts };
}

interface RunOutcome {
  ok: boolean;
  steps: number;
  /** Converged Ritz pairs of OP, largest θ first. */
  pairs: { theta: number; x: Float64Array; mx: Float64Array }[];
}

/**
 * One Lanczos run, M-orthogonal to the locked pairs, until the `want` largest Ritz values θ
 * have relative residual ≤ tol (|β_j s_ji| ≤ tol·θ_i, Parlett §13.2) or the space is exhausted.
 */
function lanczosRun(f: LdltFactor, m: SymBanded, locked: RitzPair[], want: number, tol: number, rand: () => number): RunOutcome {
  const n = f.n;
  const maxSteps = n - locked.length;
  const q: Float64Array[] = [];
  const mq: Float64Array[] = [];
  const alpha: number[] = [];
  const beta: number[] = []; // beta[j]: coupling of q[j−1] and q[j] (0 at a block start)
  let w: Float64Array = new Float64Array(n);
  let mw: Float64Array = new Float64Array(n);

  const orthogonalise = (v: Float64Array): void => {
    for (let pass = 0; pass < 2; pass++) {
      for (const p of locked) {
        const c = dot(p.mx, v, n);
        for (let i = 0; i < n; i++) v[i] -= c * p.x[i];
      }
      for (let j = 0; j < q.length; j++) {
        const c = dot(mq[j], v, n);
        const qj = q[j];
        for (let i = 0; i < n; i++) v[i] -= c * qj[i];
      }
    }
  };
  /** Fresh random start, orthogonal to everything so far; returns its M-norm. */
  const randomStart = (): number => {
    for (let attempt = 0; attempt < 5; attempt++) {
      for (let i = 0; i < n; i++) w[i] = rand();
      orthogonalise(w);
      symBandedMulInto(m, w, mw);
      const b = Math.sqrt(Math.max(dot(w, mw, n), 0));
      if (b > 1e-8) return b;
    }
    return 0;
  };

  let b = randomStart();
  let coupling = 0;
  let lastCheck = 0;
  let maxAlpha = 0;
  while (q.length < maxSteps) {
    if (b === 0) break;
    const qj = w.map((v) => v / b);
    const mqj = mw.map((v) => v / b);
    q.push(qj);
    mq.push(mqj);
    beta.push(coupling);
    const j = q.length - 1;
    // w = OP q_j = (K − σM)⁻¹ M q_j, then the three-term recurrence and full reorthogonalisation.
    w = solveLdltInto(f, mqj, new Float64Array(n));
    const aj = dot(mqj, w, n);
    alpha.push(aj);
    maxAlpha = Math.max(maxAlpha, Math.abs(aj));
    for (let i = 0; i < n; i++) w[i] -= aj * qj[i];
    if (coupling !== 0) {
      const qp = q[j - 1];
      for (let i = 0; i < n; i++) w[i] -= coupling * qp[i];
    }
    orthogonalise(w);
    mw = new Float64Array(n);
    symBandedMulInto(m, w, mw);
    b = Math.sqrt(Math.max(dot(w, mw, n), 0));
    const breakdown = b <= 1e-12 * maxAlpha;
    const steps = q.length;
    const exhausted = steps >= maxSteps;
    if (steps >= want && (steps - lastCheck >= 3 || breakdown || exhausted)) {
      lastCheck = steps;
      const ritz = ritzPairs(alpha, beta, breakdown ? 0 : b, want, tol, exhausted);
      if (!ritz) return { ok: false, steps, pairs: [] };
      if (ritz.converged) {
        const pairs = ritz.selected.map(({ theta, s }) => {
          const x = new Float64Array(n);
          const mx = new Float64Array(n);
          for (let r = 0; r < steps; r++) {
            const c = s[r];
            if (c === 0) continue;
            const qr = q[r];
            const mqr = mq[r];
            for (let i = 0; i < n; i++) {
              x[i] += c * qr[i];
              mx[i] += c * mqr[i];
            }
          }
          return { theta, x, mx };
        });
        return { ok: true, steps, pairs };
      }
    }
    if (breakdown) {
      // Invariant subspace found: continue from a fresh vector with no coupling.
      b = randomStart();
      coupling = 0;
    } else {
      coupling = b;
    }
  }
  return { ok: false, steps: q.length, pairs: [] };
}

/** Eigen-decomposes the Lanczos tridiagonal; returns the `want` largest θ if all have converged. */
function ritzPairs(
  alpha: number[],
  beta: number[],
  bNext: number,
  want: number,
  tol: number,
  exhausted: boolean,
): { converged: boolean; selected: { theta: number; s: Float64Array }[] } | null {
  const j = alpha.length;
  const d = Float64Array.from(alpha);
  const e = new Float64Array(j);
  for (let i = 0; i < j - 1; i++) e[i] = beta[i + 1];
  const z = new Float64Array(j * j);
  for (let i = 0; i < j; i++) z[i * j + i] = 1;
  if (!tridiagonalEigenInPlace(j, d, e, z, j).ok) return null;
  const order = Array.from({ length: j }, (_, i) => i).sort((p, r) => d[r] - d[p]);
  const selected: { theta: number; s: Float64Array }[] = [];
  let converged = true;
  for (let t = 0; t < Math.min(want, j); t++) {
    const col = order[t];
    const theta = d[col];
    const residual = Math.abs(bNext * z[(j - 1) * j + col]);
    if (!exhausted && !(theta > 0 && residual <= tol * theta)) converged = false;
    const s = new Float64Array(j);
    for (let r = 0; r < j; r++) s[r] = z[r * j + col];
    selected.push({ theta, s });
  }
  return { converged, selected };
}
