import { useState } from 'preact/hooks';
import type { QuantityField, UnitSystem } from '../../forms';
import { fieldUnit } from '../../forms';
import { echoQuantity, parseQuantity, unitLabel, unitTypedIn } from '../../units';
import { TextField } from '../controls/TextField';
import { UnitChip } from '../controls/UnitChip';
import { unitInText, unitOptions, withPickedUnit } from '../controls/unit-chip';

interface Props {
  field: QuantityField;
  value: string;
  system: UnitSystem;
  error?: string;
  placeholder?: string;
  onInput: (text: string) => void;
  id: string;
}

/** The value understood, echoed under the field (src/units/echo.ts), or '' while it does not read or the unit reader loads. */
function echoOf(field: QuantityField, text: string, system: UnitSystem, typedUnit: string): string {
  if (text.trim() === '') return '';
  try {
    const r = parseQuantity(text, { dimension: field.dimension, unit: fieldUnit(field, system) });
    return r.ok ? echoQuantity(r.valueSI, field.dimension, typedUnit, field.units) : '';
  } catch {
    return ''; // the unit reader is loading: the echo comes with the next reading
  }
}

/**
 * A quantity field on the numeric keypad with a unit chip beside it: digits typed, unit picked, so no letters
 * are needed; text with units typed in full still reads. A unit picked on an empty field is put after the number
 * when the field is left. The understood value is echoed under the field.
 */
export function QuantityInput({ field, value, system, error, placeholder, onInput, id }: Props) {
  const [pending, setPending] = useState<string | null>(null);
  const options = unitOptions(field.dimension);
  const shown = fieldUnit(field, system);
  const shownText = shown === 'knot' ? 'kt' : shown;
  // A count or a plain ratio shown without a unit has nothing to pick: no chip (an empty one reads as broken).
  const chip = shownText !== '' && options.length > 1 && options.some((o) => o.text === shownText);
  const inText = unitInText(value, options);
  const current = inText?.unit ?? pending ?? shownText;
  const pick = (unit: string) => {
    const next = withPickedUnit(value, unit, options);
    if (next !== null) {
      setPending(null);
      onInput(next);
    } else if (value.trim() === '') setPending(unit);
  };
  const blur = () => {
    if (pending && inText && inText.unit === null) {
      onInput(`${inText.number} ${pending}`);
      setPending(null);
    }
  };
  const typed = inText ? current : unitTypedIn(value, shownText);
  const echo = echoOf(field, value, system, typed === 'kt' ? 'knot' : typed);
  return (
    <TextField
      id={id}
      label={field.label}
      error={error}
      help={field.help}
      fieldKey={field.key}
      value={value}
      unit={shown ? unitLabel(shown) : undefined}
      placeholder={placeholder}
      mode="decimal"
      onInput={onInput}
      onBlur={blur}
      unitSlot={chip ? <UnitChip id={`${id}-unit`} label={field.label} options={options} value={current} onPick={pick} /> : undefined}
      echo={echo ? <p class="echo" data-testid={`echo-${field.key}`}>{echo}</p> : undefined}
    />
  );
}
