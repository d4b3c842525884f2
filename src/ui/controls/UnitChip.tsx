import type { UnitOption } from './unit-chip';

interface Props {
  id: string;
  label: string;
  options: readonly UnitOption[];
  /** The option shown as chosen (its `text`). */
  value: string;
  onPick: (unitText: string) => void;
  disabled?: boolean;
}

/** A tap-sized unit picker beside a field (a native select: the tablet shows its own list to choose from). */
export function UnitChip({ id, label, options, value, onPick, disabled }: Props) {
  return (
    <select id={id} class="unit-chip" aria-label={`Unit of ${label}`} value={value} disabled={disabled} onChange={(e) => onPick((e.target as HTMLSelectElement).value)}>
      {options.map((o) => (
        <option key={o.text} value={o.text}>{o.label}</option>
      ))}
    </select>
  );
}
