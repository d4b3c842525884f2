/**
 * The unit chip beside a quantity field: the units one can pick for the field's dimension, the unit the text
 * names now, and the text after a pick. With it a value can be entered on a numeric keypad alone: type the
 * digits, tap the chip, choose the unit. Free text with units still works; the chip then shows the unit typed.
 */
import { DIMENSIONS, unitLabel, type Dimension } from '../../units';

export interface UnitOption {
  /** As written into the text (read by the unit reader): 'mm', 'kt'. */
  text: string;
  /** As shown on the chip: 'mm', 'kn'. */
  label: string;
}

/** The units offered for a dimension: both systems' display units, and the knot for speeds (as written `kt`). */
export function unitOptions(dimension: Dimension): UnitOption[] {
  const { si, us } = DIMENSIONS[dimension].units;
  const ids = [...new Set([...si, ...us, ...(dimension === 'speed' ? ['knot'] : [])])];
  return ids.map((id) => ({ text: id === 'knot' ? 'kt' : id, label: unitLabel(id) }));
}

const NUMBERS = String.raw`[+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-]?\d+)?`;
/** A number and an optional unit word after it: "24", "24 in", "1.5kt". */
const NUMBER_UNIT = new RegExp(String.raw`^\s*(${NUMBERS})\s*([A-Za-z][A-Za-z^0-9/ ]*|"|')?\s*$`);

const ALIASES: Readonly<Record<string, string>> = { kts: 'kt', knot: 'kt', knots: 'kt', kn: 'kt', '"': 'in', "'": 'ft' };

/**
 * The option the text names ("24 in" → in, "1.5 kts" → kt), else `fallback` (the unit a bare number takes).
 * Null when the text is anything else (a sum, a list): the chip then shows the fallback and a pick does nothing.
 */
export function unitInText(text: string, options: readonly UnitOption[]): { number: string; unit: string | null } | null {
  const m = NUMBER_UNIT.exec(text);
  if (!m) return null;
  const typed = (m[2] ?? '').trim();
  if (typed === '') return { number: m[1], unit: null };
  const t = ALIASES[typed] ?? typed;
  const hit = options.find((o) => o.text === t || o.text.replace(/\s+/g, '') === t.replace(/\s+/g, ''));
  return hit ? { number: m[1], unit: hit.text } : null;
}

/** The text after picking `unit`: the number kept, the unit put or replaced; null when the text has no one number. */
export function withPickedUnit(text: string, unit: string, options: readonly UnitOption[]): string | null {
  const now = unitInText(text, options);
  return now ? `${now.number} ${unit}` : null;
}
