/**
 * Dotted paths into the member model ("masses.0.massKg", "liquid.toM", "segments.2.coating.thicknessM"):
 * read a finite number, or write one into a copy. Only own keys of plain data are followed; prototype keys
 * are refused, so a path from outside can never reach or change anything but the model's own numbers.
 */
import type { MemberModel } from '../beam/model';

const FORBIDDEN = new Set(['__proto__', 'constructor', 'prototype']);
/** Solver settings, not uncertain inputs of the member: refused as range paths. */
const SETTINGS = new Set(['modes', 'mesh']);

export type PathOutcome = { ok: true; value: number } | { ok: false; message: string };

/** Splits "a.0.b" (also accepts the bracket form "a[0].b" of validation messages) into keys. */
export function pathKeys(path: string): string[] | string {
  if (typeof path !== 'string' || path.trim() === '') return 'a path must be a non-empty string such as "masses.0.massKg"';
  const keys = path.replace(/\[(\d+)\]/g, '.$1').split('.');
  for (const k of keys) {
    if (k === '') return `path "${path}" has an empty part (expected keys joined by dots, such as "masses.0.massKg")`;
    if (FORBIDDEN.has(k)) return `path "${path}": "${k}" is not a field of the member model`;
  }
  if (SETTINGS.has(keys[0])) return `path "${path}": "${keys[0]}" is a solver setting, not an input that can be uncertain`;
  return keys;
}

function isIndex(key: string): boolean {
  return /^(0|[1-9]\d*)$/.test(key);
}

/** Follows one key; returns the child or a message naming the path so far. */
function step(node: unknown, key: string, path: string, sofar: string): { ok: true; value: unknown } | { ok: false; message: string } {
  if (Array.isArray(node)) {
    if (!isIndex(key)) return { ok: false, message: `path "${path}": ${sofar} is a list, so "${key}" must be an index 0, 1, 2, …` };
    const i = Number(key);
    if (i >= node.length) return { ok: false, message: `path "${path}": index ${i} is out of range (${sofar} has ${node.length} item${node.length === 1 ? '' : 's'})` };
    return { ok: true, value: node[i] };
  }
  if (typeof node !== 'object' || node === null) return { ok: false, message: `path "${path}": ${sofar} is not an object, so it has no "${key}"` };
  if (!Object.hasOwn(node, key)) return { ok: false, message: `path "${path}": no such key "${key}" in ${sofar}` };
  return { ok: true, value: (node as Record<string, unknown>)[key] };
}

/** The finite number at `path` in the model, or a message naming the path. */
export function getNumberAt(model: MemberModel, path: string): PathOutcome {
  const keys = pathKeys(path);
  if (typeof keys === 'string') return { ok: false, message: keys };
  let node: unknown = model;
  let sofar = 'the member';
  for (const k of keys) {
    const s = step(node, k, path, sofar);
    if (!s.ok) return s;
    node = s.value;
    sofar = sofar === 'the member' ? k : `${sofar}.${k}`;
  }
  if (typeof node !== 'number' || !Number.isFinite(node)) {
    const got = node === undefined ? 'nothing' : typeof node === 'object' ? (Array.isArray(node) ? 'a list' : 'an object') : JSON.stringify(node);
    return { ok: false, message: `path "${path}" must lead to a number, got ${got}` };
  }
  return { ok: true, value: node };
}

/**
 * A copy of the model with the number at `path` replaced by `value`. Objects and lists along the path are
 * copied; everything else is shared with the input, which is never changed. Throws RangeError with the
 * path on a bad path or a non-finite value (check paths once with `getNumberAt` at the public entry).
 */
export function withNumberAt(model: MemberModel, path: string, value: number): MemberModel {
  const got = getNumberAt(model, path);
  if (!got.ok) throw new RangeError(got.message);
  if (!Number.isFinite(value)) throw new RangeError(`path "${path}": the value must be a finite number, got ${value}`);
  const keys = pathKeys(path) as string[];
  const copy = (node: unknown, depth: number): unknown => {
    if (depth === keys.length) return value;
    const k = keys[depth];
    if (Array.isArray(node)) {
      const out = node.slice();
      out[Number(k)] = copy(node[Number(k)], depth + 1);
      return out;
    }
    const out: Record<string, unknown> = { ...(node as Record<string, unknown>) };
    out[k] = copy((node as Record<string, unknown>)[k], depth + 1);
    return out;
  };
  return copy(model, 0) as MemberModel;
}

/** The model with several paths set at once (paths already checked). */
export function withNumbersAt(model: MemberModel, paths: readonly string[], values: ArrayLike<number>): MemberModel {
  let m = model;
  for (let i = 0; i < paths.length; i++) m = withNumberAt(m, paths[i], values[i]);
  return m;
}
