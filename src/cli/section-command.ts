/**
 * `wetmode section FILE`: adapter from JSON text to the section solver and back to pretty JSON text.
 * The lead's CLI entry reads FILE (or standard input for `-`), calls `runSectionCommand`, prints the
 * returned text, and turns a thrown Error into its message on standard error with a non-zero exit.
 */
import { cautionLines } from '../text/cautions';
import { toJson } from './json-out';
import { formatNumber } from '../units/format-number'; // not '../units': that loads mathjs
import { parseSectionInput, solveSection } from '../physics/section/index';
import type { SectionInput, SectionResult } from '../physics/section/index';

/** Limits of the section model itself, printed beside the general cautions. */
export const SECTION_MODEL_LIMITS: readonly string[] = [
  'The free surface is taken in the high-frequency limit (zero potential); it holds only well above the sloshing frequencies.',
  'Two-dimensional strip values: three-dimensional end effects reduce the added mass of short members.',
];

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
    addedMass: r.addedMass,
    addedMassOrder: labels,
    addedMassUnits: 'per metre of length: x–x and y–y kg/m, x–rotation and y–rotation kg·m/m, rotation–rotation kg·m²/m; rotation counter-clockwise about each body\'s reference point',
    asymmetryBeforeSymmetrising: r.asymmetry,
    bodies: r.bodies.map((b) => ({
      index: b.index,
      section: describeBody(input, b.index),
      referencePointM: b.referencePointM,
      wettedAreaM2: b.wettedAreaM2,
      displacedMassKgPerM: b.displacedMassKgPerM,
      addedMassXKgPerM: b.addedMassX,
      addedMassYKgPerM: b.addedMassY,
      addedInertiaRotationKgM2PerM: b.addedInertiaRotation,
      caX: b.caX,
      caY: b.caY,
      caReference: `Ca = added mass / (ρ π a²); x motion a = ${formatNumber(b.referenceHalfWidthXM, 6)} m, y motion a = ${formatNumber(b.referenceHalfWidthYM, 6)} m (half the wetted extent across the motion)`,
      addedToDisplacedX: b.addedToDisplacedX,
      addedToDisplacedY: b.addedToDisplacedY,
      blockedMotions: b.blockedDofs,
      panels: b.panels,
    })),
    errorEstimate: r.errorEstimates.map((e) => ({
      term: `body ${e.body} ${e.motion}`,
      value: e.fine,
      atHalfPanels: e.coarse,
      extrapolated: e.extrapolated,
      order: e.order,
      estimatedError: e.absoluteError,
      estimatedRelativeError: e.relativeError,
    })),
    energyCheck: r.energyChecks.map((e) => ({
      term: `body ${e.body} ${e.motion}`,
      boundaryIntegral: e.boundaryIntegral,
      fieldIntegral: e.fieldIntegral,
      farFieldTail: e.tail,
      relativeDifference: e.relativeDifference,
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
  // Numbers to 6 significant figures, as every command prints them.
  return toJson(report(input, outcome.result));
}
