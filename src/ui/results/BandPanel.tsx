import { rangeLine } from '../../app/band-words';
import type { FormRange } from '../../forms/ranges';
import type { BandResult } from '../../physics/uncertain';
import type { BandState } from '../state/band-model';
import { bandRows, sensitivityRows } from './band-rows';
import { BandVerdictBlock } from './BandVerdictBlock';
import { ScrollTable } from './ScrollTable';
import { SensitivityChart } from './SensitivityChart';

/** The band's status line: working, failed, or out of date. */
export function BandStatus({ state, current }: { state: BandState; current: boolean }) {
  if (state.status === 'working') {
    return (
      <p class="band-status" data-testid="band-working" role="status">
        <span aria-hidden="true">⟳ </span>Working out the band…
      </p>
    );
  }
  if (state.status === 'failed') {
    const a = state.answer;
    return <p class="field-error" data-testid="band-failure">No band: {state.message ?? (a && !a.ok ? a.message : 'it could not be worked out')}</p>;
  }
  if (state.status === 'done' && !current) return <p class="band-status">Out of date: the band follows shortly.</p>;
  return null;
}

/**
 * Results: the frequency band over the ranges entered on the Member screen, mode by mode, dry and wet; the
 * method used; what drives it (chart and table); and the resonance verdict over the band.
 */
export function BandPanel({ state, current }: { state: BandState; current: boolean }) {
  if (state.status === 'none') return null;
  const a = state.answer;
  const band = a && a.ok && a.band ? a : null;
  return (
    <section class={`results-block band-panel${current ? '' : ' stale'}`} aria-labelledby="band-title" data-testid="band-panel">
      <h2 id="band-title">Over the ranges</h2>
      <BandStatus state={state} current={current} />
      {band && band.band && (
        <>
          <ul class="band-ranges">
            {band.ranges.map((r) => (
              <li key={r.key}>{rangeLine(r)}</li>
            ))}
          </ul>
          {band.verdict ? <BandVerdictBlock verdict={band.verdict} ranges={band.ranges} /> : band.verdictError && <p class="table-note">No verdict over the band: {band.verdictError}</p>}
          <ScrollTable caption="Frequency band: likely value and lowest to highest over the ranges, mode by mode" class="band-table">
            <thead>
              <tr>
                <th scope="col">Mode</th>
                <th scope="col">Dry, likely</th>
                <th scope="col">Dry, over the ranges</th>
                <th scope="col">Wet, likely</th>
                <th scope="col">Wet, over the ranges</th>
                <th scope="col">Method</th>
              </tr>
            </thead>
            <tbody>
              {bandRows(band.band).map((r) => (
                <tr key={r.mode}>
                  <th scope="row">{r.mode}</th>
                  <td>{r.dryLikely}</td>
                  <td data-testid={`band-dry-${r.mode}`}>{r.dryRange}</td>
                  <td>{r.wetLikely}</td>
                  <td data-testid={`band-wet-${r.mode}`}>{r.wetRange}</td>
                  <td>{r.method}</td>
                </tr>
              ))}
            </tbody>
          </ScrollTable>
          <p class="table-note" data-testid="band-method">Method: {band.band.methodText}. {band.band.notes.join(' ')}</p>
          <SensitivityBlock answer={band} />
        </>
      )}
    </section>
  );
}

/** What drives the band: the chart and its text twin. */
export function SensitivityBlock({ answer }: { answer: { band: BandResult; ranges: readonly FormRange[] } }) {
  const rows = sensitivityRows(answer.band.sensitivity, answer.ranges);
  const basis = answer.band.sensitivity[0]?.basis ?? 'wet';
  return (
    <div class="band-sensitivity" data-testid="band-sensitivity">
      <h3>What drives it</h3>
      <p class="table-note">Lowest {basis} frequency with one input at the low (□) and high (■) end of its range and the others at their likely values; the line is the likely answer. Largest first: measure the top one on site.</p>
      <SensitivityChart rows={rows} basis={basis} />
      <ScrollTable caption={`Lowest ${basis} frequency at each end of each range, the others at their likely values`} class="sens-table">
        <thead>
          <tr>
            <th scope="col">Input</th>
            <th scope="col">Range</th>
            <th scope="col">At the low end</th>
            <th scope="col">At the high end</th>
            <th scope="col">Swing</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} data-key={r.key}>
              <th scope="row">{r.label}</th>
              <td>{r.range}</td>
              <td>{r.atLow}</td>
              <td>{r.atHigh}</td>
              <td>{r.swing}</td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
    </div>
  );
}
