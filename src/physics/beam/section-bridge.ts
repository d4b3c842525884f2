/**
 * The one place the beam engine calls the 2D section solver (src/physics/section). Kept behind a
 * function type so tests and benchmarks can pass their own solver, and so the engine's unbounded
 * closed forms never depend on it.
 */
import { solveSectionMemo } from '../section/memo';
import type { BodySpec, BoundarySpec, SectionInput } from '../section/types';
import type { MemberSection } from './model';
import { shapeOf } from '../shapes/registry';

export type SectionSolverOutcome =
  /** `swayRelativeError`: estimated relative discretisation error of addedMass[0][0], when the solver gives one. */
  | { ok: true; result: { addedMass: number[][]; swayRelativeError?: number; panelsPerBody?: number } }
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

/** Panels per body of the first solve (its companion solves use half and a quarter). */
export const SECTION_PANELS = 64;
/** Most panels per body the member path doubles up to (a 256-panel solve of a thin plate takes about 0.1–0.3 s). */
export const SECTION_PANELS_MAX = 256;
/**
 * Estimated relative error of the sway added mass below which the member path stops doubling the panels:
 * 0.5 %, at most 0.25 % on a wet frequency (ω ∝ 1/√(M_s + M_a)), five times the mesh tolerance's effect
 * but inside the keystroke budget (a thin plate near a wall at 256 panels costs about 50 ms); what remains
 * is carried into the frequency band.
 */
export const SECTION_TOLERANCE = 5e-3;

/**
 * Default solver: the section solver from 64 panels per body (with its 32- and 16-panel companions), the
 * panels doubling (up to 256 per body, each doubling reusing the levels already solved) until the solver's
 * error estimate of the sway term, which brackets the true error (also for gaps narrower than the panels),
 * is below SECTION_TOLERANCE; the sway added mass is taken as the Richardson extrapolation and whatever
 * error remains is returned so the member result can carry it into its frequencies. A plate 2 mm from a
 * wall, 0.3 m wide: Ca 15.4 at a fixed 64 panels, 17.77 here against a converged 17.73.
 *
 * Solves go through the section memo (section/memo.ts): a keystroke that changes a field which does not
 * change the section (length, E, a top mass) answers its section from memory. Input errors in the
 * boundaries are re-thrown with the member's field path.
 */
export const defaultSectionSolver: SectionSolver = (input) => {
  let out: ReturnType<typeof solveSectionMemo>;
  try {
    out = solveSectionMemo(input, {
      startPanelsPerBody: SECTION_PANELS,
      maxPanelsPerBody: SECTION_PANELS_MAX,
      targetRelativeError: SECTION_TOLERANCE,
      targetMotions: ['x'],
    });
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    throw new RangeError(`liquid.boundaries (section surroundings): ${msg}`);
  }
  if (!out.ok) return { ok: false, reason: out.reason, message: out.message };
  const sway = out.result.errorEstimates.find((e) => e.body === 0 && e.motion === 'x');
  const error = sway ? sway.relativeError : undefined;
  const addedMass = out.result.addedMass.map((row) => row.slice());
  if (sway && Number.isFinite(sway.extrapolated) && sway.extrapolated > 0) addedMass[0][0] = sway.extrapolated;
  return { ok: true, result: { addedMass, swayRelativeError: error, panelsPerBody: out.result.panelsPerBody } };
};
