/**
 * End conditions in trade words and the supports they become, plus the rigid-body check shared by the kinds
 * whose supports the user picks (riser, baffle).
 */
import type { MemberSupport } from '../../physics/beam/model';

/**
 * clamped: position and rotation held; pinned: position held, free to rotate; sliding: rotation held, free to
 * move sideways (the beam engine's "guided"); free: nothing held.
 */
export type EndCondition = 'clamped' | 'pinned' | 'sliding' | 'free';
export const END_CONDITIONS: readonly EndCondition[] = ['clamped', 'pinned', 'sliding', 'free'];

export function endSupports(condition: EndCondition, atM: number): MemberSupport[] {
  if (condition === 'free') return [];
  return [{ atM, kind: condition === 'sliding' ? 'guided' : condition }];
}

/**
 * True when the supports leave the member free to move as a rigid body w(z) = a + b·z: each held position at
 * z_i removes a + b·z_i, each held rotation removes b (classical; the beam engine makes the same check).
 * `tensionHoldsRotation`: a net tension resists rigid rotation like a pendulum, so one held position suffices.
 */
export function leavesRigidBodyMotion(supports: readonly MemberSupport[], lengthM: number, tensionHoldsRotation = false): boolean {
  const positions: number[] = [];
  let rotation = tensionHoldsRotation;
  for (const s of supports) {
    if (s.kind === 'clamped' || s.kind === 'pinned' || (s.kind === 'spring' && (s.translationalStiffnessNPerM ?? 0) > 0)) positions.push(s.atM);
    if (s.kind === 'clamped' || s.kind === 'guided' || (s.kind === 'spring' && (s.rotationalStiffnessNmPerRad ?? 0) > 0)) rotation = true;
  }
  if (positions.length === 0) return true;
  if (rotation) return false;
  return !(Math.max(...positions) - Math.min(...positions) > 1e-9 * lengthM);
}
