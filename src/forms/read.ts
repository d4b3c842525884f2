/**
 * Reading form values field by field: visibility, defaults for missing keys, unit parsing, presets and ranges.
 * The per-kind forms then check fields against each other through a `Reader`.
 */
import { formatQuantity, parseQuantity, parseQuantityList, type UnitSystem } from '../units';
import type { Bound, ChoiceField, FieldDef, FieldErrors, FieldValues, FieldWarnings, QuantityField, QuantityListField } from './types';

export type ReadValue = number | number[] | string | undefined;

/** The unit shown beside a quantity field in a system. */
export function fieldUnit(field: QuantityField | QuantityListField, system: UnitSystem): string {
  return field.units[system];
}

function byKey(fields: readonly FieldDef[], key: string): FieldDef {
  const f = fields.find((x) => x.key === key);
  if (!f) throw new RangeError(`field key must be one of ${fields.map((x) => x.key).join(', ')}, got ${JSON.stringify(key)}`);
  return f;
}

/** The value of a choice field (the default when the key is missing). */
export function choiceValue(fields: readonly FieldDef[], values: FieldValues, key: string): string {
  const f = byKey(fields, key);
  return values[key] ?? f.default;
}

/** Whether a field is shown (and read) for these values. */
export function isShown(fields: readonly FieldDef[], field: FieldDef, values: FieldValues): boolean {
  const w = field.showWhen;
  return !w || w.values.includes(choiceValue(fields, values, w.key));
}

/** The text of a field and the system its bare numbers are in: a missing key takes the SI default. */
export function textOf(field: FieldDef, values: FieldValues, system: UnitSystem): { text: string; system: UnitSystem } {
  return field.key in values ? { text: values[field.key], system } : { text: field.default, system: 'si' };
}

function lower(label: string): string {
  return label.charAt(0).toLowerCase() + label.slice(1);
}

/** "must be more than zero", "must be at most 50 %", in the user's units; null when inside the bounds. */
function rangeMessage(field: QuantityField | QuantityListField, v: number, system: UnitSystem): string | null {
  const unit = fieldUnit(field, system);
  const say = (b: Bound, above: boolean): string => {
    if (b.valueSI === 0) return above ? (b.inclusive ? 'zero or more' : 'more than zero') : b.inclusive ? 'zero or less' : 'less than zero';
    const q = formatQuantity(b.valueSI, unit);
    return above ? (b.inclusive ? `at least ${q}` : `more than ${q}`) : b.inclusive ? `at most ${q}` : `less than ${q}`;
  };
  const { min, max } = field;
  const hint = field.type === 'quantity' && field.didYouMean ? field.didYouMean(v, system) : undefined;
  const tail = hint ? `: ${hint}` : '';
  if (min && !(min.inclusive ? v >= min.valueSI : v > min.valueSI)) return `${lower(field.label)} must be ${say(min, true)}${rangeTail(field, system)}${tail}`;
  if (max && !(max.inclusive ? v <= max.valueSI : v < max.valueSI)) return `${lower(field.label)} must be ${say(max, false)}${rangeTail(field, system)}${tail}`;
  return null;
}

/** " (allowed: 500 to 2000 kg/m³)" when the field has both hard limits, so a refusal states the whole range. */
function rangeTail(field: QuantityField | QuantityListField, system: UnitSystem): string {
  const { min, max } = field;
  if (!min || !max) return '';
  const unit = fieldUnit(field, system);
  return ` (allowed: ${formatQuantity(min.valueSI, unit)} to ${formatQuantity(max.valueSI, unit)})`;
}

/**
 * The warning for a value accepted but outside the field's soft range, in the user's units, with the range's
 * basis: "liquid density 1200 kg/m³ is outside the usual 950 to 1100 kg/m³ (…): check it". Null inside.
 */
export function plausibleMessage(field: QuantityField | QuantityListField, v: number, system: UnitSystem): string | null {
  const p = field.plausible;
  if (!p) return null;
  const low = p.min !== undefined && v < p.min;
  const high = p.max !== undefined && v > p.max;
  if (!low && !high) return null;
  const unit = fieldUnit(field, system);
  const f = (x: number): string => formatQuantity(x, unit);
  const range = p.min !== undefined && p.max !== undefined ? `the usual ${f(p.min)} to ${f(p.max)}` : p.max !== undefined ? `the usual at most ${f(p.max)}` : `the usual at least ${f(p.min as number)}`;
  return `${lower(field.label)} ${f(v)} is outside ${range} (${p.basis}): check it`;
}

type One = { ok: true; value: ReadValue; warning?: string } | { ok: false; message: string };

function readChoice(field: ChoiceField, text: string): One {
  if (field.choices.some((c) => c.value === text)) return { ok: true, value: text };
  return { ok: false, message: `choose one of: ${field.choices.map((c) => c.label).join(', ')}` };
}

function readQuantity(fields: readonly FieldDef[], field: QuantityField, values: FieldValues, system: UnitSystem): One {
  const { text, system: sys } = textOf(field, values, system);
  if (text.trim() === '') {
    if (field.presetFrom) {
      const source = byKey(fields, field.presetFrom) as ChoiceField;
      const chosen = source.choices.find((c) => c.value === choiceValue(fields, values, source.key));
      const preset = chosen?.presets?.[field.key];
      if (preset !== undefined) return { ok: true, value: preset };
      return { ok: false, message: `enter ${lower(field.label)}: "${chosen?.label ?? '?'}" has no preset value` };
    }
    if (field.optional) return { ok: true, value: undefined };
  }
  const r = parseQuantity(text, { dimension: field.dimension, unit: fieldUnit(field, sys) });
  if (!r.ok) return r;
  const bad = rangeMessage(field, r.valueSI, system);
  if (bad) return { ok: false, message: bad };
  return { ok: true, value: r.valueSI, warning: plausibleMessage(field, r.valueSI, system) ?? undefined };
}

function readList(field: QuantityListField, values: FieldValues, system: UnitSystem): One {
  const { text, system: sys } = textOf(field, values, system);
  const r = parseQuantityList(text, { dimension: field.dimension, unit: fieldUnit(field, sys) });
  if (!r.ok) return r;
  for (let i = 0; i < r.valuesSI.length; i++) {
    const bad = rangeMessage(field, r.valuesSI[i], system);
    if (bad) return { ok: false, message: r.valuesSI.length > 1 ? `item ${i + 1}: ${bad}` : bad };
  }
  for (let i = 0; i < r.valuesSI.length; i++) {
    const w = plausibleMessage(field, r.valuesSI[i], system);
    if (w) return { ok: true, value: r.valuesSI, warning: r.valuesSI.length > 1 ? `item ${i + 1}: ${w}` : w };
  }
  return { ok: true, value: r.valuesSI };
}

/** Reads every shown field; hidden fields are left out. */
export function readFields(fields: readonly FieldDef[], values: FieldValues, system: UnitSystem): { read: Map<string, ReadValue>; errors: FieldErrors; warnings: FieldWarnings } {
  const read = new Map<string, ReadValue>();
  const errors: FieldErrors = {};
  const warnings: FieldWarnings = {};
  for (const field of fields) {
    if (!isShown(fields, field, values)) continue;
    const r =
      field.type === 'choice'
        ? readChoice(field, textOf(field, values, system).text)
        : field.type === 'quantity'
          ? readQuantity(fields, field, values, system)
          : readList(field, values, system);
    if (r.ok) {
      read.set(field.key, r.value);
      if (r.warning) warnings[field.key] = r.warning;
    } else errors[field.key] = r.message;
  }
  return { read, errors, warnings };
}

/** Typed access to the values read, and formatting in the user's units for cross-field messages. */
export interface Reader {
  system: UnitSystem;
  /** A shown quantity that has a value (required or preset). */
  num(key: string): number;
  /** A quantity that may be empty or hidden. */
  opt(key: string): number | undefined;
  list(key: string): number[];
  choice(key: string): string;
  /** A value in the field's unit for the user's system: fmt('outerDiameter', 0.305) → "305 mm". */
  fmt(key: string, valueSI: number): string;
}

export function makeReader(fields: readonly FieldDef[], read: Map<string, ReadValue>, system: UnitSystem): Reader {
  const get = (key: string): ReadValue => {
    byKey(fields, key);
    return read.get(key);
  };
  return {
    system,
    num(key) {
      const v = get(key);
      if (typeof v !== 'number') throw new RangeError(`field ${key} must hold a number here, got ${JSON.stringify(v)}`);
      return v;
    },
    opt(key) {
      const v = get(key);
      return typeof v === 'number' ? v : undefined;
    },
    list(key) {
      const v = get(key);
      return Array.isArray(v) ? v : [];
    },
    choice(key) {
      const v = get(key);
      return typeof v === 'string' ? v : choiceValue(fields, {}, key);
    },
    fmt(key, valueSI) {
      const f = byKey(fields, key);
      if (f.type === 'choice') throw new RangeError(`field ${key} must be a quantity field to format a value, got a choice field`);
      return formatQuantity(valueSI, fieldUnit(f, system));
    },
  };
}
