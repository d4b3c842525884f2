/**
 * Does the member have enough restraint? A beam moving in one lateral plane has two rigid-body
 * motions, w(z) = a + b·z. Each translational restraint at z_i (pinned, clamped, translational spring,
 * the two ends of a soil-spring range) removes a + b·z_i; each rotational restraint (clamped, guided,
 * rotational spring) removes b, as does a net tension (∫T dz > 0: a pendulum). The member is a mechanism
 * when these leave a non-zero (a, b) free. Decided from the supports, not from pivots, so it is exact.
 */
import type { MemberModel } from './model';

export const MECHANISM_MESSAGE = 'member can move as a rigid body: add a support';

export function isMechanism(model: MemberModel, tensionIntegralNm: number): boolean {
  const points: number[] = [];
  let rotation = tensionIntegralNm > 0;
  for (const s of model.supports) {
    if (s.kind === 'clamped') {
      points.push(s.atM);
      rotation = true;
    } else if (s.kind === 'pinned') points.push(s.atM);
    else if (s.kind === 'guided') rotation = true;
    else if (s.kind === 'spring') {
      if ((s.translationalStiffnessNPerM ?? 0) > 0) points.push(s.atM);
      if ((s.rotationalStiffnessNmPerRad ?? 0) > 0) rotation = true;
    }
  }
  for (const soil of model.soilSprings ?? []) {
    if (soil.modulusNPerM2 > 0) points.push(soil.fromM, soil.toM);
  }
  if (points.length === 0) return true;
  if (rotation) return false;
  // A loop, not Math.min(...points): spreading a long array overflows the call stack.
  let lo = Infinity;
  let hi = -Infinity;
  for (const p of points) {
    lo = Math.min(lo, p);
    hi = Math.max(hi, p);
  }
  return !(hi - lo > 1e-9 * model.lengthM);
}
