/**
 * Brent's bracketed root search and his one-dimensional minimiser, after R.P. Brent, "Algorithms for
 * Minimization without Derivatives" (Prentice-Hall, 1973): ch. 4 (procedure zero: bisection safeguarding
 * inverse quadratic and linear interpolation) and ch. 5 (procedure localmin: golden section safeguarding
 * successive parabolic interpolation). Written fresh from the published descriptions. Pure: the only
 * effect is calling `f`. Failure (no bracket, a non-finite value) is a typed result, never a throw.
 */

/** Relative machine precision of a double (2^-52). */
const EPS = 2.220446049250313e-16;

export type RootOutcome =
  | { ok: true; x: number; fx: number; evaluations: number }
  | { ok: false; reason: 'not-bracketed' | 'not-finite'; message: string; evaluations: number };

export interface RootOptions {
  /** Absolute tolerance on x (Brent's t); the search stops within 4·EPS·|x| + 2t of a sign change. Default 0. */
  xTolerance?: number;
  /** Safety cap on evaluations (Brent's method needs at most about (log2((b − a)/t))² ). Default 200. */
  maxEvaluations?: number;
  /** Already-known f(a) and f(b), to save two evaluations. */
  fa?: number;
  fb?: number;
}

/** A zero of f in [a, b], where f(a) and f(b) have opposite signs (or one is 0). */
export function brentZero(f: (x: number) => number, a: number, b: number, options: RootOptions = {}): RootOutcome {
  const t = options.xTolerance ?? 0;
  const maxEval = options.maxEvaluations ?? 200;
  let evals = 0;
  const call = (x: number): number => {
    evals++;
    return f(x);
  };
  let fa = options.fa ?? call(a);
  let fb = options.fb ?? call(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) return { ok: false, reason: 'not-finite', message: `f is not finite at an end of [${a}, ${b}]`, evaluations: evals };
  if (fa === 0) return { ok: true, x: a, fx: 0, evaluations: evals };
  if (fb === 0) return { ok: true, x: b, fx: 0, evaluations: evals };
  if ((fa > 0) === (fb > 0)) return { ok: false, reason: 'not-bracketed', message: `f has the same sign at both ends of [${a}, ${b}]`, evaluations: evals };
  // b is the best estimate, a the previous one, c the point such that f(b) and f(c) bracket the zero.
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (;;) {
    if ((fb > 0) === (fc > 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + t;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { ok: true, x: b, fx: fb, evaluations: evals };
    if (evals >= maxEval) return { ok: true, x: b, fx: fb, evaluations: evals };
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m;
      e = m;
    } else {
      let s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        // Linear (secant) interpolation.
        p = 2 * m * s;
        q = 1 - s;
      } else {
        // Inverse quadratic interpolation through (a, fa), (b, fb), (c, fc).
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      s = e;
      e = d;
      // Accept the interpolation only if it falls well inside the bracket and shrinks fast enough.
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * s * q)) {
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = call(b);
    if (!Number.isFinite(fb)) return { ok: false, reason: 'not-finite', message: `f is not finite at x = ${b}`, evaluations: evals };
  }
}

export interface MinimumOutcome {
  x: number;
  fx: number;
  evaluations: number;
}

export interface MinimumOptions {
  /** Absolute tolerance on x; default 1e-8 × (b − a). */
  xTolerance?: number;
  /** Safety cap on evaluations. Default 60. */
  maxEvaluations?: number;
  /** A point strictly inside (a, b) whose value is already known, to start from instead of the golden-section point. */
  start?: { x: number; fx: number };
  /**
   * Stop once the three best points so far (Brent's x, w, v, all evaluated) differ in value by at most this:
   * the minimum value is then known to about this much even where x is not. Default 0 (x tolerance only).
   */
  fTolerance?: number;
}

/** (3 − √5)/2: the golden-section fraction. */
const GOLDEN = 0.5 * (3 - Math.sqrt(5));

/**
 * A local minimum of f on [a, b] (the global one when f is unimodal there): Brent's localmin. A
 * non-finite f(x) counts as +∞, so the search moves away from it.
 */
export function brentMinimum(f: (x: number) => number, a: number, b: number, options: MinimumOptions = {}): MinimumOutcome {
  const t = options.xTolerance ?? 1e-8 * Math.abs(b - a);
  const maxEval = options.maxEvaluations ?? 60;
  let evals = 0;
  const call = (x: number): number => {
    evals++;
    const y = f(x);
    return Number.isFinite(y) ? y : Infinity;
  };
  const sqrtEps = Math.sqrt(EPS);
  const ft = options.fTolerance ?? 0;
  const given = options.start && options.start.x > a && options.start.x < b ? options.start : null;
  let v = given ? given.x : a + GOLDEN * (b - a);
  let w = v;
  let x = v;
  let e = 0;
  let d = 0;
  let fx = given ? (Number.isFinite(given.fx) ? given.fx : Infinity) : call(x);
  let fv = fx;
  let fw = fx;
  for (;;) {
    const m = 0.5 * (a + b);
    const tol = sqrtEps * Math.abs(x) + t;
    const t2 = 2 * tol;
    if (Math.abs(x - m) <= t2 - 0.5 * (b - a) || evals >= maxEval) return { x, fx, evaluations: evals };
    if (ft > 0 && v !== w && w !== x && v !== x && Math.max(fw, fv) - fx <= ft) return { x, fx, evaluations: evals };
    let golden = true;
    if (Math.abs(e) > tol) {
      // Parabola through (v, fv), (w, fw), (x, fx).
      let r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        // Do not evaluate too close to the ends.
        if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
        golden = false;
      }
    }
    if (golden) {
      e = (x < m ? b : a) - x;
      d = GOLDEN * e;
    }
    const u = x + (Math.abs(d) >= tol ? d : d > 0 ? tol : -tol);
    const fu = call(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
}
