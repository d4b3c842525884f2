/**
 * The one place the beam engine calls the 2D section solver (src/physics/section). Kept behind a
 * function type so tests and benchmarks can pass their own solver, and so the engine's unbounded
 * closed forms never depend on it.
 */
import { solveSection } from '../section/index';
import type { BodySpec, BoundarySpec, SectionInput } from '../section/types';
import type { MemberSection } from './model';
import { shapeOf } from '../shapes/registry';

export type SectionSolverOutcome =
  /** `swayRelativeError`: estimated relative discretisation error of addedMass[0][0], when the solver gives one. */
  | { ok: true; result: { addedMass: number[][]; swayRelativeError?: number } }
  | { ok: false; reason: string; message: string };

/** Contract of `solveSection` in src/physics/section/index.ts. */
export type SectionSolver = (input: SectionInput) => SectionSolverOutcome;

/**
 * The member's section as a section-solver body, centred at the origin and moving along x
 * (the convention of `MemberLiquid.boundaries`), as its shape describes it (src/physics/shapes).
 */
export function sectionBody(section: MemberSection, coatingM: number): BodySpec {
  return shapeOf(section).solverBody(section, coatingM);
}

export function sectionInput(section: MemberSection, coatingM: number, rho: number, boundaries: BoundarySpec[]): SectionInput {
  return { liquidDensityKgPerM3: rho, bodies: [sectionBody(section, coatingM)], boundaries };
}

/** Panels per body of the default solve (its companion solve uses half). */
export const SECTION_PANELS = 64;

/**
 * Default solver: the section solver at 64 panels per body with its 32-panel companion solve, and the
 * sway added mass taken as the Richardson extrapolation of the two (expected order 2, the solver's own
 * estimate). Measured against Fritz's annulus, a circle by a wall and in a rectangular tank, and a plate
 * beside a wall (512-panel reference): within 3e-4, better than the raw 128-panel value and about 4×
 * faster. Input errors in the boundaries are re-thrown with the member's field path.
 */
export const defaultSectionSolver: SectionSolver = (input) => {
  let out: ReturnType<typeof solveSection>;
  try {
    out = solveSection(input, { panelsPerBody: SECTION_PANELS });
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    throw new RangeError(`liquid.boundaries (section surroundings): ${msg}`);
  }
  if (!out.ok) return out;
  const sway = out.result.errorEstimates.find((e) => e.body === 0 && e.motion === 'x');
  const addedMass = out.result.addedMass.map((row) => row.slice());
  if (sway && Number.isFinite(sway.extrapolated) && sway.extrapolated > 0) addedMass[0][0] = sway.extrapolated;
  // The extrapolated value is more accurate than the fine one, so the fine-to-extrapolated gap bounds its error.
  return { ok: true, result: { addedMass, swayRelativeError: sway ? sway.relativeError : undefined } };
};
