/**
 * Pins the unit of bare numbers before the unit system changes: `610` typed in the SI system (millimetres)
 * becomes `610 mm`, so it keeps its meaning when bare numbers start to mean inches. The digits are never
 * rewritten, and text that already names a unit is left as typed; the SI/US choice then changes only the units
 * results are shown in and what a new bare number means.
 */
import { fieldUnit } from './read';
import type { FieldDef, FieldValues } from './types';
import type { UnitSystem } from '../units';

const NUMBER = String.raw`[+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-]?\d+)?`;
const BARE = new RegExp(String.raw`^\s*${NUMBER}\s*$`);
const LIST_SEPARATOR = /(\s*[,;]\s*)/;

/** `text` with `unit` after each bare number in it (a list's entries one by one); other text unchanged. */
export function pinUnit(text: string, unit: string, list: boolean): string {
  if (unit === '' || text.trim() === '') return text;
  if (!list) return BARE.test(text) ? `${text.trim()} ${unit}` : text;
  // Entries separated by commas or semicolons: only lists whose every entry is a bare number (a decimal comma
  // list such as "1,5" is ambiguous and is left as typed).
  const parts = text.trim().split(LIST_SEPARATOR);
  const entries = parts.filter((_, i) => i % 2 === 0);
  if (!entries.every((e) => BARE.test(e))) return text;
  return parts.map((p, i) => (i % 2 === 0 ? `${p} ${unit}` : p)).join('');
}

/** The values with the unit of `system` pinned to every bare number (see the file comment). */
export function pinFieldUnits(fields: readonly FieldDef[], values: FieldValues, system: UnitSystem): FieldValues {
  const out: FieldValues = { ...values };
  for (const f of fields) {
    const text = values[f.key];
    if (f.type === 'choice' || text === undefined) continue;
    out[f.key] = pinUnit(text, fieldUnit(f, system), f.type === 'quantity-list');
  }
  return out;
}
