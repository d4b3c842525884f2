/**
 * Cross-field plausibility shared by the tube and strip kinds: the slenderness a beam model needs, and the
 * thin wall that a beam model cannot represent. Hard limits are refusals (reported through `err`); soft ones
 * are warnings beside the field (through `warn`). Messages name the field and state the limit and its basis.
 */
import { STUBBY_LENGTH_TO_DEPTH } from '../kinds/common/theory';

/**
 * Length / section depth below which a member is refused: at L/D < 2 the member is a block, not a beam;
 * beam theory, even with shear (docs/sources.md §S1.7), is meant for members several depths long (common practice).
 */
export const MIN_LENGTH_TO_DEPTH = 2;

/** Wall / outer diameter below which a tube is warned about (thin shell: local buckling and ovalisation). */
export const THIN_WALL_RATIO = 0.01;

type Report = (key: string, message: string) => void;

function ratio(x: number): string {
  return x >= 10 ? x.toFixed(0) : x.toPrecision(2);
}

/**
 * Refuses a member shorter than 2 section depths (hard, on `lengthKey`). `depthWord` names the depth
 * ("outer diameter", "plate thickness").
 */
export function checkStubby(lengthKey: string, lengthLabel: string, lengthM: number, depthM: number, depthWord: string, err: Report): void {
  if (!(lengthM >= MIN_LENGTH_TO_DEPTH * depthM)) {
    err(
      lengthKey,
      `${lengthLabel} must be at least ${MIN_LENGTH_TO_DEPTH} × the ${depthWord} for a beam model (length / ${depthWord} is ${ratio(lengthM / depthM)}; ` +
        `shorter members are blocks, outside beam theory, common practice)`,
    );
  }
}

/**
 * Warns when a stubby member (length / depth under 10, docs/sources.md §S13) is forced to slender-beam theory:
 * shear deformation and rotary inertia lower its frequencies (Timoshenko beam, docs/sources.md §S1.7).
 */
export function warnSlenderTheory(lengthKey: string, lengthM: number, depthM: number, depthWord: string, theoryChoice: string, warn: Report): void {
  const ld = lengthM / depthM;
  if (ld < STUBBY_LENGTH_TO_DEPTH && theoryChoice === 'euler-bernoulli') {
    warn(
      lengthKey,
      `length / ${depthWord} is ${ratio(ld)}, under ${STUBBY_LENGTH_TO_DEPTH}: a slender-beam model over-estimates the frequencies; choose "With shear (Timoshenko)" or "Automatic" under Beam theory (docs/sources.md §S1.7, §S13)`,
    );
  }
}

/** Warns when the wall is under 1 % of the outer diameter: local buckling and ovalisation are outside the beam model. */
export function warnThinWall(wallKey: string, wallM: number, diameterM: number, fmt: (v: number) => string, warn: Report): void {
  if (wallM > 0 && wallM < THIN_WALL_RATIO * diameterM) {
    warn(
      wallKey,
      `wall thickness is under 1 % of the outer diameter (${fmt(THIN_WALL_RATIO * diameterM)}): a shell this thin can buckle locally or ovalise, which the beam model leaves out (common practice)`,
    );
  }
}
