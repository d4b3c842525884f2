/**
 * `wetmode section FILE`: adapter from JSON text to the section solver and back to pretty JSON text.
 * The lead's CLI entry reads FILE (or standard input for `-`), calls `runSectionCommand`, prints the
 * returned text, and turns a thrown Error into its message on standard error with a non-zero exit.
 */
import { cautionLines } from '../text/cautions';
import { parseSectionInput, solveSection } from '../physics/section/index';
import type { SectionInput, SectionResult } from '../physics/section/index';

/** Limits of the section model itself, printed beside the general cautions. */
export const SECTION_MODEL_LIMITS: readonly string[] = [
  'The free surface is taken in the high-frequency limit (zero potential); it holds only well above the sloshing frequencies.',
  'Two-dimensional strip values: three-dimensional end effects reduce the added mass of short members.',
];

/** Rounds to 6 significant digits for a readable report (the solver's own accuracy is ~1e-4 at best). */
function r6(v: number): number {
  return v === 0 || !Number.isFinite(v) ? v : Number(v.toPrecision(6));
}

function describeBody(input: SectionInput, k: number): string {
  const b = input.bodies[k];
  switch (b.shape) {
    case 'circle':
      return `circle ⌀ ${b.diameterM} m`;
    case 'ellipse':
      return `ellipse ${b.widthM} × ${b.heightM} m`;
    case 'rectangle':
      return `rectangle ${b.widthM} × ${b.heightM} m${b.cornerRadiusM ? `, corner radius ${b.cornerRadiusM} m` : ''}`;
    case 'plate':
      return `plate ${b.widthM} m wide, ${b.thicknessM} m thick`;
    case 'polygon':
      return `polygon of ${b.pointsM.length} points`;
  }
}

function report(input: SectionInput, r: SectionResult): object {
  const K = input.bodies.length;
  const labels: string[] = [];
  for (let k = 0; k < K; k++) labels.push(`body ${k} x`, `body ${k} y`, `body ${k} rotation`);
  return {
    tool: 'wetmode section',
    liquidDensityKgPerM3: input.liquidDensityKgPerM3,
    addedMass: r.addedMass.map((row) => row.map(r6)),
    addedMassOrder: labels,
    addedMassUnits: 'per metre of length: x–x and y–y kg/m, x–rotation and y–rotation kg·m/m, rotation–rotation kg·m²/m; rotation counter-clockwise about each body\'s reference point',
    asymmetryBeforeSymmetrising: r6(r.asymmetry),
    bodies: r.bodies.map((b) => ({
      index: b.index,
      section: describeBody(input, b.index),
      referencePointM: b.referencePointM.map(r6),
      wettedAreaM2: r6(b.wettedAreaM2),
      displacedMassKgPerM: r6(b.displacedMassKgPerM),
      addedMassXKgPerM: r6(b.addedMassX),
      addedMassYKgPerM: r6(b.addedMassY),
      addedInertiaRotationKgM2PerM: r6(b.addedInertiaRotation),
      caX: r6(b.caX),
      caY: r6(b.caY),
      caReference: `Ca = added mass / (ρ π a²); x motion a = ${r6(b.referenceHalfWidthXM)} m, y motion a = ${r6(b.referenceHalfWidthYM)} m (half the wetted extent across the motion)`,
      addedToDisplacedX: r6(b.addedToDisplacedX),
      addedToDisplacedY: r6(b.addedToDisplacedY),
      blockedMotions: b.blockedDofs,
      panels: b.panels,
    })),
    errorEstimate: r.errorEstimates.map((e) => ({
      term: `body ${e.body} ${e.motion}`,
      value: r6(e.fine),
      atHalfPanels: r6(e.coarse),
      extrapolated: r6(e.extrapolated),
      order: r6(e.order),
      estimatedError: r6(e.absoluteError),
      estimatedRelativeError: r6(e.relativeError),
    })),
    energyCheck: r.energyChecks.map((e) => ({
      term: `body ${e.body} ${e.motion}`,
      boundaryIntegral: r6(e.boundaryIntegral),
      fieldIntegral: r6(e.fieldIntegral),
      farFieldTail: r6(e.tail),
      relativeDifference: r6(e.relativeDifference),
    })),
    panels: { fine: r.panelsFine, coarse: r.panelsCoarse },
    method: r.notes,
    energyCheckNote: r.energyChecks.some((e) => Math.abs(e.relativeDifference) > 0.05)
      ? 'Some field integrals differ by more than 5 %: the field grid is too coarse for flow concentrated at edges or in thin gaps; rely on the boundary values and their error estimates.'
      : null,
    modelLimits: SECTION_MODEL_LIMITS,
    cautions: cautionLines(),
  };
}

/** Parses, validates and solves a section given as JSON text; returns the report as pretty JSON text. */
export function runSectionCommand(inputText: string): string {
  let raw: unknown;
  try {
    raw = JSON.parse(inputText);
  } catch (e) {
    throw new Error(`section input is not valid JSON: ${(e as Error).message}`);
  }
  let input: SectionInput;
  try {
    input = parseSectionInput(raw);
  } catch (e) {
    throw new Error(`invalid section input: ${(e as Error).message}`);
  }
  const outcome = solveSection(input, { energyCheck: true });
  if (!outcome.ok) throw new Error(`section solve failed (${outcome.reason}): ${outcome.message}`);
  return JSON.stringify(report(input, outcome.result), null, 2);
}
