import { ScrollTable } from '../results/ScrollTable';
import type { InputRow } from './report-inputs';

/** Inputs as typed, with labels and units. */
export function InputsTable({ caption, rows }: { caption: string; rows: readonly InputRow[] }) {
  return (
    <ScrollTable caption={caption} class="inputs-table">
      <thead>
        <tr>
          <th scope="col">Input</th>
          <th scope="col">Value as entered</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key}>
            <th scope="row">{r.label}</th>
            <td>{r.value}</td>
          </tr>
        ))}
      </tbody>
    </ScrollTable>
  );
}
