/**
 * The band in words, for the app, the report and the command line: where a verdict would change, worded with
 * the field's label and the user's units ("clear unless fixity depth below mudline is above 5.2 m (then
 * close)"), never the input's internal name.
 */
import type { FormRange } from '../forms/ranges';
import { VERDICT_WORDS, type Verdict } from '../physics/excitation/verdict';
import type { BandVerdict, CheckOverBand, VerdictSwitch } from '../physics/uncertain';
import { formatQuantity } from '../units';

function lower(label: string): string {
  return label.charAt(0).toLowerCase() + label.slice(1);
}

/** "clear unless top mass is above 14.2 t (then close)". */
export function switchWords(likely: Verdict, sw: VerdictSwitch, ranges: readonly FormRange[]): string {
  const r = ranges.find((x) => x.key === sw.path);
  const name = r ? lower(r.label) : sw.path;
  const value = r ? formatQuantity(sw.value, r.unit) : String(Number(sw.value.toPrecision(4)));
  return `${VERDICT_WORDS[likely]} unless ${name} is ${sw.side} ${value} (then ${VERDICT_WORDS[sw.becomes]})`;
}

/** Every switch of the checks whose band verdict differs from the likely one, worst check first, without repeats. */
export function switchLines(verdict: BandVerdict, ranges: readonly FormRange[]): string[] {
  const order = verdict.checks.slice().sort((a, b) => (a === verdict.checks[verdict.driverIndex] ? -1 : b === verdict.checks[verdict.driverIndex] ? 1 : 0));
  const lines: string[] = [];
  for (const c of order) for (const sw of c.switches) {
    const line = switchWords(c.likely.verdict, sw, ranges);
    if (!lines.includes(line)) lines.push(line);
  }
  return lines;
}

/** The check that decides the band verdict, or null. */
export function drivingCheck(verdict: BandVerdict): CheckOverBand | null {
  return verdict.driverIndex >= 0 ? verdict.checks[verdict.driverIndex] : null;
}

/** "likely clear; over the ranges inside band". */
export function bandVerdictLine(verdict: BandVerdict): string {
  return `at the likely values ${VERDICT_WORDS[verdict.likelyVerdict]}; over the ranges ${VERDICT_WORDS[verdict.bandVerdict]}`;
}

/** "Fixity depth below mudline 2.67 m to 6.1 m (likely 4.57 m)". */
export function rangeLine(r: FormRange): string {
  return `${r.label} ${formatQuantity(r.low, r.unit)} to ${formatQuantity(r.high, r.unit)} (likely ${formatQuantity(r.likely, r.unit)})`;
}
