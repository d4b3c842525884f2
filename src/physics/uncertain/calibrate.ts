/**
 * Back-calculation of one unknown input from a measured natural frequency: the value of the input (a dotted
 * path into the member model, searched over [low, high]) at which the chosen mode, dry or wet, has the
 * measured frequency; the interval of values matching the measurement's uncertainty; then the member
 * re-solved at that value. The range is scanned first (so several roots and a frequency that turns back
 * are seen), each sign change is closed in by Brent's root search (R.P. Brent, Algorithms for Minimization
 * without Derivatives, 1973, ch. 4), and each turning point is refined by his minimiser (ch. 5) in case the
 * measured frequency is reached between two scan points. Inverting a measured frequency for a hidden
 * input is how scour is detected at piles (L.J. Prendergast, D. Hester, K. Gavin, J.J. O'Sullivan,
 * J. Sound Vib. 332 (2013) 6685).
 */
import type { MemberModel } from '../beam/model';
import type { MemberFailureReason, MemberResult } from '../beam/result';
import type { SectionSolver } from '../beam/section-bridge';
import { DEFAULT_MODES, solveMember } from '../beam/solve-member';
import { MAX_MODES, parseMemberModel } from '../beam/validate';
import { brentMinimum, brentZero } from './brent';
import { MemberEvaluator, rememberingSectionSolver } from './evaluate';
import { getNumberAt, pathKeys, withNumberAt } from './paths';

export interface Measurement {
  frequencyHz: number;
  /** ± this, Hz (≥ 0). */
  uncertaintyHz: number;
  /** 1-based mode number (k-th lowest frequency). */
  mode: number;
  state: 'dry' | 'wet';
}

export interface Unknown {
  path: string;
  low: number;
  high: number;
}

export interface CalibrationOptions {
  /** Scan intervals over the range (default 32). */
  scanIntervals?: number;
  sectionSolver?: SectionSolver;
}

export type CalibrationOutcome =
  | {
      ok: true;
      path: string;
      value: number;
      /** Values whose frequency lies within the measurement's ± uncertainty (the connected stretch around `value`). */
      interval: [number, number];
      /** The interval reaches the end of the search range (the uncertainty allows values beyond it). */
      intervalClipped: { low: boolean; high: boolean };
      /** The chosen mode's frequency of the re-solved member at `value` (adaptive mesh), Hz. */
      modelFrequencyHz: number;
      /** Lowest and highest frequency of the chosen mode over the search range, Hz. */
      reachableHz: [number, number];
      /** The member re-solved at the calibrated value. */
      result: MemberResult;
      model: MemberModel;
      solves: number;
    }
  | { ok: false; reason: 'no-fit'; message: string; reachableHz: [number, number]; solves: number }
  | { ok: false; reason: 'more-than-one-fits'; message: string; roots: number[]; reachableHz: [number, number]; solves: number }
  | { ok: false; reason: MemberFailureReason | 'invalid-input'; message: string };

function finite(v: unknown, name: string, ok: (x: number) => boolean, expected: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || !ok(v)) throw new RangeError(`${name} must be ${expected}, got ${v === undefined ? 'nothing' : JSON.stringify(v)}`);
  return v;
}

/** Checks the measurement and the unknown (throws RangeError naming the field). */
export function checkCalibrationInput(model: MemberModel, measured: Measurement, unknown: Unknown): { measured: Measurement; unknown: Unknown } {
  if (typeof measured !== 'object' || measured === null) throw new RangeError('measured must be an object { frequencyHz, uncertaintyHz, mode, state }');
  if (typeof unknown !== 'object' || unknown === null) throw new RangeError('unknown must be an object { path, low, high }');
  const f = finite(measured.frequencyHz, 'measured.frequencyHz', (x) => x > 0, 'a finite number > 0');
  const u = finite(measured.uncertaintyHz ?? 0, 'measured.uncertaintyHz', (x) => x >= 0 && x < f, `a finite number ≥ 0 and below the frequency ${f}`);
  const mode = finite(measured.mode ?? 1, 'measured.mode', (x) => Number.isInteger(x) && x >= 1 && x <= MAX_MODES, `an integer from 1 to ${MAX_MODES}`);
  const state = measured.state ?? 'wet';
  if (state !== 'dry' && state !== 'wet') throw new RangeError(`measured.state must be "dry" or "wet", got ${JSON.stringify(state)}`);
  if (state === 'wet' && !model.liquid) throw new RangeError('measured.state is "wet" but the member has no liquid: give the liquid or measure "dry"');
  if (typeof unknown.path !== 'string') throw new RangeError(`unknown.path must be a string such as "masses.0.massKg", got ${JSON.stringify(unknown.path)}`);
  const keys = pathKeys(unknown.path);
  if (typeof keys === 'string') throw new RangeError(`unknown: ${keys}`);
  const path = keys.join('.');
  const got = getNumberAt(model, path);
  if (!got.ok) throw new RangeError(`unknown: ${got.message}`);
  const low = finite(unknown.low, `unknown.low (${path})`, () => true, 'a finite number');
  const high = finite(unknown.high, `unknown.high (${path})`, () => true, 'a finite number');
  if (!(low < high)) throw new RangeError(`unknown (${path}): low ${low} must be below high ${high}`);
  for (const [end, v] of [['low', low], ['high', high]] as const) {
    try {
      parseMemberModel(withNumberAt(model, path, v));
    } catch (e) {
      throw new RangeError(`unknown (${path}) ${end} ${v} makes the member invalid: ${e instanceof Error ? e.message : String(e)}`);
    }
  }
  return { measured: { frequencyHz: f, uncertaintyHz: u, mode, state }, unknown: { path, low, high } };
}

export function calibrate(input: MemberModel, rawMeasured: Measurement, rawUnknown: Unknown, options: CalibrationOptions = {}): CalibrationOutcome {
  const parsed = parseMemberModel(input);
  const { measured, unknown } = checkCalibrationInput(parsed, rawMeasured, rawUnknown);
  const model: MemberModel = { ...parsed, modes: Math.max(parsed.modes ?? DEFAULT_MODES, measured.mode) };
  const { path, low, high } = unknown;
  const solver = options.sectionSolver ?? rememberingSectionSolver();
  // One mesh for the whole search: the finer of the adaptive meshes at the two ends of the range.
  let finer: MemberResult | null = null;
  for (const v of [low, high]) {
    const out = solveMember(withNumberAt(model, path, v), { sectionSolver: solver });
    if (!out.ok) return { ok: false, reason: out.reason, message: `at ${path} = ${v}: ${out.message}` };
    if (!finer || out.result.mesh.elements > finer.mesh.elements) finer = out.result;
  }
  const n = options.scanIntervals ?? 32;
  const ev = new MemberEvaluator(model, [path], finer!, 4 * n + 400, solver);
  const j = measured.mode - 1;
  const fm = measured.frequencyHz;
  let failure: { ok: false; reason: MemberFailureReason | 'invalid-input'; message: string } | null = null;
  const freq = (x: number): number => {
    if (failure) return NaN;
    const e = ev.solve([x]);
    if (!e.ok) {
      failure = e;
      return NaN;
    }
    return ev.store.frequency(e.index, measured.state, j);
  };

  const xs = Array.from({ length: n + 1 }, (_, i) => (i === n ? high : low + ((high - low) * i) / n));
  const fs = xs.map(freq);
  if (failure) return failure;
  let lo = Math.min(...fs);
  let hi = Math.max(...fs);
  const brackets: [number, number][] = [];
  for (let i = 0; i < n; i++) {
    const g0 = fs[i] - fm;
    const g1 = fs[i + 1] - fm;
    if (g0 === 0 || (g0 < 0) !== (g1 < 0)) brackets.push([xs[i], xs[i + 1]]);
  }
  if (fs[n] === fm) brackets.push([xs[n], xs[n]]);
  // A frequency that turns back between scan points may reach the measurement there without a sign change.
  for (let i = 1; i < n; i++) {
    const turn = (fs[i] - fs[i - 1]) * (fs[i + 1] - fs[i]);
    if (!(turn < 0)) continue;
    const sense = fs[i] > fs[i - 1] ? -1 : 1;
    const m = brentMinimum((x) => sense * freq(x), xs[i - 1], xs[i + 1], { xTolerance: 1e-9 * (high - low) });
    if (failure) return failure;
    const fx = sense * m.fx;
    lo = Math.min(lo, fx);
    hi = Math.max(hi, fx);
    const sameSide = (fs[i - 1] - fm) * (fs[i + 1] - fm) > 0;
    if (sameSide && (fx - fm) * (fs[i] - fm) < 0) {
      brackets.push([xs[i - 1], m.x], [m.x, xs[i + 1]]);
    }
  }
  const reachableHz: [number, number] = [lo, hi];
  const roots: number[] = [];
  for (const [a, b] of brackets) {
    const r = a === b ? { ok: true as const, x: a } : brentZero((x) => freq(x) - fm, a, b, { xTolerance: 1e-10 * (high - low) });
    if (failure) return failure;
    if (r.ok && !roots.some((x) => Math.abs(x - r.x) <= 1e-8 * (high - low))) roots.push(r.x);
  }
  roots.sort((a, b) => a - b);
  const what = `${measured.state} mode ${measured.mode}`;
  const fmt = (x: number) => Number(x.toPrecision(6));
  if (roots.length === 0) {
    return {
      ok: false,
      reason: 'no-fit',
      message: `no value of ${path} in [${low}, ${high}] fits: the ${what} frequency reaches only ${fmt(lo)} to ${fmt(hi)} Hz over that range, and ${fm} Hz was measured`,
      reachableHz,
      solves: ev.solves,
    };
  }
  if (roots.length > 1) {
    return {
      ok: false,
      reason: 'more-than-one-fits',
      message: `more than one value of ${path} in [${low}, ${high}] gives ${fm} Hz for ${what}: ${roots.map(fmt).join(', ')}; narrow the range or measure another mode`,
      roots,
      reachableHz,
      solves: ev.solves,
    };
  }
  const value = roots[0];
  const u = measured.uncertaintyHz;
  // Walk out from the root along the scan until |f − f_m| exceeds u; close in on the crossing with Brent.
  const edge = (dir: -1 | 1): { x: number; clipped: boolean } => {
    if (u === 0) return { x: value, clipped: false };
    const h = (x: number) => Math.abs(freq(x) - fm) - u;
    let inner = value;
    const order = dir < 0 ? xs.map((_, i) => n - i) : xs.map((_, i) => i);
    for (const i of order) {
      if (dir < 0 ? xs[i] >= value : xs[i] <= value) continue;
      if (Math.abs(fs[i] - fm) > u) {
        const r = brentZero(h, Math.min(inner, xs[i]), Math.max(inner, xs[i]), { xTolerance: 1e-10 * (high - low) });
        return { x: r.ok ? r.x : inner, clipped: false };
      }
      inner = xs[i];
    }
    return { x: dir < 0 ? low : high, clipped: true };
  };
  const left = edge(-1);
  const right = edge(1);
  if (failure) return failure;
  const calibrated = withNumberAt(parsed, path, value);
  const out = solveMember({ ...calibrated, modes: model.modes }, { sectionSolver: solver });
  if (!out.ok) return { ok: false, reason: out.reason, message: `at ${path} = ${value}: ${out.message}` };
  const set = measured.state === 'dry' ? out.result.dry : out.result.wet!;
  return {
    ok: true,
    path,
    value,
    interval: [left.x, right.x],
    intervalClipped: { low: left.clipped, high: right.clipped },
    modelFrequencyHz: set.frequenciesHz[j],
    reachableHz,
    result: out.result,
    model: calibrated,
    solves: ev.solves + 3,
  };
}
