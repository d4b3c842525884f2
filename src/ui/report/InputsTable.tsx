import { ScrollTable } from '../results/ScrollTable';
import type { InputRow } from './report-inputs';

/** Inputs as typed, their SI values, and whether each was entered or left at its default. */
export function InputsTable({ caption, rows }: { caption: string; rows: readonly InputRow[] }) {
  return (
    <ScrollTable caption={caption} class="inputs-table">
      <thead>
        <tr>
          <th scope="col">Input</th>
          <th scope="col">As entered</th>
          <th scope="col">SI value</th>
          <th scope="col">Basis</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} class={r.isDefault ? 'input-default' : undefined}>
            <th scope="row">{r.label}</th>
            <td>{r.value}</td>
            <td>{r.si}</td>
            <td>{r.isDefault ? 'default' : 'entered'}</td>
          </tr>
        ))}
      </tbody>
    </ScrollTable>
  );
}
