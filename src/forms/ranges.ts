/**
 * Ranges on uncertain inputs of a guided form: a low and a high value typed beside a quantity field's likely
 * value, in the same unit entry ("3.5", "2.1 m", "50 mm"; a bare number takes the field's unit). Each kind lists
 * the fields worth ranging with default ranges from the trade and their sources (src/kinds/<kind>/ranges.ts);
 * the case keeps what was typed (`RangeTexts`). `readRanges` turns the texts into SI ranges, checked with
 * messages naming the field in the user's units; `valuesAt` writes SI values back into the form's values, so
 * the kind's own builder makes the member at any setting (one form field may drive many model numbers).
 */
import { formatForEntry, formatQuantity, parseQuantity, unitFactor, type UnitSystem } from '../units';
import { convertFieldValues } from './define';
import { fieldUnit, isShown, readFields, type ReadValue } from './read';
import type { FieldDef, FieldValues, QuantityField } from './types';

/** One range as typed: low and high in the field's unit entry, and whether it is used. */
export interface RangeText {
  low: string;
  high: string;
  on: boolean;
}

/** Ranges as typed, by field key. */
export type RangeTexts = Record<string, RangeText>;

/** A kind's offer of a range on one of its quantity fields. */
export interface RangeDef {
  key: string;
  /**
   * The default range in SI from the likely value (SI) and the other fields read (SI, by key); null when there
   * is nothing sensible to range (a top mass of zero).
   */
  defaults(likely: number, read: (key: string) => number | undefined): { low: number; high: number } | null;
  /** Where the default comes from, in a few words with the published source or "judgement". */
  source: string;
  /** The likely value of an optional field left empty ("6 × outer diameter"), SI. */
  likelyWhenEmpty?(read: (key: string) => number | undefined): number | undefined;
}

/** One ranged input, read: SI values and what the app needs to word it. */
export interface FormRange {
  key: string;
  label: string;
  /** The field's unit in the user's system, for wording ("m", "mm", "t"). */
  unit: string;
  low: number;
  likely: number;
  high: number;
}

export type RangeReading = { ok: true; ranges: FormRange[] } | { ok: false; errors: Record<string, string> };

function lower(label: string): string {
  return label.charAt(0).toLowerCase() + label.slice(1);
}

function quantityField(fields: readonly FieldDef[], key: string): QuantityField | null {
  const f = fields.find((x) => x.key === key);
  return f && f.type === 'quantity' ? f : null;
}

function reader(read: Map<string, ReadValue>): (key: string) => number | undefined {
  return (key) => {
    const v = read.get(key);
    return typeof v === 'number' ? v : undefined;
  };
}

/** The likely value of a field in SI: as read, from its preset, or what an empty optional field stands for. */
function likelyOf(def: RangeDef | undefined, key: string, read: Map<string, ReadValue>): number | undefined {
  const v = read.get(key);
  if (typeof v === 'number') return v;
  return def?.likelyWhenEmpty?.(reader(read));
}

/** The range defs of a kind that apply to these values: quantity fields that exist and are shown. */
export function applicableRanges(fields: readonly FieldDef[], defs: readonly RangeDef[], values: FieldValues): RangeDef[] {
  return defs.filter((d) => {
    const f = quantityField(fields, d.key);
    return f !== null && isShown(fields, f, values);
  });
}

/**
 * The default range of one field as text in the user's units (on), or null when the form does not read or the
 * kind offers nothing sensible for these values.
 */
export function defaultRangeText(fields: readonly FieldDef[], def: RangeDef, values: FieldValues, system: UnitSystem): RangeText | null {
  const f = quantityField(fields, def.key);
  if (!f) return null;
  const { read } = readFields(fields, values, system);
  const likely = likelyOf(def, def.key, read);
  if (likely === undefined) return null;
  const d = def.defaults(likely, reader(read));
  if (!d || !(d.high > d.low)) return null;
  const unit = fieldUnit(f, system);
  // Rounded for entry, then widened if rounding moved an end across the likely value.
  const low = Math.min(likely, d.low);
  const high = Math.max(likely, d.high);
  return { low: formatForEntry(low, unit), high: formatForEntry(high, unit), on: true };
}

/**
 * Reads the ranges that are on, for fields that are shown. Messages by field key name the field and use the
 * user's units: a text that does not read, low above high, the likely value outside the range.
 * `defs` supplies what an empty optional field stands for. Keys that are not quantity fields are refused.
 */
export function readRanges(fields: readonly FieldDef[], defs: readonly RangeDef[], values: FieldValues, texts: RangeTexts | undefined, system: UnitSystem): RangeReading {
  const errors: Record<string, string> = {};
  const ranges: FormRange[] = [];
  if (!texts) return { ok: true, ranges };
  const { read } = readFields(fields, values, system);
  for (const [key, t] of Object.entries(texts)) {
    if (!t.on) continue;
    const f = fields.find((x) => x.key === key);
    if (!f) {
      errors[key] = `a range is given for "${key}", which is not a field of this form`;
      continue;
    }
    if (f.type !== 'quantity') {
      errors[key] = `${lower(f.label)} cannot take a range: only single quantities can`;
      continue;
    }
    if (!isShown(fields, f, values)) continue;
    const name = lower(f.label);
    const unit = fieldUnit(f, system);
    const ends: number[] = [];
    for (const [end, text] of [['low', t.low], ['high', t.high]] as const) {
      if (text.trim() === '') {
        errors[key] ??= `enter the ${end} end of the range of ${name}`;
        continue;
      }
      const r = parseQuantity(text, { dimension: f.dimension, unit });
      if (!r.ok) errors[key] ??= `${end} end of the range of ${name}: ${r.message}`;
      else ends.push(r.valueSI);
    }
    if (errors[key]) continue;
    const [low, high] = ends;
    const fmt = (v: number) => formatQuantity(v, unit);
    if (low > high) {
      errors[key] = `the range of ${name} runs from ${fmt(low)} to ${fmt(high)}: the low end must not be above the high end`;
      continue;
    }
    const likely = likelyOf(defs.find((d) => d.key === key), key, read);
    if (likely === undefined) {
      errors[key] = `enter ${name} itself before its range`;
      continue;
    }
    // Entered values are rounded to about one part in a million (formatForEntry): allow that much.
    const slack = 1e-6 * Math.max(Math.abs(likely), Math.abs(low), Math.abs(high));
    if (likely < low - slack || likely > high + slack) {
      errors[key] = `${name} (${fmt(likely)}) lies outside its range ${fmt(low)} to ${fmt(high)}: the likely value must lie within the range`;
      continue;
    }
    ranges.push({ key, label: f.label, unit, low: Math.min(low, likely), likely, high: Math.max(high, likely) });
  }
  return Object.keys(errors).length > 0 ? { ok: false, errors } : { ok: true, ranges };
}

/** The form's values with each ranged field set to an SI value (written exactly, in the field's unit for `system`). */
export function valuesAt(fields: readonly FieldDef[], values: FieldValues, ranges: readonly FormRange[], x: ArrayLike<number>, system: UnitSystem): FieldValues {
  const out: FieldValues = { ...values };
  ranges.forEach((r, i) => {
    const f = quantityField(fields, r.key)!;
    out[r.key] = String(x[i] / unitFactor(fieldUnit(f, system)));
  });
  return out;
}

/** Re-expresses range texts typed for one unit system in the other's field units (as the values themselves are). */
export function convertRangeTexts(fields: readonly FieldDef[], texts: RangeTexts, from: UnitSystem, to: UnitSystem): RangeTexts {
  const keys = Object.keys(texts);
  const lows = convertFieldValues(fields, Object.fromEntries(keys.map((k) => [k, texts[k].low])), from, to);
  const highs = convertFieldValues(fields, Object.fromEntries(keys.map((k) => [k, texts[k].high])), from, to);
  return Object.fromEntries(keys.map((k) => [k, { low: lows[k], high: highs[k], on: texts[k].on }]));
}
