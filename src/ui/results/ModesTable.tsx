import type { MemberResult } from '../../physics/beam/result';
import { modeCells, modeRows } from './mode-rows';
import { ScrollTable } from './ScrollTable';

/** Modes 1…N: dry and wet frequency, wet/dry ratio, period, share of kinetic energy in the liquid. */
export function ModesTable({ member }: { member: MemberResult }) {
  const rows = modeRows(member).map(modeCells);
  const wet = member.wet !== null;
  return (
    <section class="results-block" aria-labelledby="modes-title">
      <h2 id="modes-title">Natural frequencies</h2>
      <ScrollTable caption={`Modes 1 to ${rows.length}: dry and wet natural frequencies`} class="modes-table">
        <thead>
          <tr>
            <th scope="col">Mode</th>
            <th scope="col">Dry frequency</th>
            <th scope="col">Wet frequency</th>
            <th scope="col">Wet / dry</th>
            <th scope="col">{wet ? 'Wet period' : 'Dry period'}</th>
            <th scope="col">Kinetic energy in the liquid</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.mode}>
              <th scope="row">{r.mode}</th>
              <td>{r.dry}</td>
              <td>{r.wet}</td>
              <td>{r.ratio}</td>
              <td>{r.period}</td>
              <td>{r.liquidShare}</td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      {!wet && member.wetOmittedBecause && <p class="table-note">No wet frequencies: {member.wetOmittedBecause}.</p>}
    </section>
  );
}
