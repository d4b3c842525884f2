/**
 * Resonance screening over a band: screens the member at the likely inputs and at every setting where a
 * wet (and, when machinery is also checked dry, dry) band extreme was found, judges each check over the
 * band (`band-verdict.ts`), and, for each check whose verdict over the band differs from its likely one,
 * finds where along the input that moves its mode most (others likely) the likely verdict changes:
 * Brent's root search (R.P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4) on the
 * check's margin minus the margin at the verdict boundary.
 */
import type { MemberModel } from '../beam/model';
import type { SectionSolver } from '../beam/section-bridge';
import { solveMember } from '../beam/solve-member';
import { type CaseExcitation, screeningInputFor } from '../excitation/from-member';
import type { CheckResult, ScreeningResult } from '../excitation/results';
import { screenResonance } from '../excitation/screen';
import type { Verdict } from '../excitation/verdict';
import type { BandResult } from './band-types';
import { type BandVerdict, judgeOverBand, type VerdictSwitch } from './band-verdict';
import { brentZero } from './brent';
import { type ModelAt, rememberingSectionSolver } from './evaluate';
import { withNumbersAt } from './paths';

export type BandScreeningOutcome = { ok: true; verdict: BandVerdict; screenings: number } | { ok: false; message: string };

/** A margin for the root search: an unreached check counts as far clear. */
function marginOf(c: CheckResult | null): number {
  return c === null || c.marginPercent === null ? 1e6 : c.marginPercent / 100;
}

/**
 * `modelAt` and `excitationAt` (optional) rebuild the member and its excitation at a setting of the ranged
 * inputs, for a band from `parametricBand` whose inputs are not single model numbers; by default the numbers
 * at the ranges' paths are set and the excitation is the same everywhere.
 */
export interface BandScreeningOptions {
  sectionSolver?: SectionSolver;
  modelAt?: ModelAt;
  excitationAt?: (x: ArrayLike<number>) => CaseExcitation;
}

export function screenBand(model: MemberModel, band: BandResult, excitation: CaseExcitation, options: BandScreeningOptions = {}): BandScreeningOutcome {
  const solver = options.sectionSolver ?? rememberingSectionSolver();
  const paths = band.ranges.map((r) => r.path);
  const cache = new Map<string, ScreeningResult | string>();
  let screenings = 0;
  const screenAt = (x: readonly number[]): ScreeningResult | string => {
    const key = x.join(',');
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    screenings++;
    let out: ScreeningResult | string;
    try {
      const m = options.modelAt ? options.modelAt(x) : withNumbersAt(model, paths, x);
      const ex = options.excitationAt ? options.excitationAt(x) : excitation;
      const solved = solveMember(m, { sectionSolver: solver });
      out = solved.ok ? screenResonance(screeningInputFor(m, solved.result, ex)) : solved.message;
    } catch (e) {
      out = e instanceof Error ? e.message : String(e);
    }
    cache.set(key, out);
    return out;
  };

  const x0 = band.ranges.map((r) => r.likely);
  let likely: ScreeningResult;
  try {
    likely = screenResonance(screeningInputFor(model, band.likely, excitation));
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
  cache.set(x0.join(','), likely);
  const alsoDry = excitation.machineryAgainst === 'wet-and-dry';
  const main = band.wet ?? band.dry;
  const sets = [main, ...(alsoDry && band.wet ? [band.dry] : [])];
  const ends: ScreeningResult[] = [];
  for (const set of sets) {
    for (const m of set.modes) {
      for (const at of [m.lowAt, m.highAt]) {
        const s = screenAt(at);
        if (typeof s === 'string') return { ok: false, message: `at ${paths.map((p, i) => `${p} = ${at[i]}`).join(', ')}: ${s}` };
        if (!ends.includes(s)) ends.push(s);
      }
    }
  }
  const verdict = judgeOverBand(likely, ends, (j, basis) => {
    const set = basis === 'dry' || !band.wet ? band.dry : band.wet;
    return set.modes[j] ? [set.modes[j].lowHz, set.modes[j].highHz] : null;
  });

  const sep = likely.limits.separationMargin.value;
  for (const check of verdict.checks) {
    if (check.band.verdict === check.likely.verdict) continue;
    // The input that moves this mode's frequency most along its axis.
    let best = -1;
    let swing = 0;
    band.axes.forEach((a, i) => {
      const series = (check.frequencyBasis === 'wet' && a.wetHz ? a.wetHz : a.dryHz).map((f) => f[check.modeIndex]);
      const sw = Math.max(...series) - Math.min(...series);
      if (sw > swing) {
        swing = sw;
        best = i;
      }
    });
    if (best < 0) continue;
    const r = band.ranges[best];
    const checkAt = (v: number): CheckResult | null => {
      const x = x0.slice();
      x[best] = v;
      const s = screenAt(x);
      if (typeof s === 'string') return null;
      const mode = s.modes[check.modeIndex];
      return mode ? (mode.checks.find((c) => c.kind === check.kind && c.label === check.label && c.frequencyBasis === check.frequencyBasis) ?? null) : null;
    };
    for (const end of [r.low, r.high]) {
      if (end === r.likely) continue;
      const atEnd = checkAt(end);
      if (!atEnd || atEnd.verdict === check.likely.verdict) continue;
      const lv = check.likely.verdict;
      const threshold = lv === 'clear' || (lv === 'close' && atEnd.verdict === 'clear') ? sep : 0;
      const becomes: Verdict = lv === 'clear' ? 'close' : lv === 'inside-band' ? 'close' : atEnd.verdict;
      const g = (v: number) => marginOf(checkAt(v)) - threshold;
      const root = brentZero(g, r.likely, end, { xTolerance: 1e-4 * Math.abs(r.high - r.low) });
      if (!root.ok) continue;
      const sw: VerdictSwitch = { path: r.path, likelyValue: r.likely, value: root.x, side: end > r.likely ? 'above' : 'below', becomes };
      check.switches.push(sw);
    }
  }
  return { ok: true, verdict, screenings };
}
