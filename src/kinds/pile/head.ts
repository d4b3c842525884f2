/** The pile head as the deck holds it, and the support that becomes in the member model. */
import type { MemberSupport } from '../../physics/beam/model';
import { fail, positive, record } from '../common/check';

/**
 * Pile head: free; held against rotation by a stiff deck (free to sway: the beam engine's "guided"); or a
 * rotational spring for a deck of finite stiffness.
 */
export type PileHead = { kind: 'free' } | { kind: 'held' } | { kind: 'spring'; rotationalStiffnessNmPerRad: number };

/** Checks the head input (default free); throws RangeError naming the field. */
export function readHead(v: unknown): PileHead {
  if (v === undefined) return { kind: 'free' };
  const h = record('head', v);
  if (h.kind === 'free' || h.kind === 'held') return { kind: h.kind };
  if (h.kind === 'spring') return { kind: 'spring', rotationalStiffnessNmPerRad: positive('head.rotationalStiffnessNmPerRad', h.rotationalStiffnessNmPerRad) };
  return fail('head.kind', 'one of "free", "held", "spring"', h.kind);
}

export function headSupports(h: PileHead, atM: number): MemberSupport[] {
  if (h.kind === 'held') return [{ atM, kind: 'guided' }];
  if (h.kind === 'spring') return [{ atM, kind: 'spring', rotationalStiffnessNmPerRad: h.rotationalStiffnessNmPerRad }];
  return [];
}

