import type { MemberResult } from '../../physics/beam/result';
import type { ScreeningResult } from '../../physics/excitation/results';
import { chartBands } from './chart-bands';
import { bandRows, chartModes, checkRows, limitRows, SourceList, sheddingRows } from './check-rows';
import { ChecksTable } from './ChecksTable';
import type { DisplayUnits } from './display-units';
import { FrequencyChart } from './FrequencyChart';
import { ScrollTable, SourceNotes } from './ScrollTable';
import { SheddingTable } from './SheddingTable';

interface Props {
  screening: ScreeningResult;
  member: MemberResult;
  units: DisplayUnits;
  /** The solver words its reasons in SI; say so when the case is in US units. */
  reasonsInSI: boolean;
}

/** Frequency chart with the bands as text beside it, every check, shedding per mode, limits and notes. */
export function ResonancePanel({ screening, member, units, reasonsInSI }: Props) {
  const bands = chartBands(screening);
  const sources = new SourceList();
  const checks = checkRows(screening, units, sources);
  const shedding = sheddingRows(screening, units, sources);
  const limits = limitRows(screening, units);
  const dryOnly = member.wet === null;
  return (
    <section class="results-block" aria-labelledby="resonance-title">
      <h2 id="resonance-title">Resonance</h2>
      <div class="chart-row">
        <figure class="chart-figure">
          <FrequencyChart
            modes={chartModes(member)}
            bands={bands}
            rowLabels={dryOnly ? { dry: '', wet: 'dry, no liquid' } : undefined}
          />
          <figcaption>
            Natural frequencies ({dryOnly ? 'dry only' : 'dry dashed, wet solid'}) against the excitation bands, log scale. The
            tables give the same numbers.
          </figcaption>
        </figure>
        <ScrollTable caption="Excitation bands as drawn (all modes)" class="bands-table">
          <thead>
            <tr>
              <th scope="col">Excitation</th>
              <th scope="col">Band</th>
            </tr>
          </thead>
          <tbody>
            {bands.length === 0 && (
              <tr>
                <td colSpan={2}>None: no excitation band to draw (for example no flow, no waves, no machine).</td>
              </tr>
            )}
            {bandRows(bands).map((b) => (
              <tr key={b.label}>
                <th scope="row">{b.label}</th>
                <td>{b.band}</td>
              </tr>
            ))}
          </tbody>
        </ScrollTable>
      </div>
      <ChecksTable rows={checks} reasonsInSI={reasonsInSI} />
      <h3>Vortex shedding per mode</h3>
      <SheddingTable rows={shedding} units={units} />
      <p class="table-note">
        U: flow speed used; D: size across the flow, growth and coating included; Re = U D / ν; f_s = St U / D; V_R = U / (f_n D);
        K_S = 4π m_e ζ / (ρ D²), with m_e the mode-weighted mass per length (structure, contents, coating and added mass).
      </p>
      <SourceNotes items={sources.items} label="Sources of the checks and Strouhal numbers" />
      <h3>Limits used</h3>
      <ScrollTable caption="Screening limits, damping and liquid, each with its source" class="limits-table">
        <thead>
          <tr>
            <th scope="col">Item</th>
            <th scope="col">Value</th>
            <th scope="col">Source</th>
          </tr>
        </thead>
        <tbody>
          {limits.map((l) => (
            <tr key={l.name}>
              <th scope="row">{l.name}</th>
              <td>{l.value}</td>
              <td class="reason">
                <span>{l.source}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      {screening.notes.length > 0 && (
        <ul class="plain-list screening-notes">
          {screening.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
