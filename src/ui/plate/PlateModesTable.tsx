import type { PlateResult } from '../../physics/plate';
import { ScrollTable } from '../results/ScrollTable';
import { plateModeRows } from './plate-rows';

/** Modes 1…N of the plate: dry and wet frequency, wet/dry ratio and the error estimate of each. */
export function PlateModesTable({ result }: { result: PlateResult }) {
  const rows = plateModeRows(result);
  return (
    <section class="results-block" aria-labelledby="modes-title">
      <h2 id="modes-title">Natural frequencies</h2>
      <ScrollTable caption={`Modes 1 to ${rows.length}: dry and wet natural frequencies of the plate`} class="modes-table">
        <thead>
          <tr>
            <th scope="col">Mode</th>
            <th scope="col">Dry frequency</th>
            <th scope="col">Wet frequency</th>
            <th scope="col">Wet / dry</th>
            <th scope="col">Error estimate, dry</th>
            <th scope="col">Error estimate, wet</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.mode}>
              <th scope="row">{r.mode}</th>
              <td>{r.dry}</td>
              <td>{r.wet}</td>
              <td>{r.ratio}</td>
              <td>{r.dryError}</td>
              <td>{r.wetError}</td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      <p class="table-note">
        Wet / dry: each wet mode against the dry mode it resembles most. Error estimate: change against a coarser solve ({result.errorEstimate.basis}).
        {!result.wet && ' No liquid: dry modes only.'}
      </p>
    </section>
  );
}
