import type { FieldDef, UnitSystem } from '../../forms';
import { unitLabel } from '../../units';

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
 * One form field: label, input with its unit beside it, help, and the message when what was typed does not
 * read. Quantities use the decimal keypad on tablets; lists and choices their own controls.
 */
export function FieldInput({ field, value, system, error, placeholder, onInput, idPrefix }: Props) {
  const id = `${idPrefix}-${field.key}`;
  const helpId = field.help ? `${id}-help` : undefined;
  const errId = error ? `${id}-error` : undefined;
  const describedBy = [errId, helpId].filter(Boolean).join(' ') || undefined;
  return (
    <div class={`field${error ? ' has-error' : ''}`} data-field={field.key}>
      <label for={id}>{field.label}</label>
      <div class="field-control">
        {field.type === 'choice' ? (
          <select id={id} value={value} aria-describedby={describedBy} aria-invalid={error ? true : undefined} onChange={(e) => onInput((e.target as HTMLSelectElement).value)}>
            {field.choices.map((c) => (
              <option key={c.value} value={c.value}>{c.label}</option>
            ))}
          </select>
        ) : (
          <>
            <input
              id={id}
              type="text"
              inputMode={field.type === 'quantity' ? 'decimal' : 'text'}
              autoComplete="off"
              spellcheck={false}
              value={value}
              placeholder={placeholder}
              aria-describedby={describedBy}
              aria-invalid={error ? true : undefined}
              onInput={(e) => onInput((e.target as HTMLInputElement).value)}
            />
            {field.units[system] && <span class="unit" aria-hidden="true">{unitLabel(field.units[system])}</span>}
          </>
        )}
      </div>
      {error && (
        <p class="field-error" id={errId}>
          <span aria-hidden="true">✖ </span>
          {error}
        </p>
      )}
      {field.help && <p class="field-help" id={helpId}>{field.help}</p>}
    </div>
  );
}
