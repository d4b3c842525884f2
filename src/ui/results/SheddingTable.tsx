import { type DisplayUnits, unitText } from './display-units';
import type { SheddingRow } from './check-rows';
import { ScrollTable } from './ScrollTable';

/** Vortex shedding per mode, at the point where the mode moves most under the liquid. */
export function SheddingTable({ rows, units }: { rows: readonly SheddingRow[]; units: DisplayUnits }) {
  return (
    <ScrollTable caption="Vortex shedding per mode, where the mode moves most under the liquid" class="shedding-table">
      <thead>
        <tr>
          <th scope="col">Mode</th>
          <th scope="col">At z ({unitText(units.length)})</th>
          <th scope="col">U</th>
          <th scope="col">D</th>
          <th scope="col">Re</th>
          <th scope="col">St (band), regime</th>
          <th scope="col">f_s</th>
          <th scope="col">V_R</th>
          <th scope="col">K_S</th>
          <th scope="col">m_e</th>
          <th scope="col">St source</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) =>
          r.cells ? (
            <tr key={r.mode}>
              <th scope="row">{r.mode}</th>
              <td>{r.cells.at}</td>
              <td>{r.cells.speed}</td>
              <td>{r.cells.size}</td>
              <td>{r.cells.reynolds}</td>
              <td>{r.cells.strouhal}</td>
              <td>{r.cells.sheddingHz}</td>
              <td>{r.cells.reducedVelocity}</td>
              <td>{r.cells.stability}</td>
              <td>{r.cells.effectiveMass}</td>
              <td>[{r.source}]</td>
            </tr>
          ) : (
            <tr key={r.mode}>
              <th scope="row">{r.mode}</th>
              <td colSpan={10}>{r.why}</td>
            </tr>
          ),
        )}
      </tbody>
    </ScrollTable>
  );
}
