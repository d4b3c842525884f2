/**
 * Each resonance check judged over the frequency band, beside its likely-value verdict. Pure: it reads
 * screenings already run (at the likely inputs and at the band's ends) and the band's frequency ranges.
 *
 * Rule, per check (one mode against one excitation), with the verdict rule of `excitation/verdict.ts`:
 * - "inside band" if any part of the mode's frequency band lands inside the excitation band;
 * - "close" if the separation margin is not met somewhere over the band (so a "clear" at the likely
 *   value becomes "close" when the margin holds there but not over the band);
 * - "clear" only if the whole band clears.
 * The excitation band itself may move with the inputs (a V_R band with the diameter, growth or the mode's
 * place in the flow), so the frequency band is compared with the excitation band of every screening given.
 */
import type { CheckResult, ExcitationKind, ScreeningResult } from '../excitation/results';
import { classifyFrequency, compareSeverity, type Verdict } from '../excitation/verdict';

/** Where a check's likely verdict changes along one input, the others at their likely values. */
export interface VerdictSwitch {
  path: string;
  likelyValue: number;
  /** The input's value at which the verdict changes (SI). */
  value: number;
  /** The verdict changes for values above or below `value`. */
  side: 'above' | 'below';
  becomes: Verdict;
}

export interface CheckOverBand {
  modeIndex: number;
  checkIndex: number;
  kind: ExcitationKind;
  label: string;
  frequencyBasis: 'wet' | 'dry';
  likely: { verdict: Verdict; marginPercent: number | null; frequencyHz: number };
  /** The mode's frequency band in the check's basis, Hz. */
  frequencyRangeHz: [number, number];
  band: { verdict: Verdict; worstMarginPercent: number | null };
  /** Filled by `screenBand`: where the likely verdict would change along the input that moves this mode most. */
  switches: VerdictSwitch[];
}

export interface BandVerdict {
  likelyVerdict: Verdict;
  bandVerdict: Verdict;
  checks: CheckOverBand[];
  /** Index in `checks` of the worst check over the band (first of equals), or −1. */
  driverIndex: number;
}

/** The frequency band of a mode (0-based) in a basis, Hz; null when the band has no such state. */
export type FrequencyRange = (modeIndex: number, basis: 'wet' | 'dry') => [number, number] | null;

function matching(run: ScreeningResult, modeIndex: number, checkIndex: number, like: CheckResult): CheckResult | null {
  const checks = run.modes[modeIndex]?.checks ?? [];
  const same = (c: CheckResult) => c.kind === like.kind && c.label === like.label && c.frequencyBasis === like.frequencyBasis;
  if (checks[checkIndex] && same(checks[checkIndex])) return checks[checkIndex];
  return checks.find(same) ?? null;
}

/** Verdict of a frequency interval against one excitation band (worst point of the interval). */
export function classifyInterval(lowHz: number, highHz: number, check: CheckResult, separationMargin: number): { verdict: Verdict; marginPercent: number } | null {
  const b = check.bandHz;
  if (!b) return null;
  const band = { ...b, highInclusive: check.kind !== 'stem-frequency-ratio' };
  // A point of the interval inside the excitation band if there is one: the band's middle clamped to the interval.
  const probe = Math.min(highHz, Math.max(lowHz, 0.5 * (b.lowHz + b.highHz)));
  const candidates = [lowHz, highHz, probe].map((f) => classifyFrequency(f, band, separationMargin));
  candidates.sort(compareSeverity);
  return candidates[0];
}

/**
 * Judges every check of the likely screening over the band. `ends` are screenings at the settings where
 * the band's extremes were found (any number; checks are matched by mode, kind and label).
 */
export function judgeOverBand(likely: ScreeningResult, ends: readonly ScreeningResult[], range: FrequencyRange): BandVerdict {
  const s = likely.limits.separationMargin.value;
  const checks: CheckOverBand[] = [];
  for (const mode of likely.modes) {
    mode.checks.forEach((c, ci) => {
      const runs = [c, ...ends.map((e) => matching(e, mode.modeIndex, ci, c)).filter((x): x is CheckResult => x !== null)];
      let lo = Math.min(...runs.map((r) => r.frequencyHz));
      let hi = Math.max(...runs.map((r) => r.frequencyHz));
      const r = range(mode.modeIndex, c.frequencyBasis);
      if (r) {
        lo = Math.min(lo, r[0]);
        hi = Math.max(hi, r[1]);
      }
      let worst: { verdict: Verdict; marginPercent: number | null } = runs.slice().sort(compareSeverity)[0];
      for (const run of runs) {
        const over = classifyInterval(lo, hi, run, s);
        if (over && compareSeverity(over, worst) < 0) worst = over;
      }
      checks.push({
        modeIndex: mode.modeIndex,
        checkIndex: ci,
        kind: c.kind,
        label: c.label,
        frequencyBasis: c.frequencyBasis,
        likely: { verdict: c.verdict, marginPercent: c.marginPercent, frequencyHz: c.frequencyHz },
        frequencyRangeHz: [lo, hi],
        band: { verdict: worst.verdict, worstMarginPercent: worst.marginPercent },
        switches: [],
      });
    });
  }
  let driverIndex = -1;
  for (let i = 0; i < checks.length; i++) {
    if (driverIndex < 0 || compareSeverity(toSev(checks[i]), toSev(checks[driverIndex])) < 0) driverIndex = i;
  }
  return {
    likelyVerdict: likely.verdict,
    bandVerdict: driverIndex >= 0 ? checks[driverIndex].band.verdict : 'clear',
    checks,
    driverIndex,
  };
}

function toSev(c: CheckOverBand): { verdict: Verdict; marginPercent: number | null } {
  return { verdict: c.band.verdict, marginPercent: c.band.worstMarginPercent };
}

/** "clear unless liquid.toM is above 6.5" (values in SI, 4 significant figures). */
export function switchText(likely: Verdict, sw: VerdictSwitch): string {
  const words: Record<Verdict, string> = { clear: 'clear', close: 'close', 'inside-band': 'inside band' };
  return `${words[likely]} unless ${sw.path} is ${sw.side} ${Number(sw.value.toPrecision(4))} (then ${words[sw.becomes]})`;
}
