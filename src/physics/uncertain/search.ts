/**
 * Sampled search for the lowest and highest frequency of a mode over the box of ranges, used where the
 * corner method does not hold (a frequency that turns back inside a range, modes that cross):
 * seeded Latin-hypercube samples (M.D. McKay, R.J. Beckman, W.J. Conover, "A comparison of three methods
 * for selecting values of input variables in the analysis of output from a computer code", Technometrics
 * 21 (1979) 239), then, from the best setting found so far, line searches along each input in turn with
 * Brent's minimiser (R.P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 5) in a
 * window around it. Every setting solved counts against the solve budget; the search stops at the budget.
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
 * Refines the lowest (sense = 1) or highest (sense = −1) frequency of one mode by line searches along each
 * input from the best stored setting. Returns a failure, or null (done or out of budget: see ev.budgetLeft).
 */
export function refineExtreme(ev: MemberEvaluator, ranges: readonly ResolvedRange[], t: SearchTarget, sense: 1 | -1, passes = 2): EvalFailure | null {
  const k = ranges.length;
  const x = ev.store.point(bestPoint(ev, t, sense));
  let fx = sense * ev.store.frequency(bestPoint(ev, t, sense), t.state, t.mode);
  // Window: about two sample spacings of a k-dimensional design of the points solved so far.
  const spacing = Math.min(0.5, 2 / Math.pow(Math.max(ev.store.count, 2), 1 / k));
  let failure: EvalFailure | null = null;
  for (let pass = 0; pass < passes; pass++) {
    const start = fx;
    for (let j = 0; j < k; j++) {
      const { low, high } = ranges[j];
      if (!(high > low) || ev.budgetLeft < 3) continue;
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
      const m = brentMinimum(f, a, b, { xTolerance: 1e-6 * (high - low), maxEvaluations: Math.min(30, ev.budgetLeft) });
      if (failure) return failure;
      if (m.fx < fx) {
        fx = m.fx;
        x[j] = m.x;
      }
    }
    if (!(start - fx > 1e-9 * Math.abs(fx))) break;
  }
  return null;
}
