/**
 * Ranges on uncertain inputs: the public input of the band, checked once here. A range is a dotted path
 * into the member model with a low and a high value in SI; the likely value is the model's own value at
 * that path, which must lie inside the range.
 */
import type { MemberModel } from '../beam/model';
import { parseMemberModel } from '../beam/validate';
import { getNumberAt, pathKeys, withNumberAt } from './paths';

/** A range on one numeric input of the member model, SI units. */
export interface InputRange {
  path: string;
  low: number;
  high: number;
}

/** A checked range with the model's own (likely) value at its path. */
export interface ResolvedRange extends InputRange {
  likely: number;
}

/** More ranged inputs than this would make the 2^k corner evaluation too costly for a field tool. */
export const MAX_RANGED_INPUTS = 8;

function describe(v: unknown): string {
  return typeof v === 'number' ? String(v) : v === undefined ? 'nothing' : JSON.stringify(v);
}

/**
 * Checks ranges from outside (JSON, forms). Throws RangeError naming the range and its path: not a list,
 * a bad path, a non-number, low above high, the model's own value outside the range, a repeated path,
 * more than MAX_RANGED_INPUTS, or an end value that makes the member itself invalid.
 */
export function resolveRanges(model: MemberModel, raw: unknown): ResolvedRange[] {
  if (!Array.isArray(raw)) throw new RangeError(`ranges must be a list of { "path", "low", "high" }, got ${describe(raw)}`);
  if (raw.length > MAX_RANGED_INPUTS) {
    throw new RangeError(`ranges: at most ${MAX_RANGED_INPUTS} ranged inputs (2^${MAX_RANGED_INPUTS} = ${2 ** MAX_RANGED_INPUTS} corners), got ${raw.length}; keep the ones that matter most`);
  }
  const seen = new Set<string>();
  return raw.map((r, i) => {
    const name = `ranges[${i}]`;
    if (typeof r !== 'object' || r === null || Array.isArray(r)) throw new RangeError(`${name} must be an object { "path", "low", "high" }, got ${describe(r)}`);
    const o = r as Record<string, unknown>;
    for (const k of Object.keys(o)) if (!['path', 'low', 'high'].includes(k)) throw new RangeError(`${name}.${k} is not a known field (expected path, low, high)`);
    if (typeof o.path !== 'string') throw new RangeError(`${name}.path must be a string such as "masses.0.massKg", got ${describe(o.path)}`);
    const keys = pathKeys(o.path);
    if (typeof keys === 'string') throw new RangeError(`${name}: ${keys}`);
    const path = keys.join('.');
    const got = getNumberAt(model, path);
    if (!got.ok) throw new RangeError(`${name}: ${got.message}`);
    for (const end of ['low', 'high'] as const) {
      if (typeof o[end] !== 'number' || !Number.isFinite(o[end])) throw new RangeError(`${name}.${end} (${path}) must be a finite number, got ${describe(o[end])}`);
    }
    const low = o.low as number;
    const high = o.high as number;
    if (low > high) throw new RangeError(`${name} (${path}): low ${low} is above high ${high}`);
    const likely = got.value;
    if (likely < low || likely > high) {
      throw new RangeError(`${name} (${path}): the member's own value ${likely} lies outside [${low}, ${high}]; the likely value must lie within the range`);
    }
    if (seen.has(path)) throw new RangeError(`${name} (${path}): this path is ranged twice`);
    seen.add(path);
    for (const [end, v] of [['low', low], ['high', high]] as const) {
      try {
        parseMemberModel(withNumberAt(model, path, v));
      } catch (e) {
        throw new RangeError(`${name} (${path}) ${end} ${v} makes the member invalid: ${e instanceof Error ? e.message : String(e)}`);
      }
    }
    return { path, low, high, likely };
  });
}

/**
 * Checks inputs of a parametric band (`parametricBand`): names are labels, not paths, and `modelAt` builds the
 * member at a setting. Throws RangeError naming the input.
 */
export function checkParametricInputs(inputs: readonly ResolvedRange[], modelAt: (x: ArrayLike<number>) => MemberModel): void {
  if (inputs.length > MAX_RANGED_INPUTS) {
    throw new RangeError(`ranges: at most ${MAX_RANGED_INPUTS} ranged inputs (2^${MAX_RANGED_INPUTS} = ${2 ** MAX_RANGED_INPUTS} corners), got ${inputs.length}; keep the ones that matter most`);
  }
  const seen = new Set<string>();
  const likely = inputs.map((r) => r.likely);
  inputs.forEach((r, i) => {
    const name = `ranges[${i}] (${r.path})`;
    for (const end of ['low', 'likely', 'high'] as const) {
      if (!Number.isFinite(r[end])) throw new RangeError(`${name}: ${end} must be a finite number, got ${describe(r[end])}`);
    }
    if (r.low > r.high) throw new RangeError(`${name}: low ${r.low} is above high ${r.high}`);
    if (r.likely < r.low || r.likely > r.high) throw new RangeError(`${name}: the likely value ${r.likely} lies outside [${r.low}, ${r.high}]`);
    if (seen.has(r.path)) throw new RangeError(`${name}: this input is ranged twice`);
    seen.add(r.path);
    for (const end of ['low', 'high'] as const) {
      const x = likely.slice();
      x[i] = r[end];
      try {
        parseMemberModel(modelAt(x));
      } catch (e) {
        throw new RangeError(`${name} ${end} ${r[end]} makes the member invalid: ${e instanceof Error ? e.message : String(e)}`);
      }
    }
  });
}
