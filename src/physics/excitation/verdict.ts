/**
 * The verdict rule, one for every excitation.
 *
 * Every excitation is expressed as a band of mode frequencies [lowHz, highHz] that it can drive:
 * - a machinery order: the line f = order × shaft speed in Hz (low = high), or a range for a variable-speed drive;
 * - the wave band: 1/T_max … 1/T_min;
 * - a V_R range [V_min, V_max] at flow speed U and size D: f_n from U/(V_max·D) to U/(V_min·D);
 * - the stem screen f_s/f_n ≤ r_max: f_n below f_s / r_max (low = 0, upper edge excluded, since
 *   f_s/f_n = r_max exactly passes).
 *
 * Margin, in %, signed: the distance from the mode frequency f to the nearest band edge e, as a percentage
 * of that edge frequency: (f/e − 1)·100 above the band's upper edge, (1 − f/e)·100 below its lower edge,
 * so ±20 % means f outside [0.8·e_low, 1.2·e_high] — "±20 % of the forcing frequency", as separation rules
 * are usually stated. Inside the band the margin is minus the depth to the nearest edge (≤ 0).
 * For a V_R range the margin below onset equals U_crit/U − 1: how much the flow speed may still rise.
 *
 * Verdict:
 * - 'inside-band': f lies in the band (edges included where the source's inequality includes them);
 * - 'close': outside the band but margin < separation margin (the separation requirement is not met);
 * - 'clear': margin ≥ separation margin (exactly 20 % passes a 20 % requirement).
 *
 * Values within EDGE_RTOL (relative) of an edge count as on the edge, so a value typed exactly at a
 * published limit (V_R = 1.0, f = 1.2 × forcing) is not pushed across it by floating-point rounding.
 */

/** The verdict words, mildest first; saved cases keep them (src/case checks against this list). */
export const VERDICTS = ['clear', 'close', 'inside-band'] as const;
/** Resonance verdict, shown with an icon shape and never by colour alone. */
export type Verdict = (typeof VERDICTS)[number];

/** Words for the UI and report (verdicts are always shown as words, never colour alone). */
export const VERDICT_WORDS: Record<Verdict, string> = {
  clear: 'clear',
  close: 'close',
  'inside-band': 'inside band',
};

/** Relative tolerance for "exactly on an edge or on the margin". */
export const EDGE_RTOL = 1e-9;

export interface FrequencyBand {
  lowHz: number;
  highHz: number;
  /** Default true. */
  lowInclusive?: boolean;
  /** Default true. */
  highInclusive?: boolean;
}

export interface Classification {
  verdict: Verdict;
  marginPercent: number;
}

function near(a: number, b: number): boolean {
  return Math.abs(a - b) <= EDGE_RTOL * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Classify a mode frequency against an excitation band (see the rule above).
 * lowHz = 0 makes the band one-sided (everything below highHz). Requires 0 ≤ lowHz ≤ highHz, highHz > 0.
 */
export function classifyFrequency(frequencyHz: number, band: FrequencyBand, separationMargin: number): Classification {
  const { lowHz, highHz } = band;
  const lowIn = band.lowInclusive ?? true;
  const highIn = band.highInclusive ?? true;
  const f = frequencyHz;
  let marginFraction: number;
  let inside: boolean;
  if (lowHz > 0 && near(f, lowHz)) {
    inside = lowIn;
    marginFraction = 0;
  } else if (near(f, highHz)) {
    inside = highIn;
    marginFraction = 0;
  } else if (f > highHz) {
    inside = false;
    marginFraction = f / highHz - 1;
  } else if (f < lowHz) {
    inside = false;
    marginFraction = 1 - f / lowHz;
  } else {
    inside = true;
    const fromLow = lowHz > 0 ? f / lowHz - 1 : Infinity;
    marginFraction = -Math.min(fromLow, 1 - f / highHz);
  }
  // Avoid printing "-0 %" for a point exactly on an edge.
  const marginPercent = marginFraction === 0 ? 0 : marginFraction * 100;
  if (inside) return { verdict: 'inside-band', marginPercent };
  const met = marginFraction >= separationMargin - EDGE_RTOL * Math.max(1, separationMargin);
  return { verdict: met ? 'clear' : 'close', marginPercent };
}

/** 0 clear, 1 close, 2 inside band. */
export function severity(verdict: Verdict): number {
  return verdict === 'inside-band' ? 2 : verdict === 'close' ? 1 : 0;
}

/**
 * Order for "worst of": negative when `a` is worse than `b`. Worse = higher severity; at equal severity,
 * the smaller margin (null margin = the excitation cannot reach the mode = least severe); else equal (0),
 * so callers keep the first in mode order, then check order.
 */
export function compareSeverity(
  a: { verdict: Verdict; marginPercent: number | null },
  b: { verdict: Verdict; marginPercent: number | null },
): number {
  const s = severity(b.verdict) - severity(a.verdict);
  if (s !== 0) return s;
  const ma = a.marginPercent ?? Infinity;
  const mb = b.marginPercent ?? Infinity;
  return ma < mb ? -1 : ma > mb ? 1 : 0;
}

/** Index of the worst item (first of equals), or -1 for an empty list. */
export function worstIndex(items: readonly { verdict: Verdict; marginPercent: number | null }[]): number {
  let worst = -1;
  for (let i = 0; i < items.length; i++) {
    if (worst < 0 || compareSeverity(items[i], items[worst]) < 0) worst = i;
  }
  return worst;
}
