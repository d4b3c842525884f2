/**
 * The frequency band of a member over ranges on its uncertain inputs: for each mode, dry and wet, the
 * frequency at the likely inputs and the lowest and highest over the box of ranges.
 *
 * Method, per mode and state: the corner (vertex) method where the frequency is monotone in every ranged
 * input (then its extremes over the box lie at corners), checked along each input's axis, across the corners
 * and for modes changing order (`monotone.ts`); otherwise a sampled search (`search.ts`). Up to
 * ALL_CORNERS_UP_TO inputs every corner is solved (2^k); beyond, when every axis is monotone, only the
 * corners the axis directions point to, confirmed by 2k samples (any sample beyond them: every corner).
 * Band mode k is the k-th lowest frequency at each setting. Work is bounded: at most MAX_RANGED_INPUTS
 * inputs and `maxSolves` member solves, on the likely answer's converged mesh (`evaluate.ts`).
 */
import type { MemberModel } from '../beam/model';
import type { MemberResult } from '../beam/result';
import type { SectionSolver } from '../beam/section-bridge';
import { solveMember } from '../beam/solve-member';
import { parseMemberModel } from '../beam/validate';
import type { AxisResult, BandMethod, BandOutcome, ModeBand, StateBand } from './band-types';
import { type EvalFailure, gridShapes, MemberEvaluator, type ModelAt, rememberingSectionSolver } from './evaluate';
import { type Axis, axisValues, cornerDirections, crossedModes, type Direction, directionOf, disagree, FLAT_RTOL } from './monotone';
import { checkParametricInputs, type ResolvedRange, resolveRanges } from './ranges';
import { refineExtreme, sampleBox, type SearchTarget, searchWindow } from './search';
import { sensitivityFromAxes } from './sensitivity';

export interface BandOptions {
  /** The answer at the likely inputs, when the caller already has it (saves one adaptive solve). */
  likely?: MemberResult;
  /** Most member solves to spend (default 600). */
  maxSolves?: number;
  /** Latin-hypercube samples for the sampled search (default 16 + 8 per ranged input). */
  samples?: number;
  /** Seed of the samples (default 1), so a band repeats exactly. */
  seed?: number;
  sectionSolver?: SectionSolver;
  /** Solve every corner even beyond ALL_CORNERS_UP_TO inputs (checks, studies). Default false. */
  allCorners?: boolean;
}

export const DEFAULT_MAX_SOLVES = 600;
/** Up to this many ranged inputs every corner is solved (2^4 = 16); beyond, only the corners the axis directions point to. */
export const ALL_CORNERS_UP_TO = 4;

type State = 'dry' | 'wet';

/** Solves along each input's axis through the likely setting. */
function scanAxes(ev: MemberEvaluator, ranges: readonly ResolvedRange[], x0: number[], p0: number, shapes0: { dry: Float64Array; wet: Float64Array | null }): Axis[] | EvalFailure {
  const modes = ev.store.modes;
  const hasWet = ev.store.hasWet;
  const axes: Axis[] = [];
  for (let i = 0; i < ranges.length; i++) {
    const r = ranges[i];
    const values = axisValues(r.low, r.likely, r.high);
    const points: number[] = [];
    const shapes: { dry: Float64Array; wet: Float64Array | null }[] = [];
    for (const v of values) {
      if (v === r.likely) {
        points.push(p0);
        shapes.push(shapes0);
        continue;
      }
      const x = x0.slice();
      x[i] = v;
      const e = ev.solve(x);
      if (!e.ok) return e;
      points.push(e.index);
      shapes.push(shapesOf(e.result));
    }
    const dirs = (state: State): Direction[] =>
      Array.from({ length: modes }, (_, j) => directionOf(points.map((p) => ev.store.frequency(p, state, j))));
    const crossing = (state: State): boolean[] => {
      const out = new Array<boolean>(modes).fill(false);
      for (let s = 1; s < shapes.length; s++) {
        const c = crossedModes(shapes[s - 1][state]!, shapes[s][state]!, modes);
        c.forEach((v, j) => (out[j] ||= v));
      }
      return out;
    };
    axes.push({
      path: r.path,
      values,
      points,
      direction: { dry: dirs('dry'), wet: hasWet ? dirs('wet') : null },
      crossing: { dry: crossing('dry'), wet: hasWet ? crossing('wet') : null },
    });
  }
  return axes;
}

/** Length of the member a result belongs to: its shapes run from z = 0 to the length. */
function resultLengthM(r: MemberResult): number {
  const z = r.dry.modes[0]?.shape.zM;
  return z && z.length > 0 ? z[z.length - 1] : 1;
}

/**
 * Mode shapes on the common grid along each setting's own length, so shapes compare by place along the member
 * even where a ranged input (a fixity depth) changes the length.
 */
function shapesOf(r: MemberResult): { dry: Float64Array; wet: Float64Array | null } {
  const L = resultLengthM(r);
  return { dry: gridShapes(r.dry, L), wet: r.wet ? gridShapes(r.wet, L) : null };
}

/** Corner method or not, and why, for one mode of one state. */
function judgeMode(axes: readonly Axis[], corners: (i: number) => Direction, state: State, j: number): { method: BandMethod; reason: string } {
  for (let i = 0; i < axes.length; i++) {
    const a = axes[i];
    if (a.crossing[state]![j]) return { method: 'sampled', reason: `mode order changes along ${a.path} (modes cross)` };
    const along = a.direction[state]![j];
    if (along === 'non-monotone') return { method: 'sampled', reason: `not monotone in ${a.path} along its range` };
    const across = corners(i);
    if (across === 'non-monotone' || disagree(along, across)) {
      return { method: 'sampled', reason: `${a.path} moves it different ways at different corners (inputs interact)` };
    }
  }
  return { method: 'corners', reason: 'monotone in every ranged input (axis and corner checks)' };
}

function modeList(list: number[]): string {
  return list.map((j) => j + 1).join(', ');
}

/**
 * The band over `ranges` (from outside: checked here). Throws RangeError for invalid input (member or
 * ranges, messages naming the field or path); a solve that fails at some setting is `{ ok: false }` naming it.
 */
export function memberBand(input: MemberModel, rawRanges: unknown, options: BandOptions = {}): BandOutcome {
  const model = parseMemberModel(input);
  const ranges = resolveRanges(model, rawRanges);
  return bandOver(model, ranges, undefined, options);
}

/**
 * The band over inputs that are not single numbers of the model: each ranged input (named by `path`, any
 * label) may drive several model numbers, and `modelAt(x)` builds the whole member at a setting x (values in
 * range order). `model` is the member at the likely values (`modelAt` of the likely values). Throws RangeError
 * naming the input for a non-finite end, low above high, a likely value outside its range, more than
 * MAX_RANGED_INPUTS inputs, or an end at which the member is invalid.
 */
export function parametricBand(input: MemberModel, inputs: readonly ResolvedRange[], modelAt: ModelAt, options: BandOptions = {}): BandOutcome {
  const model = parseMemberModel(input);
  checkParametricInputs(inputs, modelAt);
  return bandOver(model, inputs, modelAt, options);
}

function bandOver(model: MemberModel, ranges: readonly ResolvedRange[], modelAt: ModelAt | undefined, options: BandOptions): BandOutcome {
  const k = ranges.length;
  const maxSolves = options.maxSolves ?? DEFAULT_MAX_SOLVES;
  const needed = 1 + 4 * k + 2 ** k;
  if (!(maxSolves >= needed)) throw new RangeError(`maxSolves must be at least ${needed} for ${k} ranged inputs (axes and corners), got ${maxSolves}`);
  const solver = options.sectionSolver ?? rememberingSectionSolver();
  let likely = options.likely;
  if (!likely) {
    const out = solveMember(model, { sectionSolver: solver });
    if (!out.ok) return out;
    likely = out.result;
  }
  const ev = new MemberEvaluator(model, ranges.map((r) => r.path), likely, maxSolves, solver, modelAt);
  const modes = ev.store.modes;
  const hasWet = ev.store.hasWet;
  const states: State[] = hasWet ? ['dry', 'wet'] : ['dry'];

  const x0 = ranges.map((r) => r.likely);
  const e0 = ev.solve(x0);
  if (!e0.ok) return e0;
  const axes = scanAxes(ev, ranges, x0, e0.index, shapesOf(e0.result));
  if (!Array.isArray(axes)) return axes;

  // Extremes over every stored setting so far, per state and mode.
  const extremes = (st: State, j: number): [number, number] => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let p = 0; p < ev.store.count; p++) {
      const f = ev.store.frequency(p, st, j);
      lo = Math.min(lo, f);
      hi = Math.max(hi, f);
    }
    return [lo, hi];
  };
  const outside = (before: [number, number], after: [number, number]) => after[0] < before[0] * (1 - FLAT_RTOL) || after[1] > before[1] * (1 + FLAT_RTOL);
  const judged = { dry: [] as { method: BandMethod; reason: string }[], wet: [] as { method: BandMethod; reason: string }[] };
  let cornersUsed = 0;
  // Many inputs, all monotone along their axes: solve only the corners the directions point to, and confirm
  // with a few samples that nothing inside the box goes beyond them (else fall back to every corner).
  const allMonotone = states.every((st) => axes.every((a) => a.direction[st]!.every((d) => d !== 'non-monotone') && a.crossing[st]!.every((c) => !c)));
  if (k > ALL_CORNERS_UP_TO && allMonotone && !options.allCorners) {
    const masks = new Set<number>();
    for (const st of states) {
      for (let j = 0; j < modes; j++) {
        let lo = 0;
        let hi = 0;
        axes.forEach((a, i) => {
          const d = a.direction[st]![j];
          if (d === 'down') lo |= 1 << i;
          if (d === 'up') hi |= 1 << i;
        });
        masks.add(lo).add(hi);
      }
    }
    for (const c of masks) {
      const e = ev.solve(ranges.map((r, i) => (c & (1 << i) ? r.high : r.low)));
      if (!e.ok) return e;
    }
    const before = states.map((st) => Array.from({ length: modes }, (_, j) => extremes(st, j)));
    const checks = 2 * k;
    const failed = sampleBox(ev, ranges, checks, (options.seed ?? 1) + 7919);
    if (failed) return failed;
    if (states.every((st, si) => before[si].every((b, j) => !outside(b, extremes(st, j))))) {
      cornersUsed = masks.size;
      const reason = `monotone in every ranged input along its axis; extremes at the corners its directions point to, confirmed by ${checks} samples`;
      for (const st of states) for (let j = 0; j < modes; j++) judged[st].push({ method: 'corners', reason });
    }
  }
  if (cornersUsed === 0) {
    const cornerPoints: number[] = [];
    for (let c = 0; c < 2 ** k; c++) {
      const e = ev.solve(ranges.map((r, i) => (c & (1 << i) ? r.high : r.low)));
      if (!e.ok) return e;
      cornerPoints.push(e.index);
    }
    cornersUsed = 2 ** k;
    for (const st of states) {
      const dirs = ranges.map((_, i) => cornerDirections(ev.store, cornerPoints, i, st));
      judged[st] = Array.from({ length: modes }, (_, j) => judgeMode(axes, (i) => dirs[i][j], st, j));
    }
  }

  // Where a mode needs it, sample the box and refine that mode's extremes.
  const notes: string[] = [];
  const anySampled = () => states.some((st) => judged[st].some((m) => m.method === 'sampled'));
  let sampleCount = 0;
  if (anySampled()) {
    const before = states.map((st) => Array.from({ length: modes }, (_, j) => extremes(st, j)));
    sampleCount = Math.min(options.samples ?? 16 + 8 * k, ev.budgetLeft);
    const failed = sampleBox(ev, ranges, sampleCount, options.seed ?? 1);
    if (failed) return failed;
    // A sample outside the corner band of a mode judged monotone shows a turn the checks missed.
    states.forEach((st, si) => {
      for (let j = 0; j < modes; j++) {
        if (judged[st][j].method === 'corners' && outside(before[si][j], extremes(st, j))) {
          judged[st][j] = { method: 'sampled', reason: 'a sample inside the ranges fell outside the corner band' };
        }
      }
    });
    const targets: SearchTarget[] = [];
    for (let j = 0; j < modes; j++) for (const st of states) if (judged[st][j].method === 'sampled') targets.push({ state: st, mode: j });
    const spacing = searchWindow(ev.store.count, k);
    for (const t of targets) {
      for (const sense of [1, -1] as const) {
        const failed2 = refineExtreme(ev, ranges, t, sense, spacing);
        if (failed2) return failed2;
      }
    }
  }
  const budgetExhausted = ev.budgetLeft <= 0;
  if (budgetExhausted) notes.push(`The sampled search stopped at the budget of ${maxSolves} solves: its band may be slightly narrower than the true one.`);
  notes.push(`Band solves use the likely answer's converged mesh (${likely.mesh.elements} elements) without further refinement.`);
  notes.push('Band mode k is the k-th lowest frequency at each setting of the inputs.');

  const stateBand = (s: State): StateBand => {
    const list: ModeBand[] = [];
    for (let j = 0; j < modes; j++) {
      const likelyHz = (s === 'dry' ? likely!.dry : likely!.wet!).frequenciesHz[j];
      let lo = 0;
      let hi = 0;
      for (let p = 1; p < ev.store.count; p++) {
        if (ev.store.frequency(p, s, j) < ev.store.frequency(lo, s, j)) lo = p;
        if (ev.store.frequency(p, s, j) > ev.store.frequency(hi, s, j)) hi = p;
      }
      const m = judged[s][j];
      const reason = m.method === 'sampled' ? `${m.reason}; ${sampleCount} seeded Latin-hypercube samples and line searches by Brent's minimiser` : m.reason;
      list.push({
        mode: j + 1,
        likelyHz,
        // The likely answer (adaptive mesh) belongs to the band too.
        lowHz: Math.min(likelyHz, ev.store.frequency(lo, s, j)),
        highHz: Math.max(likelyHz, ev.store.frequency(hi, s, j)),
        method: m.method,
        reason,
        lowAt: ev.store.point(lo),
        highAt: ev.store.point(hi),
      });
    }
    return { likelyHz: list.map((m) => m.likelyHz), lowHz: list.map((m) => m.lowHz), highHz: list.map((m) => m.highHz), modes: list };
  };

  const sampledModes = (s: State) => judged[s].flatMap((m, j) => (m.method === 'sampled' ? [j] : []));
  const allSampled = states.every((s) => sampledModes(s).length === modes);
  const noneSampled = states.every((s) => sampledModes(s).length === 0);
  const methodText = noneSampled
    ? `corners: every mode is monotone in every ranged input (${cornersUsed} of ${2 ** k} corners solved)`
    : `sampled search (${sampleCount} seeded Latin-hypercube samples, then Brent line searches) for ${states
        .filter((s) => sampledModes(s).length > 0)
        .map((s) => `${s} mode${sampledModes(s).length > 1 ? 's' : ''} ${modeList(sampledModes(s))}`)
        .join(' and ')}${allSampled ? '' : `; corners (${cornersUsed} of ${2 ** k}) for the others`}`;

  const axisResults: AxisResult[] = axes.map((a) => ({
    path: a.path,
    values: a.values,
    dryHz: a.points.map((p) => Array.from({ length: modes }, (_, j) => ev.store.frequency(p, 'dry', j))),
    wetHz: hasWet ? a.points.map((p) => Array.from({ length: modes }, (_, j) => ev.store.frequency(p, 'wet', j))) : null,
    direction: a.direction,
  }));
  return {
    ok: true,
    band: {
      ranges: ranges.slice(),
      dry: stateBand('dry'),
      wet: hasWet ? stateBand('wet') : null,
      method: noneSampled ? 'corners' : allSampled ? 'sampled' : 'mixed',
      methodText,
      sensitivity: sensitivityFromAxes(ranges, axisResults),
      axes: axisResults,
      solves: ev.solves,
      maxSolves,
      budgetExhausted,
      notes,
      likely,
    },
  };
}
