import type { FieldDef, UnitSystem } from '../../forms';
import { unitLabel } from '../../units';
import { describedBy, FieldShell } from '../controls/FieldShell';
import { TextField } from '../controls/TextField';
import { QuantityInput } from './QuantityInput';

interface Props {
  field: FieldDef;
  value: string;
  system: UnitSystem;
  error?: string;
  placeholder?: string;
  onInput: (text: string) => void;
  /** Prefix for element ids, so two forms on one page do not clash. */
  idPrefix: string;
}

/**
 * One form field of a guided form: quantities with their unit beside them and the decimal keypad on tablets,
 * lists as plain text, choices as a select.
 */
export function FieldInput({ field, value, system, error, placeholder, onInput, idPrefix }: Props) {
  const id = `${idPrefix}-${field.key}`;
  const shell = { id, label: field.label, error, help: field.help, fieldKey: field.key };
  if (field.type === 'quantity') {
    return <QuantityInput field={field} value={value} system={system} error={error} placeholder={placeholder} onInput={onInput} id={id} />;
  }
  if (field.type !== 'choice') {
    const unit = field.units[system];
    return (
      <TextField {...shell} value={value} unit={unit ? unitLabel(unit) : undefined} placeholder={placeholder} mode="text" onInput={onInput} />
    );
  }
  return (
    <FieldShell {...shell}>
      <select id={id} value={value} aria-describedby={describedBy(id, error, field.help)} aria-invalid={error ? true : undefined} onChange={(e) => onInput((e.target as HTMLSelectElement).value)}>
        {field.choices.map((c) => (
          <option key={c.value} value={c.value}>{c.label}</option>
        ))}
      </select>
    </FieldShell>
  );
}
