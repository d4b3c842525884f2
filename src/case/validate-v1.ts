/**
 * Checks a case object of the current schema (version 3: version 1 plus `ranges` and `measurements`) field by field and builds a fresh case from the checked values only:
 * unknown fields are dropped, nothing is shared with the input, keys come out in schema order.
 */
import { CASE_LIMITS } from './limits';
import { enteredRanges } from './ranges';
import { caseMeasurements } from './measurements';
import { CaseFieldError, enteredValues, fail, isPlainObject, isoDateTime, oneOf, own, text, uuid } from './fields';
import { CASE_FORMAT, CASE_SCHEMA_VERSION, MEMBER_KINDS, UNIT_SYSTEMS, VERDICTS, type Case, type KeyResult } from './types';

const APP_VERSION = /^[0-9A-Za-z][0-9A-Za-z.+-]*$/;

const ENTERED = { fields: CASE_LIMITS.fields, nameChars: CASE_LIMITS.fieldNameChars, valueChars: CASE_LIMITS.fieldValueChars };

function keyResult(value: unknown): KeyResult | undefined {
  // JSON writers turn a missing object into null; both mean "no result yet".
  if (value === undefined || value === null) return undefined;
  if (!isPlainObject(value)) fail('keyResult', 'an object such as { "lowestWetFrequencyHz": 1.84, "verdict": "clear" }, or absent', value);
  const out: KeyResult = {};
  const f = own(value, 'lowestWetFrequencyHz');
  if (f !== undefined) {
    if (typeof f !== 'number' || !Number.isFinite(f) || !(f > 0) || f > CASE_LIMITS.frequencyHzMax) {
      fail('keyResult.lowestWetFrequencyHz', `a finite number > 0 and at most ${CASE_LIMITS.frequencyHzMax} Hz`, f);
    }
    out.lowestWetFrequencyHz = f;
  }
  const v = own(value, 'verdict');
  if (v !== undefined) out.verdict = oneOf('keyResult.verdict', v, VERDICTS);
  const bv = own(value, 'bandVerdict');
  if (bv !== undefined) out.bandVerdict = oneOf('keyResult.bandVerdict', bv, VERDICTS);
  return out.lowestWetFrequencyHz === undefined && out.verdict === undefined && out.bandVerdict === undefined ? undefined : out;
}

/** Validates a version-1 case object (format and version already checked by the caller). Throws CaseFieldError. */
export function validateV1(raw: Record<string, unknown>): Case {
  const appVersion = own(raw, 'appVersion');
  const c: Case = {
    format: CASE_FORMAT,
    schemaVersion: CASE_SCHEMA_VERSION,
    id: uuid('id', own(raw, 'id')),
    name: text('name', own(raw, 'name'), { maxChars: CASE_LIMITS.nameChars }),
    tag: text('tag', own(raw, 'tag'), { maxChars: CASE_LIMITS.tagChars }),
    note: text('note', own(raw, 'note'), { maxChars: CASE_LIMITS.noteChars, multiline: true }),
    kind: oneOf('kind', own(raw, 'kind'), MEMBER_KINDS),
    unitSystem: oneOf('unitSystem', own(raw, 'unitSystem'), UNIT_SYSTEMS),
    inputs: enteredValues('inputs', own(raw, 'inputs'), ENTERED),
    excitation: enteredValues('excitation', own(raw, 'excitation'), ENTERED),
    createdAt: isoDateTime('createdAt', own(raw, 'createdAt')),
    updatedAt: isoDateTime('updatedAt', own(raw, 'updatedAt')),
    appVersion:
      typeof appVersion === 'string' && appVersion.length <= CASE_LIMITS.appVersionChars && APP_VERSION.test(appVersion)
        ? appVersion
        : fail('appVersion', `a version such as "0.1.0" (letters, digits, ".", "+", "-"; at most ${CASE_LIMITS.appVersionChars} characters)`, appVersion),
  };
  const ranges = enteredRanges('ranges', own(raw, 'ranges'), ENTERED);
  if (ranges) c.ranges = ranges;
  const measurements = caseMeasurements('measurements', own(raw, 'measurements'));
  if (measurements) c.measurements = measurements;
  const kr = keyResult(own(raw, 'keyResult'));
  if (kr) c.keyResult = kr;
  return c;
}

export { CaseFieldError };
