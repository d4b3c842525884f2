/**
 * Plain-words descriptions of bad values for error messages ("got a list of 3 items").
 * Never recurses into the value and never calls its methods, so a deeply nested or hostile value
 * cannot make a message expensive or throw; long strings are shortened.
 */

/** Characters of a string shown in a message before it is shortened. */
const SHOWN_CHARS = 40;

/** Quotes a string for a message, shortened to SHOWN_CHARS with the full length given. */
export function quote(s: string): string {
  if (s.length <= SHOWN_CHARS) return JSON.stringify(s);
  return `${JSON.stringify(s.slice(0, SHOWN_CHARS))}… (${s.length} characters)`;
}

/** "got …" text for any value: `got nothing`, `got null`, `got "abc"`, `got 12`, `got a list of 3 items`. */
export function got(value: unknown): string {
  if (value === undefined) return 'got nothing';
  if (value === null) return 'got null';
  switch (typeof value) {
    case 'string':
      return `got ${quote(value)}`;
    case 'number':
      return `got ${Object.is(value, -0) ? '-0' : String(value)}`;
    case 'boolean':
      return `got ${String(value)}`;
    case 'bigint':
      return 'got a bigint';
    case 'symbol':
      return 'got a symbol';
    case 'function':
      return 'got a function';
  }
  if (Array.isArray(value)) return value.length === 1 ? 'got a list of 1 item' : `got a list of ${value.length} items`;
  return 'got an object';
}

const PLAIN_NAME = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/** Path of a member for messages: `inputs.outerDiameter`, or `inputs["odd name"]` when not a plain name. */
export function memberPath(parent: string, key: string): string {
  return PLAIN_NAME.test(key) && key.length <= SHOWN_CHARS ? `${parent}.${key}` : `${parent}[${quote(key)}]`;
}
