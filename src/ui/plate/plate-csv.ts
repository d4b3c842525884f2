/** CSV rows of a plate panel's results: frequencies with their error estimates, sloshing, resonance checks. */
import type { PlateSolved } from '../../app/solve-case';
import { VERDICT_WORDS } from '../../physics/excitation/verdict';
import type { CsvRow } from '../cases/results-csv';

export function plateCsvRows(a: PlateSolved, num: (x: number | null | undefined) => number | null): CsvRow[] {
  const r = a.plate;
  const rows: CsvRow[] = [['Mode', 'Dry frequency (Hz)', 'Wet frequency (Hz)', 'Wet/dry ratio', 'Error estimate dry (%)', 'Error estimate wet (%)']];
  r.dry.frequenciesHz.forEach((fDry, i) => {
    rows.push([
      i + 1,
      num(fDry),
      num(r.wet?.frequenciesHz[i]),
      num(r.wet ? r.wetToDryRatio[i] : null),
      num(r.errorEstimate.dryRelative[i] * 100),
      num(r.wet ? r.errorEstimate.wetRelative[i] * 100 : null),
    ]);
  });
  if (!r.wet) rows.push(['Wet frequencies not computed', 'no liquid']);
  for (const s of r.sloshing ?? []) rows.push(['Sloshing frequency (Hz)', num(s.frequencyHz), s.description]);
  rows.push([]);
  const s = a.screening;
  if (s) {
    rows.push(['Resonance verdict', VERDICT_WORDS[s.verdict]]);
    if (s.driver) {
      const c = s.modes[s.driver.modeIndex].checks[s.driver.checkIndex];
      rows.push(['Governed by', c.label, 'mode', s.driver.modeIndex + 1, 'margin (%)', num(c.marginPercent)]);
    }
    rows.push(['Mode', 'Excitation', 'Frequency compared', 'Frequency (Hz)', 'Verdict', 'Margin (%)', 'Source']);
    for (const m of s.modes) for (const c of m.checks) rows.push([m.modeIndex + 1, c.label, c.frequencyBasis, num(c.frequencyHz), VERDICT_WORDS[c.verdict], num(c.marginPercent), c.source]);
  } else {
    rows.push(['Resonance screening not run', a.screeningError ?? 'no machine and no sloshing to screen']);
  }
  for (const n of r.notes) rows.push(['Note', n]);
  return rows;
}
