/**
 * Building a member model must never throw and never hand on a number that is not finite. A value inside a
 * field's range can still make a derived length overflow (an outer diameter of 1e308 m gives a fixity depth of
 * 6 × D = Infinity), and the builders were written for values a member can have. So the build is run guarded,
 * the model is checked for finiteness, and any failure comes back as a message beside the field that most
 * likely caused it (the one holding the most extreme number), or as a form-wide message.
 */
import type { MemberBuild } from '../kinds/common/types';
import { type FieldDef, type FieldErrors, FORM_ERROR_KEY } from './types';
import type { ReadValue } from './read';

/** Magnitudes beyond these are named as the likely cause (no member dimension, mass or modulus comes near them). */
const HUGE = 1e100;
const TINY = 1e-100;

/** The path of the first number in `value` that is not finite ("segments[0].toM"), or null when all are. */
export function firstNonFinite(value: unknown, path = 'model', depth = 0): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path;
  if (depth > 8 || value === null || typeof value !== 'object') return null;
  if (ArrayBuffer.isView(value)) {
    const arr = value as unknown as ArrayLike<number>;
    for (let i = 0; i < arr.length; i++) if (typeof arr[i] === 'number' && !Number.isFinite(arr[i])) return `${path}[${i}]`;
    return null;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = firstNonFinite(value[i], `${path}[${i}]`, depth + 1);
      if (p) return p;
    }
    return null;
  }
  for (const [k, v] of Object.entries(value)) {
    const p = firstNonFinite(v, `${path}.${k}`, depth + 1);
    if (p) return p;
  }
  return null;
}

function extremeness(v: ReadValue): number {
  const nums = typeof v === 'number' ? [v] : Array.isArray(v) ? v : [];
  let worst = 0;
  for (const x of nums) {
    const a = Math.abs(x);
    if (a >= HUGE) worst = Math.max(worst, Math.log10(a));
    else if (a > 0 && a <= TINY) worst = Math.max(worst, -Math.log10(a));
  }
  return worst;
}

/** Messages for a build that threw or produced a non-finite number; `why` is for the form-wide fallback. */
export function buildFailure(fields: readonly FieldDef[], read: Map<string, ReadValue>, why: string): FieldErrors {
  let key: string | null = null;
  let worst = 0;
  for (const [k, v] of read) {
    const e = extremeness(v);
    if (e > worst) {
      worst = e;
      key = k;
    }
  }
  const field = key ? fields.find((f) => f.key === key) : undefined;
  if (field) {
    return { [field.key]: `${field.label.toLowerCase()} is too large or too small to compute with (quantities worked out from it overflow); check for a stray exponent or a wrong unit` };
  }
  return { [FORM_ERROR_KEY]: `These inputs cannot be computed (${why}); check the values for a stray exponent or a wrong unit.` };
}

/** Runs `build` so that it cannot throw: the build, or messages by field (`read` is asked for only on failure). */
export function guardedBuild(
  fields: readonly FieldDef[],
  read: () => Map<string, ReadValue>,
  build: () => MemberBuild,
): { ok: true; build: MemberBuild } | { ok: false; errors: FieldErrors } {
  let b: MemberBuild;
  try {
    b = build();
  } catch (e) {
    return { ok: false, errors: buildFailure(fields, read(), e instanceof Error ? e.message : String(e)) };
  }
  const bad = firstNonFinite(b, 'build');
  return bad ? { ok: false, errors: buildFailure(fields, read(), `${bad} is not a finite number`) } : { ok: true, build: b };
}
