/**
 * The member modal engine: dry and wet natural frequencies of a non-uniform member.
 * Builds the mesh, checks restraint and buckling, solves the banded eigenproblem dry and wet, and doubles
 * the mesh until every requested mode changes by less than the tolerance (0.05 % by default).
 */
import { type AddedMassPlan, planAddedMass, type SectionCache } from './added-mass';
import { assembleMember, type MemberSystem } from './assemble';
import { buildMesh, initialCounts, meshBreakpoints } from './mesh';
import type { MemberModel } from './model';
import { checkStiffness, meshModes, modeResult, wetMass } from './modes';
import { isMechanism, MECHANISM_MESSAGE } from './restraint';
import type { MemberOutcome, MemberResult, ModeSetResult } from './result';
import { defaultSectionSolver, type SectionSolver } from './section-bridge';
import { parseMemberModel } from './validate';
import { memberWarnings } from './warnings';
import { massZones } from './zones';

export interface SolveMemberOptions {
  /** 2D added-mass solver for confined sections (default: the section solver of src/physics/section). */
  sectionSolver?: SectionSolver;
}

export const DEFAULT_MODES = 5;
export const DEFAULT_RELATIVE_TOLERANCE = 5e-4;
export const DEFAULT_MAX_ELEMENTS = 3200;

interface Level {
  system: MemberSystem;
  dry: { lambdas: Float64Array; vectors: Float64Array };
  wet: { lambdas: Float64Array; vectors: Float64Array } | null;
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
  const model = parseMemberModel(input);
  const count = model.modes ?? DEFAULT_MODES;
  const meshOpt = model.mesh ?? {};
  const tol = meshOpt.relativeTolerance ?? DEFAULT_RELATIVE_TOLERANCE;
  const maxElements = meshOpt.maxElements ?? DEFAULT_MAX_ELEMENTS;
  const refine = meshOpt.refine ?? true;
  const breaks = meshBreakpoints(model);
  let counts = initialCounts(breaks, meshOpt.initialElements ?? Math.max(12, 3 * count));

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
    const total = history[history.length - 1];
    if (2 * total > maxElements) break;
    counts = counts.map((c) => 2 * c);
  }

  const final = prev!;
  const sys = final.system;
  const n = sys.n;
  const build = (modes: { lambdas: Float64Array; vectors: Float64Array }, wetSet: boolean): ModeSetResult => {
    const list = Array.from(modes.lambdas, (l, i) =>
      modeResult(sys, l, modes.vectors.subarray(i * n, (i + 1) * n), i + 1, wetSet ? sys.mAdded : null),
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
  return { ok: true, result };
}
