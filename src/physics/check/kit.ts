/**
 * The checking kit of the core: one set of field checks for every public entry (member model, member kinds,
 * screening input, section input, saved cases). Every message has one form,
 * `<field> must be <expected>, got <what was got>`, e.g. `wallThicknessM must be a finite number > 0, got -2`.
 * Each entry keeps its own way of describing the value got and its own error class (so the messages users and
 * tests already know stay word for word), and makes its checks once with `checkingKit`.
 */

/** Words for a received value, e.g. `-2`, `"abc"`, `an object`. */
export type Describe = (value: unknown) => string;

/** The error thrown for a failed check (its message in the kit's form, see `mustBe`). */
export type MakeError = (field: string, expected: string, gotText: string, value: unknown) => Error;

/**
 * The default error of a failed check: a plain RangeError (as every entry threw before the kit), with the
 * field path attached as a non-enumerable `field`, so a form can put the message beside its own field.
 */
export function fieldCheckError(message: string, field: string): RangeError {
  const e = new RangeError(message);
  Object.defineProperty(e, 'field', { value: field, enumerable: false });
  return e;
}

/** The field path a kit error carries, or undefined for any other error. */
export function checkedField(e: unknown): string | undefined {
  const f = e instanceof Error ? (e as { field?: unknown }).field : undefined;
  return typeof f === 'string' ? f : undefined;
}

/** The one message form. */
export function mustBe(field: string, expected: string, gotText: string): string {
  return `${field} must be ${expected}, got ${gotText}`;
}

/** `"a", "b", "c"`: the allowed words of a choice, quoted. */
export function quotedList(allowed: readonly string[]): string {
  return allowed.map((a) => JSON.stringify(a)).join(', ');
}

export function isFiniteNumber(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

export function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

export interface CheckingKit {
  /** Throws: `<field> must be <expected>, got <describe(value)>`. */
  fail(field: string, expected: string, value: unknown): never;
  /** As `fail`, with the received part already in words. */
  failText(field: string, expected: string, gotText: string, value?: unknown): never;
  finite(field: string, v: unknown): number;
  positive(field: string, v: unknown): number;
  nonNegative(field: string, v: unknown): number;
  /** A finite number in [min, max) or [min, max] (`expected` says it in words). */
  range(field: string, v: unknown, min: number, max: number, maxInclusive: boolean, expected: string): number;
  /** A whole number ≥ min. */
  integer(field: string, v: unknown, min: number, expected?: string): number;
  bool(field: string, v: unknown): boolean;
  /** One of a few words: `one of "a", "b"`. */
  oneOf<T extends string>(field: string, v: unknown, allowed: readonly T[], expected?: string): T;
  record(field: string, v: unknown, expected?: string): Record<string, unknown>;
  /** A list (plain or typed array) of at least `minLength` entries. */
  arrayOf(field: string, v: unknown, minLength: number, expected: string): ArrayLike<unknown>;
  /** A value that may be absent; when present it must pass `check`. */
  optional<T>(field: string, v: unknown, check: (field: string, v: unknown) => T): T | undefined;
}

/** The kit for one entry: its way of describing values (and its error class; by default a RangeError carrying the field). */
export function checkingKit(describe: Describe, makeError: MakeError = (f, e, g) => fieldCheckError(mustBe(f, e, g), f)): CheckingKit {
  const failText = (field: string, expected: string, gotText: string, value?: unknown): never => {
    throw makeError(field, expected, gotText, value);
  };
  const fail = (field: string, expected: string, value: unknown): never => failText(field, expected, describe(value), value);
  return {
    fail,
    failText,
    finite(field, v) {
      if (!isFiniteNumber(v)) fail(field, 'a finite number', v);
      return v as number;
    },
    positive(field, v) {
      if (!isFiniteNumber(v) || !(v > 0)) fail(field, 'a finite number > 0', v);
      return v as number;
    },
    nonNegative(field, v) {
      if (!isFiniteNumber(v) || !(v >= 0)) fail(field, 'a finite number ≥ 0', v);
      return v as number;
    },
    range(field, v, min, max, maxInclusive, expected) {
      if (!isFiniteNumber(v) || !(v >= min) || !(maxInclusive ? v <= max : v < max)) fail(field, expected, v);
      return v as number;
    },
    integer(field, v, min, expected = `a whole number ≥ ${min}`) {
      if (typeof v !== 'number' || !Number.isInteger(v) || v < min) fail(field, expected, v);
      return v as number;
    },
    bool(field, v) {
      if (typeof v !== 'boolean') fail(field, 'true or false', v);
      return v as boolean;
    },
    oneOf<T extends string>(field: string, v: unknown, allowed: readonly T[], expected?: string): T {
      if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v)) fail(field, expected ?? `one of ${quotedList(allowed)}`, v);
      return v as T;
    },
    record(field, v, expected = 'an object') {
      if (!isRecord(v)) fail(field, expected, v);
      return v as Record<string, unknown>;
    },
    arrayOf(field, v, minLength, expected) {
      const ok = Array.isArray(v) || (ArrayBuffer.isView(v) && !(v instanceof DataView));
      if (!ok || (v as ArrayLike<unknown>).length < minLength) fail(field, expected, v);
      return v as ArrayLike<unknown>;
    },
    optional(field, v, check) {
      return v === undefined ? undefined : check(field, v);
    },
  };
}
