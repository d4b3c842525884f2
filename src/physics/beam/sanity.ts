/**
 * Last check before a member result is called ok. Added mass only adds kinetic energy, so by the
 * Rayleigh quotient (classical) every wet frequency is at most its dry one; a wet frequency above the dry
 * one, or any frequency or ratio that is not a finite number, means the numbers lost precision
 * (extreme inputs) and must not be shown as an answer.
 */
import type { MemberResult } from './result';

/** Relative slack for rounding when wet and dry agree (no liquid on the mode's span). */
const WET_SLACK = 1e-6;

/** Null when the result is plausible, else a message naming the first problem found. */
export function resultSanity(r: MemberResult): string | null {
  const check = (label: string, f: readonly number[]): string | null => {
    for (let i = 0; i < f.length; i++) {
      if (!Number.isFinite(f[i]) || f[i] < 0) return `${label} frequency of mode ${i + 1} is ${f[i]}, not a finite number ≥ 0: the inputs are too extreme for double precision`;
    }
    return null;
  };
  const dry = check('dry', r.dry.frequenciesHz);
  if (dry) return dry;
  if (!r.wet) return null;
  const wet = check('wet', r.wet.frequenciesHz);
  if (wet) return wet;
  for (let i = 0; i < r.wet.frequenciesHz.length; i++) {
    const fw = r.wet.frequenciesHz[i];
    const fd = r.dry.frequenciesHz[i];
    if (fw > fd * (1 + WET_SLACK)) {
      return (
        `wet frequency of mode ${i + 1} (${fw.toPrecision(6)} Hz) is above its dry one (${fd.toPrecision(6)} Hz), which added mass cannot do: ` +
        'the solution lost precision; check the inputs for extreme values'
      );
    }
    const ratio = r.wetToDryRatio?.[i];
    if (ratio === undefined || !Number.isFinite(ratio)) return `wet/dry frequency ratio of mode ${i + 1} is not a finite number (dry frequency ${fd} Hz)`;
  }
  return null;
}
