interface Props {
  id: string;
  label: string;
  value: string;
  /** Unit a bare number takes, shown beside the field ("mm", "°"). */
  unit?: string;
  error?: string;
  help?: string;
  placeholder?: string;
  /** 'decimal' brings up the number keypad on tablets; 'text' for lists of points. */
  mode?: 'decimal' | 'text';
  wide?: boolean;
  onInput: (text: string) => void;
}

/**
 * One field of the Section editor: label, text input with its unit beside it, the message when the text does
 * not read (beside the field, linked for screen readers), and a help line.
 */
export function TextField({ id, label, value, unit, error, help, placeholder, mode = 'decimal', wide, onInput }: Props) {
  const errId = error ? `${id}-error` : undefined;
  const helpId = help ? `${id}-help` : undefined;
  const describedBy = [errId, helpId].filter(Boolean).join(' ') || undefined;
  return (
    <div class={`field${error ? ' has-error' : ''}${wide ? ' field-wide' : ''}`}>
      <label for={id}>{label}</label>
      <div class="field-control">
        <input
          id={id}
          type="text"
          inputMode={mode}
          autoComplete="off"
          spellcheck={false}
          value={value}
          placeholder={placeholder}
          aria-describedby={describedBy}
          aria-invalid={error ? true : undefined}
          onInput={(e) => onInput((e.target as HTMLInputElement).value)}
        />
        {unit && <span class="unit" aria-hidden="true">{unit}</span>}
      </div>
      {error && (
        <p class="field-error" id={errId}>
          <span aria-hidden="true">✖ </span>
          {error}
        </p>
      )}
      {help && <p class="field-help" id={helpId}>{help}</p>}
    </div>
  );
}
