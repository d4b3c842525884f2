/**
 * Shared layout helpers: cutting the member into segments where a property changes, clipping bands and
 * ordering landmarks.
 */
import type { MemberSegment } from '../../physics/beam/model';
import type { Band, BandId, Landmark } from './types';

/** Relative distance (of the member length) under which two cut points are the same. */
const MERGE = 1e-9;

/**
 * Cuts [0, lengthM] at the given points (those outside are ignored) and builds one segment per piece with
 * `make(fromM, toM, midM)`; properties are decided at the piece's midpoint, so a piece never straddles a cut.
 */
export function cutSegments(
  lengthM: number,
  cuts: readonly number[],
  make: (fromM: number, toM: number, midM: number) => MemberSegment,
): MemberSegment[] {
  const pts = [0, lengthM, ...cuts.filter((z) => z > 0 && z < lengthM)].sort((a, b) => a - b);
  const out: MemberSegment[] = [];
  let from = 0;
  for (const z of pts.slice(1)) {
    if (z - from <= MERGE * lengthM) continue;
    out.push(make(from, z, 0.5 * (from + z)));
    from = z;
  }
  // The last piece ends exactly at lengthM (a merged cut just below it must not leave a gap).
  out[out.length - 1].toM = lengthM;
  return out;
}

/** A band clipped to [0, lengthM], or nothing when the clipped stretch is empty. */
export function band(id: BandId, label: string, fromM: number, toM: number, lengthM: number): Band[] {
  const a = Math.max(0, fromM);
  const b = Math.min(lengthM, toM);
  return b - a > MERGE * lengthM ? [{ id, label, fromM: a, toM: b }] : [];
}

/** Landmarks in ascending z (stable for equal z). */
export function sortLandmarks(list: Landmark[]): Landmark[] {
  return list.map((l, i) => [l, i] as const).sort((p, q) => p[0].zM - q[0].zM || p[1] - q[1]).map((p) => p[0]);
}
