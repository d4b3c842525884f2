import type { CheckRow } from './check-rows';
import { ScrollTable } from './ScrollTable';
import { VerdictBadge } from './VerdictBadge';

/** Every mode against every excitation: the text twin of the frequency chart. */
export function ChecksTable({
  rows,
  reasonsInSI,
  caption = 'Resonance checks, every mode against every excitation',
  shortNote = false,
}: {
  rows: readonly CheckRow[];
  reasonsInSI: boolean;
  caption?: string;
  /** One line instead of the full explanation of margin and critical speed (the printed record). */
  shortNote?: boolean;
}) {
  return (
    <>
      <ScrollTable caption={caption} class="checks-table">
        <thead>
          <tr>
            <th scope="col">Mode</th>
            <th scope="col">Excitation</th>
            <th scope="col">Frequency compared</th>
            <th scope="col">Verdict</th>
            <th scope="col">Margin</th>
            <th scope="col">Excitation band</th>
            <th scope="col">Critical speed</th>
            <th scope="col">Source</th>
            <th scope="col">Reason{reasonsInSI ? ' (SI units)' : ''}</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i} class={`check-row check-${r.verdict}`}>
              <th scope="row">{r.mode}</th>
              <td>{r.label}</td>
              <td>{r.compared}</td>
              <td><VerdictBadge verdict={r.verdict} /></td>
              <td class="num">{r.margin}</td>
              <td>{r.band}</td>
              <td>{r.critical}</td>
              <td>[{r.source}]</td>
              <td class="reason">
                <span>{r.reason}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </ScrollTable>
      {shortNote ? (
        <p class="table-note">Margin: distance to the nearest band edge, % of that edge (≤ 0 inside). Critical speed: flow speed at which the check begins.</p>
      ) : (
      <p class="table-note">
        Margin: distance from the mode frequency to the nearest edge of the excitation band, as a percentage of that edge;
        positive outside the band, zero or negative inside. Critical speed: the flow speed, where the mode moves most under the
        liquid, at which the check begins (for a machine, the shaft speed that would hit the mode exactly).
      </p>
      )}
    </>
  );
}
