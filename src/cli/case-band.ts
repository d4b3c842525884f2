/**
 * The band of `wetmode case` for the ranges entered in the app: the same `bandCase` the app's worker runs,
 * printed mode by mode (SI), with the ranged fields by name and label, what drives the band, and the verdict
 * over the band with the places where it would change, worded as in the app.
 */
import { type BandCase, bandCase } from '../app/band-case';
import { switchLines } from '../app/band-words';
import { VERDICT_WORDS } from '../physics/excitation/verdict';
import { state } from './band-output';

/** Null when no range is on; throws (exit 1) when a range does not read, naming the field. */
export function caseBandJson(c: BandCase): unknown {
  if (!Object.values(c.ranges ?? {}).some((r) => r.on)) return null;
  const a = bandCase(c, () => 0);
  if (!a.ok) {
    if (Object.keys(a.errors).length > 0) throw new Error(`the case's ranges do not read: ${Object.entries(a.errors).map(([k, m]) => `${k}: ${m}`).join('; ')}`);
    return { ok: false, message: a.message };
  }
  if (!a.band) return null;
  const b = a.band;
  const label = (key: string) => a.ranges.find((r) => r.key === key)?.label ?? key;
  return {
    ok: true,
    ranges: a.ranges.map((r) => ({ field: r.key, label: r.label, low: r.low, likely: r.likely, high: r.high })),
    dry: state(b.dry),
    wet: b.wet ? state(b.wet) : null,
    method: b.methodText,
    sensitivity: b.sensitivity.map(({ path, ...s }) => ({ field: path, label: label(path), ...s })),
    solves: b.solves,
    notes: b.notes,
    resonance: a.verdict
      ? {
          likelyVerdict: a.verdict.likelyVerdict,
          bandVerdict: a.verdict.bandVerdict,
          changes: switchLines(a.verdict, a.ranges),
          checks: a.verdict.checks.map((k) => ({
            mode: k.modeIndex + 1,
            excitation: k.label,
            basis: k.frequencyBasis,
            likely: VERDICT_WORDS[k.likely.verdict],
            overBand: VERDICT_WORDS[k.band.verdict],
            frequencyRangeHz: k.frequencyRangeHz,
          })),
        }
      : null,
    resonanceNotRunBecause: a.verdict ? null : a.verdictError,
  };
}
