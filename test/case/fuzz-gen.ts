/**
 * Seeded generators for the fuzz tests of parseCase (test/case) and the link decoder (test/share):
 * hostile values of every kind — wrong types, huge and odd numbers, deep nesting, markup and script text,
 * control characters, broken Unicode, prototype-polluting keys.
 */
import { parseCase, type Case } from '../../src/case';
import { seeded } from '../bench/timing';

export type Rng = () => number;
export { seeded };

export function int(rnd: Rng, n: number): number {
  return Math.floor(rnd() * n);
}
export function pick<T>(rnd: Rng, items: readonly T[]): T {
  return items[int(rnd, items.length)];
}

/** Markup and script text that must come back as the same plain string wherever a string is allowed. */
export const MARKUP = [
  '<script>alert(1)</script>',
  '<img src=x onerror="alert(document.cookie)">',
  '"><svg/onload=alert(1)>',
  "javascript:alert('x')",
  '{{constructor.constructor("alert(1)")()}}',
  '</title><h1>Hi</h1>',
  '&lt;b&gt; &amp; &#x3C;',
  '${process.exit(1)}',
  "'; DROP TABLE cases; --",
  '=HYPERLINK("http://x","y")',
];

/** Deeply nested arrays or objects, built without recursion. */
export function deep(depth: number, asObject: boolean): unknown {
  let v: unknown = 'bottom';
  for (let i = 0; i < depth; i++) v = asObject ? { d: v } : [v];
  return v;
}

/** A random hostile value. */
export function hostile(rnd: Rng): unknown {
  switch (int(rnd, 18)) {
    case 0: return null;
    case 1: return undefined;
    case 2: return pick(rnd, [true, false]);
    case 3: return pick(rnd, [0, -0, -1, 1e308, -1e308, 5e-324, Number.MAX_SAFE_INTEGER + 2, NaN, Infinity, -Infinity, 2 ** 53, 0.1]);
    case 4: return rnd() * 10 ** int(rnd, 400) * (rnd() < 0.5 ? -1 : 1);
    case 5: return pick(rnd, MARKUP);
    case 6: return 'x'.repeat(pick(rnd, [0, 1, 100, 199, 200, 201, 4000, 4001, 100_000]));
    case 7: return String.fromCharCode(int(rnd, 0x20)) + 'a';
    case 8: return pick(rnd, ['\ud800', 'a\udc00b', '\u2028\u2029', '\u202e reversed', '🌊'.repeat(60), '\u0000']);
    case 9: return [];
    case 10: return Array.from({ length: int(rnd, 5) }, () => pick(rnd, [1, 'a', null]));
    case 11: return {};
    case 12: return deep(1 + int(rnd, 3000), rnd() < 0.5);
    case 13: return JSON.parse('{"__proto__": {"polluted": "yes"}, "constructor": {"prototype": {"polluted": "yes"}}}');
    case 14: return Object.fromEntries(Array.from({ length: 60 + int(rnd, 20) }, (_, i) => [`k${i}`, `${i} m`]));
    case 15: return pick(rnd, ['2026-13-01T00:00:00Z', '2026-02-30T00:00:00Z', 'not a date', '2026-03-14', '9999-12-31T23:59:59Z']);
    case 16: return pick(rnd, ['pile', 'riser', 'baffle', 'stem', 'si', 'us', 'clear', 'close', 'inside-band', 'wetmode-case']);
    default: return pick(rnd, ['3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81', 'ZZZZZZZZ-8b41-4d7a-9c15-2e0b7d4f6a81', '', '1', 1]);
  }
}

/** Fields a mutation may target; dotted paths reach into inputs and keyResult. */
export const FIELDS = [
  'format', 'schemaVersion', 'id', 'name', 'tag', 'note', 'kind', 'unitSystem', 'inputs', 'excitation',
  'createdAt', 'updatedAt', 'appVersion', 'keyResult', 'keyResult.lowestWetFrequencyHz', 'keyResult.verdict',
  'inputs.outerDiameter', 'inputs.__proto__', 'inputs.constructor', 'inputs.bad key', 'excitation.currentSpeed',
  // version-0 names, so migration paths are fuzzed too
  'title', 'member', 'units', 'fields', 'savedAt', 'builtWith', 'screening',
];

/** Sets (or deletes, for undefined) a dotted path on a plain object, creating objects on the way; defineProperty so "__proto__" is an own key. */
export function setPath(obj: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let target: Record<string, unknown> = obj;
  for (const p of parts.slice(0, -1)) {
    const next = target[p];
    if (typeof next !== 'object' || next === null || Array.isArray(next)) {
      Object.defineProperty(target, p, { value: {}, enumerable: true, writable: true, configurable: true });
    }
    target = target[p] as Record<string, unknown>;
  }
  const last = parts[parts.length - 1];
  if (value === undefined) delete target[last];
  else Object.defineProperty(target, last, { value, enumerable: true, writable: true, configurable: true });
}

/**
 * Checks a parse result: a refusal carries a short message; an acceptance is a whole case that parses to itself,
 * survives JSON, and is made only of the schema's fields with the schema's types.
 */
export function checkResult(r: ReturnType<typeof parseCase>): string | null {
  if (r.ok !== true && r.ok !== false) return 'ok is not a boolean';
  if (!r.ok) {
    if (typeof r.message !== 'string' || r.message.length === 0) return 'empty message';
    if (r.message.length > 500) return `message too long (${r.message.length})`;
    return null;
  }
  return checkWhole(r.value);
}

export function checkWhole(c: Case): string | null {
  const again = parseCase(c);
  if (!again.ok) return `accepted case does not parse again: ${again.message}`;
  if (JSON.stringify(again.value) !== JSON.stringify(c)) return 'accepted case changes when parsed again';
  if (JSON.stringify(JSON.parse(JSON.stringify(c))) !== JSON.stringify(c)) return 'accepted case does not survive JSON';
  const strings = ['id', 'name', 'tag', 'note', 'kind', 'unitSystem', 'createdAt', 'updatedAt', 'appVersion'] as const;
  for (const k of strings) if (typeof c[k] !== 'string') return `${k} is not a string`;
  for (const m of [c.inputs, c.excitation]) {
    if (Object.getPrototypeOf(m) !== Object.prototype) return 'a value map has an odd prototype';
    for (const v of Object.values(m)) if (typeof v !== 'string') return 'a value is not a string';
  }
  return null;
}
