import type { RangeText } from '../../forms/ranges';
import { unitLabel } from '../../units';

interface Props {
  /** Element id prefix of the field this range belongs to. */
  id: string;
  label: string;
  unit: string;
  range: RangeText | undefined;
  /** Where the default range comes from. */
  source: string;
  error?: string;
  disabled?: boolean;
  onToggle: (on: boolean) => void;
  onInput: (end: 'low' | 'high', text: string) => void;
}

/**
 * The range under an uncertain field: a switch, then two small fields "low" and "high" in the same unit entry
 * as the value (decimal keypad on tablets, the unit beside them), the source of the default and any message.
 */
export function RangeRow({ id, label, unit, range, source, error, disabled, onToggle, onInput }: Props) {
  const on = !!range?.on;
  const u = unit ? unitLabel(unit) : '';
  const errId = `${id}-range-error`;
  return (
    <div class={`range-row${on ? ' on' : ''}${error ? ' has-error' : ''}`} data-range={id}>
      <label class="range-switch">
        <input type="checkbox" checked={on} disabled={disabled} onChange={(e) => onToggle((e.target as HTMLInputElement).checked)} />
        <span>Range</span>
      </label>
      {on && (
        <div class="range-ends">
          {(['low', 'high'] as const).map((end) => (
            <span class="range-end" key={end}>
              <label for={`${id}-${end}`}>{end}</label>
              <input
                id={`${id}-${end}`}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                spellcheck={false}
                value={range?.[end] ?? ''}
                disabled={disabled}
                aria-label={`${label}, ${end} end of the range${u ? ` (${u})` : ''}`}
                aria-describedby={error ? errId : undefined}
                aria-invalid={error ? true : undefined}
                onInput={(e) => onInput(end, (e.target as HTMLInputElement).value)}
              />
              {u && <span class="unit" aria-hidden="true">{u}</span>}
            </span>
          ))}
        </div>
      )}
      {on && <p class="field-help range-source">Default: {source}</p>}
      {on && error && (
        <p class="field-error" id={errId}>
          <span aria-hidden="true">✖ </span>
          {error}
        </p>
      )}
    </div>
  );
}
