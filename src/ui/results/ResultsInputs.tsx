import type { Case } from '../../case';
import { kindOf } from '../../kinds/registry';
import { InputsTable } from '../report/InputsTable';
import { inputRows } from '../report/report-inputs';

/** The inputs behind these results, as entered with their SI values, each marked entered or default (folded). */
export function ResultsInputs({ doc }: { doc: Case }) {
  const kind = kindOf(doc.kind);
  const rows = inputRows(kind.form.fields, doc.inputs, doc.unitSystem, kind.form.defaults(doc.unitSystem));
  const defaults = rows.filter((r) => r.isDefault).length;
  return (
    <details class="panel results-inputs" data-testid="results-inputs">
      <summary>
        Inputs: {rows.length - defaults} entered, {defaults} left at default
      </summary>
      <InputsTable caption="Member inputs, entered or default" rows={rows} />
    </details>
  );
}
