/** Plain-language warnings about the limits of the model for a given member. */
import type { AddedMassPlan } from './added-mass';
import type { MemberModel } from './model';
import { sectionAt } from './section-props';
import { shapeOf } from '../shapes/registry';

/** Largest section depth in the direction of motion (tube/rod: diameter; plate strip: thickness), m. */
export function maxDepthM(model: MemberModel): number {
  let d = 0;
  for (const s of model.segments) d = Math.max(d, sectionAt(s, 0).depthM, sectionAt(s, 1).depthM);
  return d;
}

/**
 * Frequency above which the answer is flagged, Hz. Structural screening deals with flow and machinery
 * excitation well below this; at kilohertz frequencies a small member's bending wavelength nears its
 * section size and local (shell, acoustic) behaviour, which a beam model leaves out, takes over
 * (common practice, no single source). Also a sign of a unit slip (a 1 mm stem typed for 10 mm).
 */
export const HIGH_FREQUENCY_HZ = 5000;

/** A warning when the lowest frequency is above HIGH_FREQUENCY_HZ, or null. */
export function highFrequencyWarning(lowestHz: number): string | null {
  if (!(lowestHz > HIGH_FREQUENCY_HZ)) return null;
  return (
    `The lowest frequency, ${lowestHz.toPrecision(3)} Hz, is above ${HIGH_FREQUENCY_HZ} Hz: outside what the beam model represents ` +
    '(local shell and acoustic behaviour take over); check the sizes and their units.'
  );
}

export function memberWarnings(model: MemberModel, plan: AddedMassPlan | null, converged: boolean, elements: number, tol: number): string[] {
  const out: string[] = [];
  const slender = model.lengthM / maxDepthM(model);
  if (slender < 10 && model.beamTheory !== 'timoshenko') {
    out.push(
      `Length / section depth is ${slender.toPrecision(3)}, below 10: shear deformation and rotary inertia, ` +
        'which Euler–Bernoulli beam theory leaves out, lower the true frequencies (most for the higher modes); ' +
        'set beamTheory to "timoshenko" to include them.',
    );
  }
  if (!converged) {
    out.push(`Mesh refinement stopped at ${elements} elements before every mode changed by less than ${(100 * tol).toPrecision(2)} %.`);
  }
  for (const seg of model.segments) {
    const w = plan ? shapeOf(seg.section).wetWarning(seg.section) : null;
    if (w) {
      out.push(w);
      break;
    }
  }
  if ((model.tensionN ?? 0) < 0 || model.tensionVariesWithWeight) {
    const t = model.tensionN ?? 0;
    if (t < 0) out.push('Axial compression lowers the frequencies; near the buckling load they fall towards zero.');
  }
  if (plan) out.push(...plan.warnings);
  return out;
}
