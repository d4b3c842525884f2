/**
 * The `ranges` of `wetmode member` (uncertain inputs, dotted paths into the member model, SI) and the
 * `band` it prints: mode by mode, lowest first, dry and wet, with the method used and the sensitivity.
 */
import type { MemberModel, MemberResult } from '../physics/beam';
import { memberBand } from '../physics/uncertain/band';
import type { StateBand } from '../physics/uncertain/band-types';

/** Takes `ranges` off the member input (the member model itself does not know the field). */
export function splitRanges(raw: unknown): { member: unknown; ranges: unknown } {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw) || !('ranges' in raw)) return { member: raw, ranges: undefined };
  const { ranges, ...member } = raw as Record<string, unknown>;
  return { member, ranges };
}

export function state(s: StateBand) {
  return {
    likelyHz: s.likelyHz,
    lowHz: s.lowHz,
    highHz: s.highHz,
    modes: s.modes.map((m) => ({ mode: m.mode, method: m.method, reason: m.reason, lowAt: m.lowAt, highAt: m.highAt })),
  };
}

/** The band as printed; throws (exit 1) on bad ranges, and a solve failing inside the ranges is reported. */
export function bandJson(model: MemberModel, ranges: unknown, likely: MemberResult): unknown {
  const out = memberBand(model, ranges, { likely });
  if (!out.ok) return { ok: false, reason: out.reason, message: out.message };
  const b = out.band;
  return {
    ok: true,
    ranges: b.ranges,
    dry: state(b.dry),
    wet: b.wet ? state(b.wet) : null,
    method: b.methodText,
    sensitivity: b.sensitivity,
    solves: b.solves,
    notes: b.notes,
  };
}
