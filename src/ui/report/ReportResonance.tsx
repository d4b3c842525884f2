import type { MemberResult } from '../../physics/beam/result';
import type { ScreeningResult } from '../../physics/excitation/results';
import { chartBands } from '../results/chart-bands';
import { chartModes, checkRows, governingRows, limitRows, SourceList } from '../results/check-rows';
import { ChecksTable } from '../results/ChecksTable';
import type { DisplayUnits } from '../results/display-units';
import { FrequencyChart } from '../results/FrequencyChart';
import { SourceNotes } from '../results/ScrollTable';

interface Props {
  screening: ScreeningResult;
  member: MemberResult;
  units: DisplayUnits;
  reasonsInSI: boolean;
}

/**
 * Resonance in the printed record: the chart and, for each excitation, the governing check (worst verdict over
 * the modes, smallest margin among equals). Every mode's row stays on the Results screen.
 */
export function ReportResonance({ screening, member, units, reasonsInSI }: Props) {
  const sources = new SourceList();
  const rows = governingRows(checkRows(screening, units, sources));
  const used = new SourceList();
  const renumbered = rows.map((r) => ({ ...r, source: used.number(sources.items[r.source - 1]) }));
  const limits = limitRows(screening, units);
  return (
    <section class="report-section" aria-labelledby="report-resonance-title">
      <h2 id="report-resonance-title">Resonance</h2>
      <figure class="report-chart">
        <FrequencyChart modes={chartModes(member)} bands={chartBands(screening)} widthPx={640} rowLabels={member.wet === null ? { dry: '', wet: 'dry, no liquid' } : undefined} />
        <figcaption>Natural frequencies ({member.wet === null ? 'dry only' : 'dry dashed, wet solid'}) against the excitation bands, log scale.</figcaption>
      </figure>
      <ChecksTable rows={renumbered} reasonsInSI={reasonsInSI} caption="Governing check of each excitation (all modes on the Results screen)" shortNote />
      <SourceNotes items={used.items} label="Sources of the checks" />
      <p class="table-note">
        Limits used: {limits.map((l) => `${l.name} ${l.value} (${l.source})`).join('; ')}.
      </p>
    </section>
  );
}
