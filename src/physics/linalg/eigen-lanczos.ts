/**
 * Lowest eigenpairs of the banded generalized problem K x = λ M x (K symmetric positive semi-definite,
 * M positive definite) by shift-invert Lanczos with partial reorthogonalisation
 * (T. Ericsson & A. Ruhe, Math. Comp. 35 (1980) 1251; B.N. Parlett, The Symmetric Eigenvalue Problem, ch. 13;
 * H.D. Simon, "The Lanczos algorithm with partial reorthogonalization", Math. Comp. 42 (1984) 115).
 *
 * The operator OP = (K − σM)⁻¹ M is self-adjoint in the M inner product; its eigenvalues θ = 1/(λ − σ)
 * are largest for the λ nearest above σ, which Lanczos finds first. The loss of orthogonality of the
 * Lanczos vectors is tracked by Simon's ω-recurrence (no inner products needed); only when it passes √ε
 * is the new vector (and the next one) M-orthogonalised against all earlier ones. Semi-orthogonality
 * (|q_iᵀMq_j| ≤ √ε) keeps the tridiagonal's eigenvalues accurate to rounding and prevents spurious copies
 * (Simon, Theorem 4). The eigenvalues reported are the Ritz values σ + 1/θ: they carry the accuracy
 * of the solves, where a Rayleigh quotient xᵀKx on a fine mesh cancels terms of size ‖K‖.
 * A Krylov space holds one vector per eigenvalue, so a repeated eigenvalue (the two rigid-body modes
 * of a free–free beam) could be missed: after convergence a Sturm count (inertia of K − μM) checks that
 * every eigenvalue below the highest one found is accounted for; if not, the found pairs are locked and
 * Lanczos restarts from a fresh vector orthogonal to them.
 */
import { seededUniform01 } from './seeded';
import { type SymBanded, symBandedGet, symBandedMulInto } from './banded';
import { createLdltFactor, factorLdltInto, type LdltFactor, solveLdltInto } from './banded-ldlt';
import { inverseRayleighRitz } from './eigen-rayleigh-ritz';
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
      /**
       * M-orthonormal eigenvectors: vector i at `vectors[i·n … (i+1)·n)`. Formed on first read (a refinement
       * reads only its last mesh's), from the run's basis, which is kept until then.
       */
      readonly vectors: Float64Array;
      /**
       * Says the vectors will not be read: the run's basis may then serve the next solve. Reading `vectors`
       * after this throws.
       */
      release(): void;
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
const EPS = 2.220446049250313e-16;
const SQRT_EPS = Math.sqrt(EPS);
/** ω above which an earlier vector is included in a reorthogonalisation (ε^¾, Simon 1984 §5). */
const ETA = EPS ** 0.75;

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
  if (want === 0) return { ok: true, values: new Float64Array(0), vectors: new Float64Array(0), release: () => {}, shift: sigma, steps: 0, restarts: 0 };

  const locked: RitzPair[] = [];
  let steps = 0;
  let restarts = 0;
  const sturm = createLdltFactor(n, k.halfBandwidth);
  let lastRun: Workspace | null = null;
  for (;;) {
    const need = want - Math.min(locked.length, want) || 1;
    const runWant = Math.min(need + 2, n - locked.length);
    const run = lanczosRun(factor, m, locked, runWant, Math.min(need, runWant), tol, rand);
    steps += run.steps;
    lastRun = run.ws;
    if (!run.ok) return { ok: false, reason: 'not-converged', message: `Lanczos did not converge in ${run.steps} steps` };
    for (const pair of run.pairs) {
      pair.lambda = sigma + 1 / pair.theta;
      locked.push(pair);
    }
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
  const values = new Float64Array(want);
  if (restarts > 0) {
    // Pairs from separate runs: one Rayleigh–Ritz step on their span couples them and squares their error.
    const refined = inverseRayleighRitz(factor, m, sigma, locked);
    values.set(refined.values.subarray(0, want));
    const vectors = refined.vectors.slice(0, want * n);
    // Every vector read from the runs' bases is formed by now: the last basis may serve the next solve.
    if (lastRun) recycleBasis(lastRun);
    return { ok: true, values, vectors, release: () => {}, shift: sigma, steps, restarts };
  }
  const wanted = locked.slice(0, want);
  for (let i = 0; i < want; i++) values[i] = locked[i].lambda;
  const basis = lastRun;
  let formed: Float64Array | null = null;
  let released = false;
  const form = (): Float64Array => {
    if (formed) return formed;
    if (released) throw new Error('lowestModesBanded: vectors read after release()');
    const vectors = new Float64Array(want * n);
    const run = wanted[0] instanceof RitzVector ? wanted[0].basisOf().ws : null;
    if (run && wanted.every((p) => p instanceof RitzVector && p.basisOf().ws === run)) {
      // All from one run (the usual case): combined from its basis in one sweep over it, straight into `vectors`.
      combineRitzVectors(wanted as RitzVector[], vectors);
    } else {
      for (let i = 0; i < want; i++) vectors.set(wanted[i].x, i * n);
    }
    mOrthonormalise(m, vectors, want, n);
    formed = vectors;
    // Every vector read from the run's basis is formed by now (the locked pairs die here): it may serve the next solve.
    if (basis) recycleBasis(basis);
    return vectors;
  };
  return {
    ok: true,
    values,
    get vectors() {
      return form();
    },
    release: () => {
      if (formed || released) return;
      released = true;
      if (basis) recycleBasis(basis);
    },
    shift: sigma,
    steps,
    restarts,
  };
}

/**
 * Modified Gram–Schmidt in the M inner product, twice ("twice is enough"): the Ritz vectors of a
 * semi-orthogonal basis are orthogonal only to about √ε; this makes them M-orthonormal to rounding.
 */
function mOrthonormalise(m: SymBanded, vectors: Float64Array, count: number, n: number): void {
  const mv = new Float64Array(count * n);
  for (let pass = 0; pass < 2; pass++) {
    for (let a = 0; a < count; a++) {
      const ao = a * n;
      if (a > 0) {
        let c = 0;
        for (let i = 0; i < n; i++) c += mv[i] * vectors[ao + i];
        for (let b = 0; b < a; b++) {
          const bo = b * n;
          if (b + 1 === a) {
            for (let i = 0; i < n; i++) vectors[ao + i] -= c * vectors[bo + i];
            break;
          }
          // v_a −= c v_b fused with the next coefficient (M v_{b+1})ᵀ v_a: the same operations in the same order as two passes.
          const no = bo + n;
          let cn = 0;
          for (let i = 0; i < n; i++) {
            const vi = vectors[ao + i] - c * vectors[bo + i];
            vectors[ao + i] = vi;
            cn += mv[no + i] * vi;
          }
          c = cn;
        }
      }
      const va = vectors.subarray(ao, ao + n);
      const ma = mv.subarray(ao, ao + n);
      symBandedMulInto(m, va, ma);
      const norm = Math.sqrt(Math.max(dot(va, ma, n), 0));
      if (norm > 0) {
        for (let i = 0; i < n; i++) {
          va[i] /= norm;
          ma[i] /= norm;
        }
      }
    }
  }
}

interface RunOutcome {
  ok: boolean;
  steps: number;
  /** The run's workspace (its basis backs the pairs' vectors until they are read). */
  ws: Workspace;
  /** Converged Ritz pairs of OP, largest θ first. */
  pairs: RitzVector[];
}

/**
 * Basis arrays kept from finished solves (the solver runs on one thread and never re-enters): two, as a
 * refinement holds a mesh's dry and wet solves until it knows whether that mesh is its last.
 */
const spareBases: { q: Float64Array; mq: Float64Array }[] = [];
const SPARE_COUNT = 2;
/** Largest basis kept between solves (floats per array): 32 MB for a pair of arrays. */
const SPARE_LIMIT = 1 << 21;

function recycleBasis(ws: Workspace): void {
  if (ws.q.length > SPARE_LIMIT || spareBases.some((b) => b.q === ws.q)) return;
  if (spareBases.length < SPARE_COUNT) {
    spareBases.push({ q: ws.q, mq: ws.mq });
    return;
  }
  // Full: the new basis replaces the smallest kept one if it is larger.
  let smallest = 0;
  for (let i = 1; i < spareBases.length; i++) if (spareBases[i].q.length < spareBases[smallest].q.length) smallest = i;
  if (spareBases[smallest].q.length < ws.q.length) spareBases[smallest] = { q: ws.q, mq: ws.mq };
}

/** The smallest kept basis with room for `floats` per array, taken out of the pool; null if none fits. */
function takeSpareBasis(floats: number): { q: Float64Array; mq: Float64Array } | null {
  let best = -1;
  for (let i = 0; i < spareBases.length; i++) {
    if (spareBases[i].q.length >= floats && (best < 0 || spareBases[i].q.length < spareBases[best].q.length)) best = i;
  }
  return best < 0 ? null : spareBases.splice(best, 1)[0];
}

/**
 * Krylov basis and its M-images, one flat Float64Array each: vector j at `[j·n … (j+1)·n)`; the
 * tridiagonal's α_j and β_j (β_j couples vectors j − 1 and j; 0 at a block start) and the ω estimates
 * of |q_jᵀ M q_k| for the current and previous vectors. Grown by doubling, never per step.
 */
class Workspace {
  q: Float64Array;
  mq: Float64Array;
  alpha: Float64Array;
  beta: Float64Array;
  omPrev: Float64Array;
  omCur: Float64Array;
  omNext: Float64Array;
  cap: number;
  constructor(
    readonly n: number,
    cap: number,
  ) {
    this.cap = cap;
    // The basis arrays are the large ones: taken from an earlier solve's when they fit (a refinement's
    // dry and wet solves, and the next mesh, which has about twice the DOFs), else made with room for that.
    // Stale entries are harmless: vector j is written before anything reads it.
    const spare = takeSpareBasis(cap * n);
    if (spare) {
      this.q = spare.q;
      this.mq = spare.mq;
    } else {
      this.q = new Float64Array(2 * cap * n);
      this.mq = new Float64Array(2 * cap * n);
    }
    this.alpha = new Float64Array(cap);
    this.beta = new Float64Array(cap + 1);
    this.omPrev = new Float64Array(cap + 1);
    this.omCur = new Float64Array(cap + 1);
    this.omNext = new Float64Array(cap + 1);
  }
  grow(limit: number): void {
    const cap = Math.min(limit, 2 * this.cap);
    const n = this.n;
    const more = (a: Float64Array, len: number) => {
      const b = new Float64Array(len);
      b.set(a.subarray(0, Math.min(a.length, len)));
      return b;
    };
    this.q = more(this.q, cap * n);
    this.mq = more(this.mq, cap * n);
    this.alpha = more(this.alpha, cap);
    this.beta = more(this.beta, cap + 1);
    this.omPrev = more(this.omPrev, cap + 1);
    this.omCur = more(this.omCur, cap + 1);
    this.omNext = more(this.omNext, cap + 1);
    this.cap = cap;
  }
}

/**
 * Largest fall of the worst residual ratio (`RitzWork.check`) in one Lanczos step assumed when spacing the
 * convergence checks, in decades. The residuals of the wanted Ritz pairs fall geometrically, at a rate set by
 * the gaps of the spectrum (the Kaniel–Paige–Saad bounds: Parlett, The Symmetric Eigenvalue Problem, ch. 12;
 * Saad, Numerical Methods for Large Eigenvalue Problems, ch. 6; chapters from memory). Measured on the demo
 * members and on a 200- and a 1000-element pile, the worst ratio fell by 0.1 to 2.0 decades a step, starting
 * near 10¹⁰. A run whose ratio is 10^L away cannot converge in fewer than L / 3 steps unless it falls faster
 * than that; if it ever does, the run only takes a step or two more than it needed (its pairs are then more
 * accurate, not less).
 */
const MAX_DECADES_PER_STEP = 3;

/** Steps until the next convergence check worth its O(j²) cost, from the worst residual ratio of the last one. */
function stepsToNextCheck(worst: number): number {
  if (!(worst > 1) || worst === Infinity) return 1;
  return Math.max(1, Math.ceil(Math.log10(worst) / MAX_DECADES_PER_STEP));
}

/**
 * One Lanczos run, M-orthogonal to the locked pairs, until the `tight` largest Ritz values θ have relative
 * residual ≤ tol (|β_{j+1} s_ji| ≤ tol·θ_i, Parlett §13.2) and the next `want − tight` ≤ √tol, or the space
 * is exhausted. Those extra pairs serve the Sturm check, where a looser pair cannot hide a missed eigenvalue:
 * by Cauchy's interlace theorem (classical; Parlett, ch. 10) the k-th largest Ritz value θ never exceeds the
 * k-th largest eigenvalue, so a Ritz λ = σ + 1/θ below μ means a true one below μ too. Asking them for tol as
 * well would cost the run several steps (the last pairs converge last) for digits nobody reads.
 */
function lanczosRun(f: LdltFactor, m: SymBanded, locked: RitzPair[], want: number, tight: number, tol: number, rand: () => number): RunOutcome {
  const n = f.n;
  const maxSteps = n - locked.length;
  const ws = new Workspace(n, Math.min(maxSteps, Math.max(2 * want + 16, 32)));
  const r = new Float64Array(n);
  const mr = new Float64Array(n);
  const ritz = new RitzWork();

  const orthLocked = (v: Float64Array): void => {
    for (const p of locked) {
      const c = dot(p.mx, v, n);
      for (let i = 0; i < n; i++) v[i] -= c * p.x[i];
    }
  };
  /** One modified Gram–Schmidt pass of v against basis vectors 0 … count−1 (only those marked, if a mask is given). */
  const orthBasis = (v: Float64Array, count: number, mask?: Uint8Array): void => {
    const { q, mq } = ws;
    let k = 0;
    while (k < count && mask && mask[k] === 0) k++;
    if (k >= count) return;
    let c = 0;
    for (let i = 0; i < n; i++) c += mq[k * n + i] * v[i];
    for (;;) {
      let next = k + 1;
      while (next < count && mask && mask[next] === 0) next++;
      const off = k * n;
      if (next >= count) {
        for (let i = 0; i < n; i++) v[i] -= c * q[off + i];
        return;
      }
      // v −= c q_k fused with the next coefficient (M q_next)ᵀ v: each v_i is updated, then read, exactly as
      // by two separate passes (same operations, same order, so the same bits), in one sweep over v.
      const noff = next * n;
      let cn = 0;
      for (let i = 0; i < n; i++) {
        const vi = v[i] - c * q[off + i];
        v[i] = vi;
        cn += mq[noff + i] * vi;
      }
      c = cn;
      k = next;
    }
  };
  const mNorm = (): number => {
    symBandedMulInto(m, r, mr);
    return Math.sqrt(Math.max(dot(r, mr, n), 0));
  };
  /** Fresh random start in r, orthogonal to everything so far; returns its M-norm. */
  const randomStart = (count: number): number => {
    for (let attempt = 0; attempt < 5; attempt++) {
      for (let i = 0; i < n; i++) r[i] = rand();
      for (let pass = 0; pass < 2; pass++) {
        orthLocked(r);
        orthBasis(r, count);
      }
      const b = mNorm();
      if (b > 1e-8) return b;
    }
    return 0;
  };

  let b = randomStart(0);
  let j = 0;
  let tnorm = 0;
  let forceNext = false;
  let nextCheck = 0;
  let mask = new Uint8Array(ws.cap + 1);
  ws.beta[0] = 0;
  ws.omCur[0] = 1;
  while (j < maxSteps) {
    if (b === 0) break;
    if (j === ws.cap) ws.grow(maxSteps);
    const { q, mq, alpha, beta } = ws;
    const off = j * n;
    const inv = 1 / b;
    for (let i = 0; i < n; i++) {
      q[off + i] = r[i] * inv;
      mq[off + i] = mr[i] * inv;
    }
    // r = OP q_j = (K − σM)⁻¹ M q_j, then the three-term recurrence.
    solveLdltInto(f, mq.subarray(off, off + n), r);
    // α_j = (M q_j)ᵀ r, summed in the same pass that subtracts β_j q_{j−1} (same operations, same order).
    let aj = 0;
    if (j > 0) {
      const bj = beta[j];
      const po = off - n;
      for (let i = 0; i < n; i++) {
        const ri = r[i] - bj * q[po + i];
        r[i] = ri;
        aj += mq[off + i] * ri;
      }
    } else {
      for (let i = 0; i < n; i++) aj += mq[off + i] * r[i];
    }
    alpha[j] = aj;
    for (let i = 0; i < n; i++) r[i] -= aj * q[off + i];
    if (locked.length > 0) orthLocked(r);
    b = mNorm();
    tnorm = Math.max(tnorm, Math.abs(aj) + b + beta[j]);

    // Simon's ω-recurrence: estimated |q_{j+1}ᵀ M q_k| from the tridiagonal alone, with a rounding term.
    const { omPrev, omCur, omNext } = ws;
    let worst = 0;
    if (b > 0) {
      for (let k = 0; k < j; k++) {
        let t = beta[k + 1] * omCur[k + 1] + (alpha[k] - aj) * omCur[k] - beta[j] * omPrev[k];
        if (k > 0) t += beta[k] * omCur[k - 1];
        t = (t + Math.sign(t || 1) * EPS * tnorm) / b;
        omNext[k] = t;
        worst = Math.max(worst, Math.abs(t));
      }
      omNext[j] = (EPS * tnorm) / b;
    }
    if (forceNext || worst > SQRT_EPS) {
      // Reorthogonalise this vector and the next one (Simon §4) against the earlier vectors whose ω has
      // grown past ε^¾ (and those chosen for the previous vector): together they restore semi-orthogonality
      // at a fraction of the cost of a sweep over the whole basis.
      if (mask.length < j + 1) {
        const wider = new Uint8Array(ws.cap + 1);
        wider.set(mask);
        mask = wider;
      }
      for (let k = 0; k <= j; k++) if (Math.abs(omNext[k]) >= ETA) mask[k] = 1;
      orthBasis(r, j + 1, mask);
      const before = b;
      b = mNorm();
      if (b < 0.5 * before) {
        orthBasis(r, j + 1, mask);
        b = mNorm();
      }
      for (let k = 0; k <= j; k++) if (mask[k] === 1) omNext[k] = EPS;
      forceNext = !forceNext;
      if (!forceNext) mask.fill(0);
    }
    omNext[j + 1] = 1;
    beta[j + 1] = b;
    j++;
    const breakdown = b <= 1e-12 * tnorm;
    const exhausted = j >= maxSteps;
    if (j >= want && (j >= nextCheck || breakdown || exhausted)) {
      const check = ritz.check(ws, j, breakdown ? 0 : b, want, tight, tol, exhausted);
      if (!check) return { ok: false, steps: j, ws, pairs: [] };
      if (check.converged) return { ok: true, steps: j, ws, pairs: ritz.pairs(ws, j, want) };
      nextCheck = j + stepsToNextCheck(check.worst);
    }
    // Rotate the ω rows: the new vector becomes the current one.
    ws.omPrev = omCur;
    ws.omCur = omNext;
    ws.omNext = omPrev;
    if (breakdown && !exhausted) {
      // Invariant subspace found: continue from a fresh vector, fully orthogonal, with no coupling.
      b = randomStart(j);
      ws.beta[j] = 0;
      for (let k = 0; k < j; k++) ws.omCur[k] = EPS;
      ws.omCur[j] = 1;
      forceNext = false;
      mask.fill(0);
    }
  }
  return { ok: false, steps: j, ws, pairs: [] };
}

/** The tridiagonal's eigen-decomposition, with buffers reused from check to check. */
class RitzWork {
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
function combineRitzVectors(pairs: RitzVector[], out: Float64Array): void {
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
class RitzVector implements RitzPair {
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
