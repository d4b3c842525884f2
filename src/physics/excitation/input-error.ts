/**
 * The error thrown at the public entry for input it cannot screen. `field` is the path of the offending
 * value (e.g. "modes[1].wetFrequencyHz") so the form can point at it; the message names field, what was
 * expected and what was got.
 */
export class ScreeningInputError extends RangeError {
  readonly field: string;
  readonly expected: string;
  readonly got: unknown;

  constructor(field: string, expected: string, got: unknown) {
    super(`${field} must be ${expected}, got ${describe(got)}`);
    this.name = 'ScreeningInputError';
    this.field = field;
    this.expected = expected;
    this.got = got;
  }
}

/** A short printable form of any value, for messages. */
export function describe(v: unknown): string {
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'number' || typeof v === 'boolean' || v === undefined || v === null) return String(v);
  if (Array.isArray(v)) return `an array of length ${v.length}`;
  if (ArrayBuffer.isView(v)) return `a typed array of length ${(v as unknown as ArrayLike<unknown>).length}`;
  return typeof v === 'object' ? 'an object' : typeof v;
}
