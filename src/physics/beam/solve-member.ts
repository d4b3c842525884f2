/**
 * The member modal engine: dry and wet natural frequencies of a non-uniform member.
 * Builds the mesh, checks restraint and buckling, solves the banded eigenproblem dry and wet, and doubles
 * the mesh until every requested mode changes by less than the tolerance (0.05 % by default).
 */
import { type AddedMassPlan, planAddedMass, type SectionCache } from './added-mass';
import { assembleMember, type MemberSystem } from './assemble';
import { breakpointsWithMerges, buildMesh, initialCounts, MIN_INTERVAL_FRACTION, refineCounts, roundingErrorEstimate } from './mesh';
import { mergeEqualSegments } from './merge-segments';
import { resultSanity } from './sanity';
import type { MemberModel } from './model';
import { checkStiffness, meshModes, modeResult, wetMass } from './modes';
import { isMechanism, MECHANISM_MESSAGE } from './restraint';
import type { MemberOutcome, MemberResult, ModeSetResult } from './result';
import { defaultSectionSolver, SECTION_PANELS_MAX, type SectionSolver } from './section-bridge';
import { parseMemberModel } from './validate';
import { highFrequencyWarning, memberWarnings } from './warnings';
import { massZones } from './zones';

export interface SolveMemberOptions {
  /** 2D added-mass solver for confined sections (default: the section solver of src/physics/section). */
  sectionSolver?: SectionSolver;
}

export const DEFAULT_MODES = 5;
export const DEFAULT_RELATIVE_TOLERANCE = 5e-4;
export const DEFAULT_MAX_ELEMENTS = 3200;
/**
 * Largest estimated relative rounding error of the frequencies a mesh may carry (0.01 %, a fifth of the
 * default convergence tolerance): finer meshes are refused, and refinement stops before reaching them.
 */
export const PRECISION_LIMIT = 1e-4;

/** Frequency error from the added mass above which the result warns (1 %). */
const BAND_WARNING = 0.01;

/**
 * Wet frequencies with the added mass raised and lowered by its relative error δ. By the Rayleigh quotient
 * (classical) ω² = K/(M_s + M_a) over the mode, so with the liquid's share s of the kinetic energy,
 * ω scales by 1/√(1 ± s δ); s is taken over all added mass, which over-states the band when only part
 * of it came from the section solver.
 */
function frequencyBand(wet: ModeSetResult, delta: number | null): { lowHz: number[]; highHz: number[]; largestRelativeHalfWidth: number } | null {
  if (delta === null || !(delta > 0)) return null;
  const lowHz: number[] = [];
  const highHz: number[] = [];
  let worst = 0;
  wet.modes.forEach((m) => {
    const s = m.liquidKineticEnergyShare ?? 0;
    const lo = m.frequencyHz / Math.sqrt(1 + s * delta);
    const hi = m.frequencyHz / Math.sqrt(Math.max(1 - s * delta, 1e-6));
    lowHz.push(lo);
    highHz.push(hi);
    if (m.frequencyHz > 0) worst = Math.max(worst, (hi - lo) / (2 * m.frequencyHz));
  });
  return { lowHz, highHz, largestRelativeHalfWidth: worst };
}

function sum(counts: Int32Array): number {
  let t = 0;
  for (const c of counts) t += c;
  return t;
}

function tooFine(what: string, estimate: number): MemberOutcome {
  return {
    ok: false,
    reason: 'not-converged',
    message:
      `${what}: elements that short lose about ${(100 * estimate).toPrecision(2)} % of the frequencies to rounding in double precision ` +
      `(limit ${100 * PRECISION_LIMIT} %); use fewer elements, or fewer mesh points close together`,
  };
}

/** Modes of one mesh; their vectors are formed only for the mesh that is reported (see `MeshModes`). */
type LevelModes = { lambdas: Float64Array; vectors: () => Float64Array; release: () => void };

interface Level {
  system: MemberSystem;
  dry: LevelModes;
  wet: LevelModes | null;
}

function frequencies(lambdas: Float64Array): number[] {
  return Array.from(lambdas, (l) => Math.sqrt(Math.max(l, 0)) / (2 * Math.PI));
}

function maxRelativeChange(a: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < Math.min(a.length, b.length); i++) {
    const fa = Math.sqrt(Math.max(a[i], 0));
    const fb = Math.sqrt(Math.max(b[i], 0));
    worst = Math.max(worst, fb > 0 ? Math.abs(fa - fb) / fb : fa === fb ? 0 : Infinity);
  }
  return worst;
}

export function solveMember(input: MemberModel, options: SolveMemberOptions = {}): MemberOutcome {
  const parsed = parseMemberModel(input);
  // Where a confinement stops (liquid.boundariesFromM) a segment end must stay: added mass differs on each side.
  const keep = parsed.liquid?.boundariesFromM !== undefined ? [parsed.liquid.boundariesFromM] : [];
  const model = { ...parsed, segments: mergeEqualSegments(parsed.segments, keep) };
  const count = model.modes ?? DEFAULT_MODES;
  const meshOpt = model.mesh ?? {};
  const tol = meshOpt.relativeTolerance ?? DEFAULT_RELATIVE_TOLERANCE;
  const maxElements = meshOpt.maxElements ?? DEFAULT_MAX_ELEMENTS;
  const refine = meshOpt.refine ?? true;
  const { breaks, merged, largestMoveM } = breakpointsWithMerges(model);
  const intervals = breaks.length - 1;
  if (intervals > maxElements) {
    return {
      ok: false,
      reason: 'not-converged',
      message:
        `the member needs at least ${intervals} elements (one between each pair of neighbouring mesh points: segment ends, supports, ` +
        `masses, soil and liquid range ends), more than mesh.maxElements = ${maxElements}; describe it with fewer segments or points`,
    };
  }
  let counts = initialCounts(breaks, meshOpt.initialElements ?? Math.max(12, 3 * count));
  if (sum(counts) > maxElements) {
    return { ok: false, reason: 'not-converged', message: `the first mesh has ${sum(counts)} elements, more than mesh.maxElements = ${maxElements}; lower mesh.initialElements` };
  }
  const firstError = roundingErrorEstimate(breaks, counts);
  if (firstError > PRECISION_LIMIT) {
    const what = meshOpt.initialElements !== undefined ? `mesh.initialElements = ${meshOpt.initialElements} is too fine for this member` : `the member's ${intervals} mesh intervals make too fine a mesh`;
    return tooFine(what, firstError);
  }

  let plan: AddedMassPlan | null = null;
  if (model.liquid) {
    const cache: SectionCache = new Map();
    const planned = planAddedMass(model, options.sectionSolver ?? defaultSectionSolver, cache);
    if (!planned.ok) return planned;
    plan = planned.plan;
  }

  const history: number[] = [];
  let prev: Level | null = null;
  let lastChange: number | null = null;
  let converged = !refine;
  let precisionStop = false;
  for (;;) {
    const mesh = buildMesh(model, breaks, counts);
    const system = assembleMember(model, mesh, plan);
    history.push(mesh.z.length - 1);
    if (prev === null && isMechanism(model, system.tension.integralNm)) return { ok: false, reason: 'mechanism', message: MECHANISM_MESSAGE };
    const stiff = checkStiffness(system);
    if (!stiff.ok) return stiff;
    const dry = meshModes(system, system.mDry, count);
    if (!dry.ok) return dry;
    let wet: Level['wet'] = null;
    if (plan) {
      const w = meshModes(system, wetMass(system), count);
      if (!w.ok) return w;
      wet = w;
    }
    const level: Level = { system, dry, wet };
    if (prev) {
      lastChange = maxRelativeChange(prev.dry.lambdas, dry.lambdas);
      if (wet && prev.wet) lastChange = Math.max(lastChange, maxRelativeChange(prev.wet.lambdas, wet.lambdas));
      converged = lastChange < tol;
    }
    prev = level;
    if (!refine || converged) break;
    const next = refineCounts(breaks, counts);
    if (sum(next) > maxElements) break;
    if (roundingErrorEstimate(breaks, next) > PRECISION_LIMIT) {
      precisionStop = true;
      break;
    }
    // Going on to a finer mesh: this one's vectors will never be read, and its eigen-solver work space may
    // serve the next mesh's solves.
    level.dry.release();
    level.wet?.release();
    counts = next;
  }

  const final = prev!;
  const sys = final.system;
  const n = sys.n;
  const build = (modes: LevelModes, wetSet: boolean): ModeSetResult => {
    const vectors = modes.vectors();
    const list = Array.from(modes.lambdas, (l, i) =>
      modeResult(sys, l, vectors.subarray(i * n, (i + 1) * n), i + 1, wetSet ? sys.mAdded : null),
    );
    return { frequenciesHz: frequencies(modes.lambdas), periodsS: list.map((m) => m.periodS), modes: list };
  };
  const dry = build(final.dry, false);
  const wet = final.wet ? build(final.wet, true) : null;
  const result: MemberResult = {
    modesRequested: count,
    beamTheory: model.beamTheory ?? 'euler-bernoulli',
    dry,
    wet,
    wetOmittedBecause: wet ? null : 'no liquid given: the member is dry only',
    wetToDryRatio: wet ? wet.frequenciesHz.map((f, i) => f / dry.frequenciesHz[i]) : null,
    zones: massZones(model, plan),
    tension: {
      varies: sys.tension.varies,
      topN: sys.tension.topN,
      bottomN: sys.tension.bottomN,
      minN: sys.tension.minN,
      maxN: sys.tension.maxN,
    },
    addedMass: plan ? { endEffect: plan.endEffect, perforation: plan.perforation, sectionSolves: plan.sectionSolves, sectionRelativeError: plan.sectionRelativeError } : null,
    mesh: {
      elements: history[history.length - 1],
      history,
      converged,
      lastChangePercent: lastChange === null ? null : 100 * lastChange,
      relativeTolerance: tol,
    },
    warnings: memberWarnings(model, plan, converged, history[history.length - 1], tol),
  };
  const high = highFrequencyWarning(Math.min(dry.frequenciesHz[0] ?? 0, wet?.frequenciesHz[0] ?? Infinity));
  if (high) result.warnings.push(high);
  if (precisionStop && !converged) {
    result.warnings.push(`Finer meshes than ${history[history.length - 1]} elements would lose more than ${100 * PRECISION_LIMIT} % of the frequencies to rounding in double precision, so refinement stopped there.`);
  }
  if (merged > 0) {
    result.warnings.push(`${merged} mesh point(s) closer than ${(MIN_INTERVAL_FRACTION * model.lengthM).toPrecision(2)} m (length / 5000) to another were merged into it (moved by up to ${largestMoveM.toPrecision(2)} m).`);
  }
  const band = plan && wet ? frequencyBand(wet, plan.sectionRelativeError) : null;
  if (band && result.addedMass) {
    result.addedMass.wetFrequencyBand = band;
    if (band.largestRelativeHalfWidth > BAND_WARNING) {
      result.warnings.push(
        `The section solver's added mass carries an estimated error of ${(100 * plan!.sectionRelativeError!).toPrecision(2)} % ` +
          `(panels capped at ${SECTION_PANELS_MAX} per body), so the wet frequencies may be off by up to ${(100 * band.largestRelativeHalfWidth).toPrecision(2)} %; ` +
          'the band is in the results. A gap much narrower than the section is the usual cause.',
      );
    }
  }
  const bad = resultSanity(result);
  if (bad) return { ok: false, reason: 'not-converged', message: bad };
  return { ok: true, result };
}
