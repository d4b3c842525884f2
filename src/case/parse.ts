/**
 * `parseCase(raw: unknown)`: the one gate for every case from outside the running app.
 * Never throws, whatever it is given (hostile getters and proxies included): returns a whole, freshly built
 * case or a message in plain words naming the field, what was expected and what was got.
 */
import { got } from './describe';
import { CaseFieldError, isPlainObject, own } from './fields';
import { CASE_STEPS } from './migrations';
import { CASE_FORMAT, CASE_SCHEMA_VERSION, NEWER_VERSION_MESSAGE, type ParseCaseResult } from './types';
import { validateV1 } from './validate-v1';

function parseUnsafe(raw: unknown): ParseCaseResult {
  if (!isPlainObject(raw)) return { ok: false, message: `a case must be a JSON object, ${got(raw)}` };
  const format = own(raw, 'format');
  if (format !== CASE_FORMAT) {
    return { ok: false, message: `format must be ${JSON.stringify(CASE_FORMAT)} (this is not a Wetmode case), ${got(format)}` };
  }
  const version = own(raw, 'schemaVersion');
  if (typeof version === 'number' && Number.isInteger(version) && version > CASE_SCHEMA_VERSION) {
    return { ok: false, message: NEWER_VERSION_MESSAGE };
  }
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return { ok: false, message: `schemaVersion must be a whole number from 0 to ${CASE_SCHEMA_VERSION}, ${got(version)}` };
  }
  let current: Record<string, unknown> = raw;
  for (let v = version; v < CASE_SCHEMA_VERSION; v++) current = CASE_STEPS[v](current);
  try {
    const value = validateV1(current);
    return version === CASE_SCHEMA_VERSION ? { ok: true, value } : { ok: true, value, migratedFrom: version };
  } catch (e) {
    if (e instanceof CaseFieldError && version !== CASE_SCHEMA_VERSION) {
      throw new CaseFieldError(`${e.message} (in a version ${version} case, after updating it to version ${CASE_SCHEMA_VERSION})`);
    }
    throw e;
  }
}

/** Validates and, when older, migrates a case. See `types.ts` for the schema and `limits.ts` for the limits. */
export function parseCase(raw: unknown): ParseCaseResult {
  try {
    return parseUnsafe(raw);
  } catch (e) {
    if (e instanceof CaseFieldError) return { ok: false, message: e.message };
    // Only a hostile object (throwing getter, revoked proxy) gets here; say so without trusting the error.
    let why = 'it could not be read';
    try {
      if (e instanceof Error && typeof e.message === 'string') why = `it could not be read (${e.message.slice(0, 80)})`;
    } catch {
      /* keep the plain words */
    }
    return { ok: false, message: `this is not a usable case: ${why}` };
  }
}
