/**
 * Sampled search for the lowest and highest frequency of a mode over the box of ranges, used where the
 * corner method does not hold (a frequency that turns back inside a range, modes that cross):
 * seeded Latin-hypercube samples (M.D. McKay, R.J. Beckman, W.J. Conover, "A comparison of three methods
 * for selecting values of input variables in the analysis of output from a computer code", Technometrics
 * 21 (1979) 239), then, from the best setting found so far, line searches along each input in turn with
 * Brent's minimiser (R.P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 5) in a
 * window around it, with the window's ends evaluated explicitly (`lineMinimum`). Every setting solved counts
 * against the solve budget; the search stops at the budget.
 */
import { seededUniform01 } from '../linalg/seeded';
import { brentMinimum } from './brent';
import type { EvalFailure, MemberEvaluator } from './evaluate';
import type { ResolvedRange } from './ranges';

export interface SearchTarget {
  state: 'dry' | 'wet';
  /** 0-based mode (k-th lowest). */
  mode: number;
}

/** Latin-hypercube samples in the unit cube: point-major, k per point. */
export function latinHypercube(n: number, k: number, seed: number): Float64Array {
  const rnd = seededUniform01(seed);
  const out = new Float64Array(n * k);
  const perm = new Int32Array(n);
  for (let j = 0; j < k; j++) {
    for (let i = 0; i < n; i++) perm[i] = i;
    for (let i = n - 1; i > 0; i--) {
      const r = Math.floor(rnd() * (i + 1));
      const t = perm[i];
      perm[i] = perm[r];
      perm[r] = t;
    }
    for (let i = 0; i < n; i++) out[i * k + j] = (perm[i] + rnd()) / n;
  }
  return out;
}

/** Evaluates `n` seeded Latin-hypercube settings inside the ranges. */
export function sampleBox(ev: MemberEvaluator, ranges: readonly ResolvedRange[], n: number, seed: number): EvalFailure | null {
  const k = ranges.length;
  const u = latinHypercube(n, k, seed);
  const x = new Float64Array(k);
  for (let i = 0; i < n; i++) {
    if (ev.budgetLeft <= 0) return null;
    for (let j = 0; j < k; j++) x[j] = ranges[j].low + u[i * k + j] * (ranges[j].high - ranges[j].low);
    const r = ev.solve(x);
    if (!r.ok) return r;
  }
  return null;
}

/** Index of the stored setting with the lowest (sense = 1) or highest (sense = −1) frequency. */
export function bestPoint(ev: MemberEvaluator, t: SearchTarget, sense: 1 | -1): number {
  const s = ev.store;
  let best = 0;
  for (let p = 1; p < s.count; p++) {
    if (sense * s.frequency(p, t.state, t.mode) < sense * s.frequency(best, t.state, t.mode)) best = p;
  }
  return best;
}

/**
 * Relative precision to which a line search pins an extreme frequency: the search stops once its three best
 * points agree to this fraction of the frequency. 1e-4 is ten times finer than the 3 significant figures a band
 * is reported to (1e-3 at best) and five times finer than the mesh's own accuracy (5e-4), so the band's ends are
 * limited by the mesh, not by the search; near a smooth extreme Brent's parabolic steps usually land far closer
 * (the pinned-beam peak of the band tests to 1e-6).
 */
export const SEARCH_RTOL = 1e-4;

/** Step inward from a range end, as a fraction of the window, that tests the one-sided slope there. */
const END_PROBE = 0.02;

export interface LineOptions {
  xTolerance: number;
  fTolerance: number;
  maxEvaluations: number;
}

/**
 * Half-width of a line search's window, as a fraction of each range: about two sample spacings of a
 * k-dimensional design of `count` points. Fixed for all the searches of one band, so searches that start
 * from the same setting (a corner where several modes are lowest) meet the same window ends and share solves.
 */
export function searchWindow(count: number, k: number): number {
  return Math.min(0.5, 2 / Math.pow(Math.max(count, 2), 1 / k));
}

/**
 * The least f on [a, b], given f(x0) = f0 (x0 in [a, b]). Brent's minimiser never evaluates the ends and creeps
 * towards a minimum lying at one by its tolerance, a dozen evaluations for nothing, so the ends are evaluated
 * first: when the best of a, x0 and b is an end and a short step inward from it is no better (the one-sided
 * slope points out of the interval), the end is taken. Otherwise Brent's minimiser runs from the best interior
 * point known, and its answer is compared with the ends (a bounded minimisation).
 */
export function lineMinimum(f: (x: number) => number, a: number, b: number, x0: number, f0: number, o: LineOptions): { x: number; fx: number } {
  let best = { x: x0, fx: f0 };
  const at = (x: number): number => {
    if (x === x0) return f0;
    const y = f(x);
    if (y < best.fx) best = { x, fx: y };
    return y;
  };
  const probeFrom = (end: number): boolean => {
    const fEnd = best.fx;
    return !(at(end === a ? a + END_PROBE * (b - a) : b - END_PROBE * (b - a)) < fEnd);
  };
  // Starting at an end: the inward step alone can show the slope points out (one solve).
  if ((x0 === a || x0 === b) && probeFrom(x0)) return best;
  at(a);
  at(b);
  if ((best.x === a || best.x === b) && best.x !== x0 && probeFrom(best.x)) return best;
  const inside = best.x > a && best.x < b ? best : undefined;
  const m = brentMinimum(at, a, b, { xTolerance: o.xTolerance, fTolerance: o.fTolerance, maxEvaluations: o.maxEvaluations, start: inside });
  return m.fx < best.fx ? { x: m.x, fx: m.fx } : best;
}

/**
 * Refines the lowest (sense = 1) or highest (sense = −1) frequency of one mode by line searches along each
 * input from the best stored setting, in a window of ±`spacing` of each range around it (`searchWindow`). Every solve stores every mode of both states, so a search for one mode
 * also moves the bests of the others (the band is read over all stored settings), and a setting met again (a
 * corner, a range end shared by two searches) costs no solve. Returns a failure, or null (done or out of
 * budget: see ev.budgetLeft).
 */
export function refineExtreme(ev: MemberEvaluator, ranges: readonly ResolvedRange[], t: SearchTarget, sense: 1 | -1, spacing: number, passes = 2): EvalFailure | null {
  const k = ranges.length;
  const p0 = bestPoint(ev, t, sense);
  const x = ev.store.point(p0);
  let fx = sense * ev.store.frequency(p0, t.state, t.mode);
  const fTolerance = SEARCH_RTOL * Math.abs(fx);
  let failure: EvalFailure | null = null;
  // Lines in turn (input 0, 1, …, k − 1, 0, …) for at most `passes` rounds; a line searched again with no other
  // input moved since is wasted, so the search ends once k lines in a row (counting the last one that gained)
  // gained no more than the tolerance.
  let stale = 0;
  for (let n = 0; n < passes * k && stale < k; n++) {
    const j = n % k;
    const { low, high } = ranges[j];
    if (!(high > low) || ev.budgetLeft < 3) {
      stale++;
      continue;
    }
    const w = spacing * (high - low);
    const a = Math.max(low, x[j] - w);
    const b = Math.min(high, x[j] + w);
    const f = (v: number): number => {
      if (failure || ev.budgetLeft <= 0) return Infinity;
      const trial = x.slice();
      trial[j] = v;
      const r = ev.solve(trial);
      if (!r.ok) {
        failure = r;
        return Infinity;
      }
      return sense * ev.store.frequency(r.index, t.state, t.mode);
    };
    const m = lineMinimum(f, a, b, x[j], fx, { xTolerance: 1e-4 * (high - low), fTolerance, maxEvaluations: Math.min(30, ev.budgetLeft) });
    if (failure) return failure;
    stale = fx - m.fx > fTolerance ? 1 : stale + 1;
    if (m.fx < fx) {
      fx = m.fx;
      x[j] = m.x;
    }
  }
  return null;
}
