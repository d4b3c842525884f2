/**
 * Field checks used by the case validator and the migration steps. Each returns the checked value or
 * throws a `CaseFieldError` whose message names the field, what was expected and what was got;
 * `parseCase` turns that into `{ ok: false, message }` (nothing escapes it).
 */
import { checkingKit, mustBe } from '../physics/check/kit';
import { got, memberPath, quote } from './describe';

/** Internal: a field failed its check. Never leaves `parseCase`. */
export class CaseFieldError extends Error {}

// The core's checking kit, with this schema's words for values ("a list of 3 items") and its error class.
const KIT = checkingKit((value) => got(value).slice('got '.length), (field, expected, gotText) => new CaseFieldError(mustBe(field, expected, gotText)));

export function fail(field: string, expected: string, value: unknown): never {
  return KIT.fail(field, expected, value);
}

/** Own data property only: values inherited through a prototype are not part of a case. */
export function own(obj: object, key: string): unknown {
  return Object.prototype.hasOwnProperty.call(obj, key) ? (obj as Record<string, unknown>)[key] : undefined;
}

/** A plain object (JSON object, or one from structured clone), not a list, date, map or class instance. */
export function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return false;
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

// Lone UTF-16 surrogates cannot be written as UTF-8: a link or file would silently change them.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
// C0 controls and DEL. Tabs pass everywhere (a single-line <input> keeps a pasted tab; refusing it would stop
// the draft from saving); `note` alone may also hold line feed and carriage return.
const CONTROL_BUT_TAB = /[\u0000-\u0008\u000A-\u001F\u007F]/;
const CONTROL_EXCEPT_LINES = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export interface TextRule {
  maxChars: number;
  /** Allow tab and line breaks (the note). */
  multiline?: boolean;
  /** Words for the expected value, e.g. 'a string such as "610 mm"'. */
  what?: string;
}

/** Text of at most `maxChars` UTF-16 units, well-formed, without control characters other than tabs (and line breaks when multiline). */
export function text(field: string, value: unknown, rule: TextRule): string {
  const what = rule.what ?? 'a string';
  const expected = `${what} of at most ${rule.maxChars} characters`;
  if (typeof value !== 'string') fail(field, expected, value);
  if (value.length > rule.maxChars) fail(field, expected, value);
  if ((rule.multiline ? CONTROL_EXCEPT_LINES : CONTROL_BUT_TAB).test(value)) {
    fail(field, rule.multiline ? `${what} without control characters other than tabs and line breaks` : `${what} on one line, without control characters other than tabs`, value);
  }
  if (LONE_SURROGATE.test(value)) fail(field, `${what} of well-formed Unicode text (it has a broken character)`, value);
  return value;
}

/** One of a fixed set of words. */
export function oneOf<T extends string>(field: string, value: unknown, allowed: readonly T[]): T {
  if (typeof value === 'string' && (allowed as readonly string[]).includes(value)) return value as T;
  const list = allowed.map((a) => JSON.stringify(a));
  const words = list.length === 2 ? `${list[0]} or ${list[1]}` : `one of ${list.join(', ')}`;
  return fail(field, words, value);
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A UUID in its usual 8-4-4-4-12 hexadecimal form; returned in lower case so equal ids compare equal. */
export function uuid(field: string, value: unknown): string {
  if (typeof value !== 'string' || !UUID.test(value)) fail(field, 'a UUID such as "3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81"', value);
  return value.toLowerCase();
}

const ISO = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-](\d{2}):(\d{2}))$/;

function daysInMonth(year: number, month: number): number {
  // Gregorian leap years: divisible by 4, except centuries not divisible by 400 (classical).
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1];
}

/** An ISO 8601 date and time with a zone ("Z" or "+hh:mm"); checked field by field, kept as written. */
export function isoDateTime(field: string, value: unknown): string {
  const expected = 'a date and time in ISO 8601 form such as "2026-03-14T09:21:05.000Z"';
  if (typeof value !== 'string' || value.length > 40) fail(field, expected, value);
  const m = ISO.exec(value);
  if (!m) fail(field, expected, value);
  const [year, month, day, hour, minute] = [m[1], m[2], m[3], m[4], m[5]].map(Number);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  const offH = m[7] === undefined ? 0 : Number(m[7]);
  const offM = m[8] === undefined ? 0 : Number(m[8]);
  const valid =
    month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month) &&
    hour <= 23 && minute <= 59 && second <= 59 && offH <= 23 && offM <= 59;
  if (!valid) fail(field, `${expected}, with a real calendar date and time`, value);
  return value;
}

const FIELD_NAME = /^[A-Za-z][A-Za-z0-9_.-]*$/;

/**
 * A map of field names to values as entered. Built with `Object.fromEntries`, so a name such as
 * "__proto__" could never reach a prototype; such names are refused anyway by the name rule.
 */
export function enteredValues(field: string, value: unknown, limits: { fields: number; nameChars: number; valueChars: number }): Record<string, string> {
  if (!isPlainObject(value)) fail(field, 'an object of field names to values as entered, such as { "outerDiameter": "610 mm" }', value);
  const keys = Object.keys(value);
  if (keys.length > limits.fields) {
    throw new CaseFieldError(`${field} must have at most ${limits.fields} fields, got ${keys.length}`);
  }
  const entries: [string, string][] = [];
  for (const key of keys) {
    if (key.length > limits.nameChars || !FIELD_NAME.test(key)) {
      throw new CaseFieldError(
        `${field} field names must start with a letter and hold only letters, digits, "_", "." or "-" ` +
          `(at most ${limits.nameChars} characters), got ${quote(key)}`,
      );
    }
    entries.push([key, text(memberPath(field, key), value[key], { maxChars: limits.valueChars, what: 'a string such as "610 mm"' })]);
  }
  return Object.fromEntries(entries);
}
