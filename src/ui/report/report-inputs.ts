/**
 * The inputs of a case as typed, for the report: every field that is shown for these values (hidden
 * fields are not read), with its label and its value with units. A bare number takes the field's unit in
 * the case's unit system (as the forms read it); an empty field says what empty stands for, and a preset
 * field shows the value the chosen option supplies.
 */
import { choiceValue, fieldUnit, isShown, readFields } from '../../forms/read';
import type { FieldDef, FieldValues } from '../../forms/types';
import { DIMENSIONS, formatQuantity, unitLabel, type UnitSystem } from '../../units';

export interface InputRow {
  key: string;
  label: string;
  /** As typed, with the field's unit where only a number was typed. */
  value: string;
  /** The value read, in SI units ('' for choices and empty fields). */
  si: string;
  /** True when the field was left at its default (missing, or the default text unchanged). */
  isDefault: boolean;
  advanced: boolean;
}

/** The SI value as read, in the dimension's usual SI unit: "0.762 m" → "762 mm". */
function siText(field: FieldDef, v: unknown): string {
  if (field.type === 'choice') return '';
  const unit = DIMENSIONS[field.dimension].units.si[0];
  if (typeof v === 'number') return formatQuantity(v, unit);
  if (Array.isArray(v)) return v.map((x: number) => formatQuantity(x, unit)).join(', ');
  return '';
}

const NUMBER = String.raw`[+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-]?\d+)?`;
/** One bare number, or a list of them separated by commas or semicolons: no unit typed. */
const BARE_NUMBERS = new RegExp(String.raw`^\s*${NUMBER}(?:\s*[,;]\s*${NUMBER})*\s*$`);

/** Text as typed, with the field unit appended when only numbers were typed: "610" → "610 mm"; "24 in" stays; ^2, ^3 shown as ², ³. */
export function withUnit(text: string, unit: string): string {
  const t = text.trim();
  return unit !== '' && BARE_NUMBERS.test(t) ? `${t} ${unitLabel(unit)}` : t.replace(/\^2(?!\d)/g, '²').replace(/\^3(?!\d)/g, '³');
}

function valueOf(fields: readonly FieldDef[], field: FieldDef, values: FieldValues, system: UnitSystem): string {
  if (field.type === 'choice') {
    const v = choiceValue(fields, values, field.key);
    return field.choices.find((c) => c.value === v)?.label ?? v;
  }
  // A missing key takes the field's default, typed in SI (as the forms read it).
  const present = field.key in values;
  const text = present ? values[field.key] : field.default;
  const unit = fieldUnit(field, present ? system : 'si');
  if (text.trim() !== '') return withUnit(text, unit);
  if (field.type === 'quantity' && field.presetFrom) {
    const source = fields.find((f) => f.key === field.presetFrom);
    if (source?.type === 'choice') {
      const chosen = source.choices.find((c) => c.value === choiceValue(fields, values, source.key));
      const preset = chosen?.presets?.[field.key];
      if (chosen && preset !== undefined) return `${formatQuantity(preset, fieldUnit(field, system))} (from ${chosen.label})`;
    }
  }
  return field.emptyMeans ? `empty: ${field.emptyMeans}` : 'empty';
}

/**
 * Rows for the fields shown for these values, in form order. `defaults` are the values a fresh form has in
 * this unit system: a field whose text is missing or equal to its default is marked as a default.
 */
export function inputRows(fields: readonly FieldDef[], values: FieldValues, system: UnitSystem, defaults: FieldValues = {}): InputRow[] {
  const { read } = readFields(fields, values, system);
  return fields
    .filter((f) => isShown(fields, f, values))
    .map((f) => ({
      key: f.key,
      label: f.label,
      value: valueOf(fields, f, values, system),
      si: siText(f, read.get(f.key)),
      isDefault: !(f.key in values) || values[f.key].trim() === (defaults[f.key] ?? f.default).trim(),
      advanced: f.advanced === true,
    }));
}
