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
 * (Simon, Theorem 4). The eigenvalues are the Ritz values σ + 1/θ, except for the low modes of a
 * stiff (fine-mesh) problem: there the factorisation's backward error ε‖K‖ leaves about ε·λmax/λ in a
 * Ritz value, and a plain Rayleigh quotient xᵀKx cancels terms of size ‖K‖ just as badly, so those values
 * are re-read as Rayleigh quotients summed in doubled precision (compensated-rayleigh.ts).
 * A Krylov space holds one vector per eigenvalue, so a repeated eigenvalue (the two rigid-body modes
 * of a free–free beam) could be missed: after convergence a Sturm count (inertia of K − μM) checks that
 * every eigenvalue below the highest one found is accounted for; if not, the found pairs are locked and
 * Lanczos restarts from a fresh vector orthogonal to them.
 */
import { seededUniform01 } from './seeded';
import { type SymBanded, symBandedGet, symBandedMulInto } from './banded';
import { createLdltFactor, factorLdltInto, type LdltFactor, solveLdltInto } from './banded-ldlt';
import { inverseRayleighRitz } from './eigen-rayleigh-ritz';
import { reReadRayleighQuotients } from './compensated-rayleigh';
import { recycleBasis, Workspace } from './lanczos-basis';
import { combineRitzVectors, type RitzPair, RitzVector, RitzWork } from './lanczos-ritz';

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
    reReadStiffValues(k, m, sigma, scale, values, vectors);
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
  reReadStiffValues(k, m, sigma, scale, values, form);
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
 * A low mode's Ritz value carries about ε·λmax/λ of rounding through the factorisation's backward error
 * (λmax/λ1 reaches 1e16 on a 2,000-element beam), and a plain Rayleigh quotient cancels just as badly.
 * Where the crude bound ε·scale/λ (scale ≈ λmax, `diagonalRatioMax`) passes 1e-6, the vectors are formed and
 * each value whose sharper bound (the condition of xᵀKx) passes 1e-6 is read again as a Rayleigh quotient
 * summed in doubled precision (compensated-rayleigh.ts), exact to its vector's error squared. Both bounds are
 * worst cases, and the errors seen are a thousandth of them or less (λ1 of the bench's 1,000-element member:
 * 2.6e-6 against bounds of 6e-3 and 1.8e-3), so a value left as it is keeps about 1e-9. A coarse mesh passes
 * neither test, so its vectors need not be formed at all.
 * `vectors`: the vectors, or a function that forms them (called only when the crude bound passes).
 */
function reReadStiffValues(
  k: SymBanded,
  m: SymBanded,
  sigma: number,
  scale: number,
  values: Float64Array,
  vectors: Float64Array | (() => Float64Array),
): void {
  let rough = 0;
  while (rough < values.length && EPS * scale > 1e-6 * Math.abs(values[rough] - sigma)) rough++;
  if (rough === 0) return;
  reReadRayleighQuotients(k, m, typeof vectors === 'function' ? vectors() : vectors, values, rough, 1e-6);
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
