/**
 * Turns a kind's field list and its mapping into a MemberForm: defaults per system, reading with per-field
 * and cross-field messages, building, and converting values between unit systems.
 */
import type { KindBuild, MemberBuild } from '../kinds/common/types';
import { checkedField } from '../physics/check/kit';
import { formatForEntry, parseQuantity, parseQuantityList, type UnitSystem } from '../units';
import { fieldUnit, makeReader, type Reader, readFields } from './read';
import { guardedBuild } from './total-build';
import { type FieldDef, type FieldErrors, type FieldValues, type FieldWarnings, FORM_ERROR_KEY, type MemberForm, type MemberKind } from './types';

/** The parts of a kind's form; `I` is the kind's SI input. */
export interface FormSpec<I, B extends KindBuild = MemberBuild> {
  kind: MemberKind;
  title: string;
  summary: string;
  fields: readonly FieldDef[];
  /**
   * Checks fields against each other (report with `err(fieldKey, message)`, in the user's units through
   * `r.fmt`) and assembles the SI input. Return null when something was reported.
   */
  toInput(r: Reader, err: (key: string, message: string) => void): I | null;
  /**
   * Soft checks of fields against each other (wall / diameter, length / diameter), run on an input that reads:
   * report with `warn(fieldKey, message)`; the value is accepted and the message shown beside the field.
   */
  plausible?(r: Reader, input: I, warn: (key: string, message: string) => void): void;
  /** The physics-side validator, run last as a safety net (its messages use SI field names). */
  validate(input: I): unknown;
  /**
   * Core field paths of the SI input -> this form's field keys, so a message from the safety net lands beside
   * the field it is about (e.g. `{ outerDiameterM: 'outerDiameter' }`); unmapped paths go to FORM_ERROR_KEY.
   */
  coreFields?: Readonly<Record<string, string>>;
  buildModel(input: I): B;
}

/**
 * Re-expresses values typed for one unit system in the other's field units, as plain numbers with as few
 * figures as keep each value to one part in a million (so toggling back returns what was typed, for values of
 * up to five figures). Choices, empty texts and texts that do not parse are left as they are, so nothing the
 * user typed is lost; keys that are not fields are kept.
 */
export function convertFieldValues(fields: readonly FieldDef[], values: FieldValues, from: UnitSystem, to: UnitSystem): FieldValues {
  const out: FieldValues = { ...values };
  if (from === to) return out;
  for (const field of fields) {
    const text = values[field.key];
    if (field.type === 'choice' || text === undefined || text.trim() === '') continue;
    const opts = { dimension: field.dimension, unit: fieldUnit(field, from) };
    const target = fieldUnit(field, to);
    if (field.type === 'quantity') {
      const r = parseQuantity(text, opts);
      if (r.ok) out[field.key] = formatForEntry(r.valueSI, target);
    } else {
      const r = parseQuantityList(text, opts);
      if (r.ok) out[field.key] = r.valuesSI.map((v) => formatForEntry(v, target)).join(', ');
    }
  }
  return out;
}

export function defineForm<I, B extends KindBuild = MemberBuild>(spec: FormSpec<I, B>): MemberForm<I, B> {
  const { fields } = spec;
  const keys = new Set<string>();
  for (const f of fields) {
    if (keys.has(f.key)) throw new RangeError(`${spec.kind} form: field keys must be unique, got "${f.key}" twice`);
    keys.add(f.key);
  }
  const form: MemberForm<I, B> = {
    kind: spec.kind,
    title: spec.title,
    summary: spec.summary,
    fields,
    defaults(system) {
      const si: FieldValues = Object.fromEntries(fields.map((f) => [f.key, f.default]));
      return convertFieldValues(fields, si, 'si', system);
    },
    toInput(values, system) {
      const { read, errors, warnings } = readFields(fields, values, system);
      if (Object.keys(errors).length > 0) return { ok: false, errors };
      const cross: FieldErrors = {};
      const input = spec.toInput(makeReader(fields, read, system), (key, message) => {
        cross[key] ??= message;
      });
      if (Object.keys(cross).length > 0 || input === null) return { ok: false, errors: cross };
      try {
        spec.validate(input);
      } catch (e) {
        const core = checkedField(e);
        const key = core !== undefined && spec.coreFields && Object.prototype.hasOwnProperty.call(spec.coreFields, core) ? spec.coreFields[core] : FORM_ERROR_KEY;
        return { ok: false, errors: { [key]: e instanceof Error ? e.message : String(e) } };
      }
      const all: FieldWarnings = { ...warnings };
      spec.plausible?.(makeReader(fields, read, system), input, (key, message) => {
        all[key] = all[key] ? `${all[key]}; ${message}` : message;
      });
      return { ok: true, input, warnings: all };
    },
    buildModel: spec.buildModel,
    build(values, system) {
      const r = form.toInput(values, system);
      if (!r.ok) return r;
      const input = r.input;
      // Never throws, and never passes on a non-finite number: see total-build.ts.
      const b = guardedBuild(fields, () => readFields(fields, values, system).read, () => spec.buildModel(input));
      return b.ok ? { ok: true, input, build: b.build, warnings: r.warnings } : b;
    },
    convertValues(values, from, to) {
      return convertFieldValues(fields, values, from, to);
    },
  };
  return form;
}
