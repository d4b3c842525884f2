import type { ComponentChildren } from 'preact';
import { describedBy, FieldShell, type ShellProps } from './FieldShell';

interface Props extends ShellProps {
  value: string;
  /** Unit a bare number takes, shown beside the field ("mm", "°"). */
  unit?: string;
  placeholder?: string;
  /** 'decimal' brings up the number keypad on tablets; 'text' for lists. */
  mode?: 'decimal' | 'text';
  onInput: (text: string) => void;
  onBlur?: () => void;
  /** In place of the plain unit label: a unit chip to pick the unit from. */
  unitSlot?: ComponentChildren;
  /** Under the field: the value understood ("= 0.772 m/s"). */
  echo?: ComponentChildren;
}

/** A text field with its unit beside it. */
export function TextField({ value, unit, placeholder, mode = 'decimal', onInput, onBlur, unitSlot, echo, ...shell }: Props) {
  return (
    <FieldShell {...shell} under={echo}>
      <input
        id={shell.id}
        type="text"
        inputMode={mode}
        autoComplete="off"
        spellcheck={false}
        value={value}
        placeholder={placeholder}
        aria-describedby={describedBy(shell.id, shell.error, shell.help)}
        aria-invalid={shell.error ? true : undefined}
        onInput={(e) => onInput((e.target as HTMLInputElement).value)}
        onBlur={onBlur}
      />
      {unitSlot ?? (unit && <span class="unit" aria-hidden="true">{unit}</span>)}
    </FieldShell>
  );
}
