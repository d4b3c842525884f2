/**
 * The plate's answer in a few sentences: the verdict with the mode and excitation that drive it, the lowest
 * dry and wet frequencies, and why there is no verdict when there is none. Wording only.
 */
import type { PlateSolved } from '../../app/solve-case';
import type { Verdict } from '../../physics/excitation/verdict';
import { VERDICT_WORDS } from '../../physics/excitation/verdict';
import { formatHz, formatSig } from '../format/numbers';
import { marginText, pct } from '../results/display-units';

export interface PlateSummary {
  verdict: Verdict | null;
  verdictLine: string | null;
  frequencyLine: string;
  notes: string[];
}

export function summarisePlate(a: PlateSolved): PlateSummary {
  const r = a.plate;
  const dry = r.dry.frequenciesHz[0];
  const wet = r.wet?.frequenciesHz[0];
  const frequencyLine =
    wet === undefined
      ? `Lowest dry frequency ${formatHz(dry)}; no liquid, so no wet frequency.`
      : `Lowest dry frequency ${formatHz(dry)}; lowest wet frequency ${formatHz(wet)} (wet/dry ${formatSig(r.wetToDryRatio[0], 3)}).`;
  const notes: string[] = [];
  const s = a.screening;
  if (!s) {
    notes.push(
      a.screeningError
        ? `Resonance screening could not run: ${a.screeningError}. The frequencies are still good.`
        : 'Frequencies only: no machine entered and no sloshing to screen. Enter a nearby machine on the Member screen to get a verdict.',
    );
    return { verdict: null, verdictLine: null, frequencyLine, notes };
  }
  const d = s.driver;
  const check = d ? s.modes[d.modeIndex].checks[d.checkIndex] : null;
  if (!d || !check) return { verdict: s.verdict, verdictLine: null, frequencyLine, notes: ['Nothing was screened: no mode had a check.'] };
  const how =
    check.verdict === 'inside-band'
      ? 'inside the band'
      : `margin ${marginText(check.marginPercent)} outside the band (±${pct(s.separationMargin.value)} required)`;
  const verdictLine = `Mode ${d.modeIndex + 1} against ${check.label} (${check.frequencyBasis} ${formatHz(check.frequencyHz)}): ${VERDICT_WORDS[check.verdict]}, ${how}.`;
  return { verdict: s.verdict, verdictLine, frequencyLine, notes };
}
