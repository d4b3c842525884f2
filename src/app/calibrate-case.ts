/**
 * Back-calculation of one form field of a case from a measured natural frequency. The field may drive many
 * numbers of the member model (a fixity depth moves the length and every landmark, a growth thickness every
 * growth segment), so the member is rebuilt by the kind's own builder at each trial value, as the band does
 * (`valuesAt`). The search follows the core's `calibrate` on a model path: scan the range, close in on each
 * sign change with Brent's root search (R.P. Brent, Algorithms for Minimization without Derivatives, 1973,
 * ch. 4), refuse when no value or more than one value fits, and walk out from the root to the values whose
 * frequency lies within the measurement's uncertainty. One fixed mesh for every trial (the finer of the
 * adaptive meshes at the two ends), so the frequency varies smoothly with the field and Brent converges.
 */
import type { Case, CaseMeasurement } from '../case';
import { fieldUnit } from '../forms/read';
import type { FieldValues, QuantityField } from '../forms/types';
import { valuesAt } from '../forms/ranges';
import { kindOf } from '../kinds/registry';
import type { MemberModel } from '../physics/beam/model';
import type { MemberResult } from '../physics/beam/result';
import { solveMember } from '../physics/beam/solve-member';
import { brentZero } from '../physics/uncertain/brent';
import { rememberingSectionSolver } from '../physics/uncertain/evaluate';
import { unitFactor } from '../units';

export type CalibrateCase = Pick<Case, 'kind' | 'inputs' | 'unitSystem'>;

export interface FieldUnknown {
  /** Form field key, e.g. "fixityDepth". */
  key: string;
  /** Search range, SI. */
  low: number;
  high: number;
}

export type FieldCalibration =
  | {
      ok: true;
      key: string;
      /** The calibrated value, SI. */
      value: number;
      /** Values whose frequency is within the measured ± uncertainty, SI; `clipped` when it reaches the range end. */
      interval: [number, number];
      clipped: { low: boolean; high: boolean };
      reachableHz: [number, number];
      /** The form's values with the field set to the calibrated value (in the field's unit). */
      inputs: FieldValues;
      modelFrequencyHz: number;
      result: MemberResult;
      solves: number;
    }
  | { ok: false; reason: 'no-fit'; message: string; reachableHz: [number, number] }
  | { ok: false; reason: 'more-than-one-fits'; message: string; roots: number[]; reachableHz: [number, number] }
  | { ok: false; reason: 'invalid-input' | 'solve-failed'; message: string };

type Measured = Pick<CaseMeasurement, 'frequencyHz' | 'uncertaintyHz' | 'mode' | 'state'>;

const SCAN = 24;

export function calibrateField(c: CalibrateCase, measured: Measured, unknown: FieldUnknown): FieldCalibration {
  const form = kindOf(c.kind).form;
  const field = form.fields.find((f) => f.key === unknown.key);
  if (!field || field.type !== 'quantity') return { ok: false, reason: 'invalid-input', message: `${unknown.key} is not a number field of this member` };
  const { low, high } = unknown;
  if (!Number.isFinite(low) || !Number.isFinite(high) || !(low < high)) return { ok: false, reason: 'invalid-input', message: `the search range of ${field.label} must have low below high` };
  const unit = fieldUnit(field as QuantityField, c.unitSystem);
  const range = [{ key: unknown.key, label: field.label, unit, low, likely: low, high }];
  const inputsAt = (x: number): FieldValues => valuesAt(form.fields, c.inputs, range, [x], c.unitSystem);
  const modelAt = (x: number): MemberModel | string => {
    const r = form.build(inputsAt(x), c.unitSystem);
    if (!r.ok) return Object.values(r.errors)[0] ?? 'the member does not read';
    if (r.build.engine === 'plate') return 'a plate panel is not calibrated here';
    return { ...r.build.model, modes: Math.max(r.build.model.modes ?? 4, measured.mode) };
  };
  const sectionSolver = rememberingSectionSolver();
  const j = measured.mode - 1;
  const fm = measured.frequencyHz;
  let failure: string | null = null;
  let solves = 0;
  const solveAt = (x: number, elements?: number): MemberResult | null => {
    const m = modelAt(x);
    if (typeof m === 'string') {
      failure = `at ${field.label} = ${x / unitFactor(unit)} ${unit}: ${m}`;
      return null;
    }
    const model = elements ? { ...m, mesh: { ...m.mesh, initialElements: elements, refine: false } } : m;
    solves++;
    const out = solveMember(model, { sectionSolver });
    if (!out.ok) {
      failure = `at ${field.label} = ${x / unitFactor(unit)} ${unit}: ${out.message}`;
      return null;
    }
    return out.result;
  };
  const freqOf = (r: MemberResult): number => {
    const set = measured.state === 'dry' ? r.dry : r.wet;
    return set ? set.frequenciesHz[j] ?? NaN : NaN;
  };
  const ends = [solveAt(low), solveAt(high)];
  if (failure || !ends[0] || !ends[1]) return { ok: false, reason: 'solve-failed', message: failure ?? 'the member could not be solved' };
  if (measured.state === 'wet' && !ends[0].wet) return { ok: false, reason: 'invalid-input', message: 'the measurement is wet but the member has no liquid' };
  const elements = Math.max(ends[0].mesh.elements, ends[1].mesh.elements);
  const freq = (x: number): number => {
    if (failure) return NaN;
    const r = solveAt(x, elements);
    return r ? freqOf(r) : NaN;
  };
  const xs = Array.from({ length: SCAN + 1 }, (_, i) => (i === SCAN ? high : low + ((high - low) * i) / SCAN));
  const fs = xs.map(freq);
  if (failure) return { ok: false, reason: 'solve-failed', message: failure };
  const reachableHz: [number, number] = [Math.min(...fs), Math.max(...fs)];
  const brackets: [number, number][] = [];
  for (let i = 0; i < SCAN; i++) {
    const g0 = fs[i] - fm;
    const g1 = fs[i + 1] - fm;
    if (g0 === 0 || (g0 < 0) !== (g1 < 0)) brackets.push([xs[i], xs[i + 1]]);
  }
  const tol = 1e-9 * (high - low);
  const roots: number[] = [];
  for (const [a, b] of brackets) {
    const r = brentZero((x) => freq(x) - fm, a, b, { xTolerance: tol });
    if (failure) return { ok: false, reason: 'solve-failed', message: failure };
    if (r.ok && !roots.some((x) => Math.abs(x - r.x) <= 1e-7 * (high - low))) roots.push(r.x);
  }
  const show = (x: number) => `${Number((x / unitFactor(unit)).toPrecision(4))} ${unit}`;
  const hz = (x: number) => `${Number(x.toPrecision(4))} Hz`;
  if (roots.length === 0) {
    return {
      ok: false,
      reason: 'no-fit',
      message: `no value of ${field.label} from ${show(low)} to ${show(high)} fits: mode ${measured.mode} (${measured.state}) reaches only ${hz(reachableHz[0])} to ${hz(reachableHz[1])} over that range, and ${hz(fm)} was measured`,
      reachableHz,
    };
  }
  if (roots.length > 1) {
    return {
      ok: false,
      reason: 'more-than-one-fits',
      message: `more than one value of ${field.label} gives ${hz(fm)}: ${roots.map(show).join(', ')}; narrow the range or measure another mode`,
      roots,
      reachableHz,
    };
  }
  const value = roots[0];
  const u = measured.uncertaintyHz;
  const edge = (dir: -1 | 1): { x: number; clipped: boolean } => {
    if (u === 0) return { x: value, clipped: false };
    let inner = value;
    const order = dir < 0 ? xs.map((_, i) => SCAN - i) : xs.map((_, i) => i);
    for (const i of order) {
      if (dir < 0 ? xs[i] >= value : xs[i] <= value) continue;
      if (Math.abs(fs[i] - fm) > u) {
        const r = brentZero((x) => Math.abs(freq(x) - fm) - u, Math.min(inner, xs[i]), Math.max(inner, xs[i]), { xTolerance: tol });
        return { x: r.ok ? r.x : inner, clipped: false };
      }
      inner = xs[i];
    }
    return { x: dir < 0 ? low : high, clipped: true };
  };
  const left = edge(-1);
  const right = edge(1);
  const inputs = inputsAt(value);
  const final = solveAt(value);
  if (failure || !final) return { ok: false, reason: 'solve-failed', message: failure ?? 'the calibrated member could not be solved' };
  return {
    ok: true,
    key: unknown.key,
    value,
    interval: [left.x, right.x],
    clipped: { low: left.clipped, high: right.clipped },
    reachableHz,
    inputs,
    modelFrequencyHz: freqOf(final),
    result: final,
    solves,
  };
}
