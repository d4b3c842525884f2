/**
 * The `ranges` field of a case (schema version 2): ranges on uncertain member inputs as entered, by field name.
 * `{ "fixityDepth": { "low": "2.1", "high": "4.9", "on": true } }`. Built fresh from checked values only.
 */
import { CaseFieldError, fail, isPlainObject, own, text } from './fields';
import type { EnteredRanges } from './types';

const FIELD_NAME = /^[A-Za-z][A-Za-z0-9_.-]*$/;

/** Checks `ranges` (absent or null: none). Throws CaseFieldError naming the field. */
export function enteredRanges(field: string, value: unknown, limits: { fields: number; nameChars: number; valueChars: number }): EnteredRanges | undefined {
  if (value === undefined || value === null) return undefined;
  const example = 'an object of field names to ranges, such as { "fixityDepth": { "low": "2.1", "high": "4.9", "on": true } }';
  if (!isPlainObject(value)) fail(field, example, value);
  const keys = Object.keys(value);
  if (keys.length > limits.fields) throw new CaseFieldError(`${field} must have at most ${limits.fields} fields, got ${keys.length}`);
  const out: [string, EnteredRanges[string]][] = [];
  for (const key of keys) {
    if (key.length > limits.nameChars || !FIELD_NAME.test(key)) {
      throw new CaseFieldError(`${field} field names must start with a letter and hold only letters, digits, "_", "." or "-" (at most ${limits.nameChars} characters), got ${JSON.stringify(key)}`);
    }
    const r = value[key];
    const at = `${field}.${key}`;
    if (!isPlainObject(r)) fail(at, 'an object { "low", "high", "on" }', r);
    const on = own(r, 'on');
    if (typeof on !== 'boolean') fail(`${at}.on`, 'true or false', on);
    const what = 'a string such as "2.1 m"';
    out.push([key, { low: text(`${at}.low`, own(r, 'low'), { maxChars: limits.valueChars, what }), high: text(`${at}.high`, own(r, 'high'), { maxChars: limits.valueChars, what }), on }]);
  }
  return out.length > 0 ? (Object.fromEntries(out) as EnteredRanges) : undefined;
}


