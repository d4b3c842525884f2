/**
 * Adjacent segments that describe the same prismatic section (same shape, dimensions, materials, contents
 * and coating, no taper) are one segment for the solver: merging them removes mesh points that change
 * nothing, so a member described in many equal pieces meshes like one described in a few.
 */
import type { MemberSegment } from './model';

/** Everything about a segment except where it lies. */
function signature(s: MemberSegment): string {
  return JSON.stringify([s.section, s.youngsModulusPa, s.densityKgPerM3, s.poissonRatio ?? null, s.contentsDensityKgPerM3 ?? 0, s.coating ?? null]);
}

/**
 * Segments with equal prismatic neighbours merged (the input is not changed). `keepBreaksAt` are levels a
 * segment end must stay at even between equal neighbours (e.g. where a caisson's boundaries stop).
 */
export function mergeEqualSegments(segments: readonly MemberSegment[], keepBreaksAt: readonly number[] = []): MemberSegment[] {
  const out: MemberSegment[] = [];
  let lastSig = '';
  for (const s of segments) {
    const sig = s.endSection ? '' : signature(s);
    const prev = out[out.length - 1];
    if (prev && sig !== '' && sig === lastSig && !keepBreaksAt.includes(prev.toM)) prev.toM = s.toM;
    else out.push({ ...s });
    lastSig = sig;
  }
  return out;
}
