/**
 * The member solved at many settings of its ranged inputs, cheaply and reproducibly:
 * - one mesh for every setting: the element count the adaptive solve converged to at the likely inputs
 *   (0.05 % by default), without further refinement, so the frequency varies smoothly with the inputs
 *   instead of jumping where the refinement would stop at another level (a model that already turns
 *   refinement off keeps its own mesh);
 * - section-solver added masses remembered by section input across settings (only ranged inputs that
 *   change the section or its surroundings cause new section solves);
 * - every setting's frequencies kept in flat arrays, and a count of solves against a budget.
 */
import type { MemberModel } from '../beam/model';
import type { MemberFailureReason, MemberResult, ModeSetResult } from '../beam/result';
import { defaultSectionSolver, type SectionSolver, type SectionSolverOutcome } from '../beam/section-bridge';
import { solveMember } from '../beam/solve-member';
import { withNumbersAt } from './paths';

/** Points in the shape grid used to compare mode shapes between settings. */
export const SHAPE_GRID = 48;

/**
 * A section solver that remembers its answers by geometry across settings. Added mass from potential flow
 * is the liquid density times a purely geometric integral (classical: H. Lamb, Hydrodynamics), so the
 * geometry is solved once at unit density and scaled, and a ranged liquid density costs no section solves.
 */
export function rememberingSectionSolver(inner: SectionSolver = defaultSectionSolver): SectionSolver {
  const memo = new Map<string, SectionSolverOutcome>();
  return (input) => {
    const rho = input.liquidDensityKgPerM3;
    const unit = { ...input, liquidDensityKgPerM3: 1 };
    const key = JSON.stringify(unit);
    let out = memo.get(key);
    if (!out) {
      out = inner(unit);
      memo.set(key, out);
    }
    if (!out.ok) return out;
    return { ok: true, result: { ...out.result, addedMass: out.result.addedMass.map((row) => row.map((v) => v * rho)) } };
  };
}

export type EvalFailure = { ok: false; reason: MemberFailureReason | 'invalid-input'; message: string };

/** One setting solved: frequencies (modes per state) and optional shapes on the common grid. */
export interface Evaluation {
  ok: true;
  /** Index of this setting in the store. */
  index: number;
  result: MemberResult;
}

/**
 * Flat store of every solved setting.
 * xs: point-major, k values per point (ranged inputs in range order);
 * dry / wet: point-major, `modes` frequencies per point, Hz, ascending (band mode j = j-th lowest).
 */
export class EvaluationStore {
  xs: Float64Array;
  dry: Float64Array;
  wet: Float64Array;
  count = 0;
  constructor(
    readonly k: number,
    readonly modes: number,
    readonly hasWet: boolean,
  ) {
    this.xs = new Float64Array(64 * Math.max(k, 1));
    this.dry = new Float64Array(64 * modes);
    this.wet = new Float64Array(hasWet ? 64 * modes : 0);
  }

  add(x: ArrayLike<number>, result: MemberResult): number {
    if ((this.count + 1) * this.modes > this.dry.length) {
      const grow = (a: Float64Array) => {
        const b = new Float64Array(a.length * 2);
        b.set(a);
        return b;
      };
      this.xs = grow(this.xs);
      this.dry = grow(this.dry);
      if (this.hasWet) this.wet = grow(this.wet);
    }
    const i = this.count++;
    for (let j = 0; j < this.k; j++) this.xs[i * this.k + j] = x[j];
    for (let j = 0; j < this.modes; j++) {
      this.dry[i * this.modes + j] = result.dry.frequenciesHz[j];
      if (this.hasWet) this.wet[i * this.modes + j] = result.wet!.frequenciesHz[j];
    }
    return i;
  }

  frequency(point: number, state: 'dry' | 'wet', mode: number): number {
    return (state === 'dry' ? this.dry : this.wet)[point * this.modes + mode];
  }

  point(i: number): number[] {
    return Array.from(this.xs.subarray(i * this.k, (i + 1) * this.k));
  }
}

/** Mode shapes of one state resampled on SHAPE_GRID equally spaced points: mode-major, SHAPE_GRID per mode. */
export function gridShapes(set: ModeSetResult, lengthM: number): Float64Array {
  const out = new Float64Array(set.modes.length * SHAPE_GRID);
  set.modes.forEach((m, j) => {
    const z = m.shape.zM;
    const w = m.shape.displacement;
    let s = 0;
    for (let g = 0; g < SHAPE_GRID; g++) {
      const zg = (lengthM * g) / (SHAPE_GRID - 1);
      while (s < z.length - 2 && z[s + 1] < zg) s++;
      const span = z[s + 1] - z[s];
      const t = span > 0 ? Math.min(1, Math.max(0, (zg - z[s]) / span)) : 0;
      out[j * SHAPE_GRID + g] = w[s] + t * (w[s + 1] - w[s]);
    }
  });
  return out;
}

/**
 * The member at a setting of the ranged inputs (values in range order, SI). The default sets the numbers at
 * the ranges' paths; a caller whose inputs each drive several model numbers (a form field such as a fixity
 * depth, which moves the length and every landmark) rebuilds the whole model instead.
 */
export type ModelAt = (x: ArrayLike<number>) => MemberModel;

/** The model with its mesh held at `elements` without refinement (a model that turns refinement off keeps its own). */
export function withFixedMesh(model: MemberModel, elements: number): MemberModel {
  const own = model.mesh;
  return own?.refine === false ? model : { ...model, mesh: { ...own, initialElements: elements, refine: false } };
}

/** Solves the member at settings of the ranged inputs, within a budget of solves. */
export class MemberEvaluator {
  readonly store: EvaluationStore;
  solves = 0;
  /** Settings solved so far, by their values joined with commas. */
  private readonly seen = new Map<string, Evaluation>();
  private readonly solver: SectionSolver;
  private readonly modelAt: ModelAt;

  constructor(
    model: MemberModel,
    readonly paths: readonly string[],
    likely: MemberResult,
    readonly maxSolves: number,
    sectionSolver?: SectionSolver,
    modelAt?: ModelAt,
  ) {
    this.solver = sectionSolver ?? rememberingSectionSolver();
    const elements = likely.mesh.elements;
    if (modelAt) {
      this.modelAt = (x) => withFixedMesh(modelAt(x), elements);
    } else {
      const fixed = withFixedMesh(model, elements);
      this.modelAt = (x) => withNumbersAt(fixed, paths, x);
    }
    this.store = new EvaluationStore(paths.length, likely.modesRequested, likely.wet !== null);
  }

  get budgetLeft(): number {
    return this.maxSolves - this.solves;
  }

  /**
   * Solves at x (values of the ranged inputs, in range order) and stores the frequencies. A setting solved
   * before (a corner or axis point met again by a line search) is answered from the store: no solve, no budget.
   */
  solve(x: ArrayLike<number>): Evaluation | EvalFailure {
    const key = Array.prototype.join.call(x, ',');
    const seen = this.seen.get(key);
    if (seen) return seen;
    this.solves++;
    let out;
    try {
      out = solveMember(this.modelAt(x), { sectionSolver: this.solver });
    } catch (e) {
      return { ok: false, reason: 'invalid-input', message: this.where(x, e instanceof Error ? e.message : String(e)) };
    }
    if (!out.ok) return { ok: false, reason: out.reason, message: this.where(x, out.message) };
    const done: Evaluation = { ok: true, index: this.store.add(x, out.result), result: out.result };
    this.seen.set(key, done);
    return done;
  }

  /** "at liquid.toM = 7.5, masses.0.massKg = 900: <message>" */
  where(x: ArrayLike<number>, message: string): string {
    const at = this.paths.map((p, i) => `${p} = ${x[i]}`).join(', ');
    return `at ${at}: ${message}`;
  }
}
