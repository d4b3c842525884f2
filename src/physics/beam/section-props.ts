/**
 * Cross-section properties of a member segment at a point along it, for bending in the plane of
 * lateral motion. A linear taper interpolates the section's dimensions (not its properties) between
 * `section` and `endSection`, so EI follows D⁴ and mass follows D² along the segment.
 */
import type { MemberSection, MemberSegment } from './model';
import { shapeOf } from '../shapes/registry';
import type { SectionAt, SectionMaterial } from '../shapes/types';

export type { SectionAt } from '../shapes/types';
export { cowperCircle, cowperRectangle } from '../shapes/shear';

export const DEFAULT_POISSON_RATIO = 0.3;

/** Dimensions of the section at fraction t ∈ [0, 1] of the segment (linear taper). */
export function interpolateSection(seg: MemberSegment, t: number): MemberSection {
  const s = seg.section;
  const e = seg.endSection;
  if (!e || t === 0) return s;
  if (s.shape !== e.shape) throw new RangeError(`endSection.shape must match section.shape (${s.shape}), got ${e.shape}`);
  return shapeOf(s).lerp(s, e, t);
}

// One material record reused for every station (sectionAt runs per Gauss point in the hot loops, and the shape's
// `props` reads it synchronously without keeping it), so a station allocates only its result.
const MATERIAL: SectionMaterial = {
  youngsModulusPa: 0,
  densityKgPerM3: 0,
  poissonRatio: 0,
  shearModulusPa: 0,
  coatingM: 0,
  coatingDensityKgPerM3: 0,
  contentsDensityKgPerM3: 0,
};

/** Properties of a segment at fraction t ∈ [0, 1] of its length. */
export function sectionAt(seg: MemberSegment, t: number): SectionAt {
  const sec = interpolateSection(seg, t);
  const e = seg.youngsModulusPa;
  const nu = seg.poissonRatio ?? DEFAULT_POISSON_RATIO;
  const m = MATERIAL;
  m.youngsModulusPa = e;
  m.densityKgPerM3 = seg.densityKgPerM3;
  m.poissonRatio = nu;
  m.shearModulusPa = e / (2 * (1 + nu));
  m.coatingM = seg.coating?.thicknessM ?? 0;
  m.coatingDensityKgPerM3 = seg.coating?.densityKgPerM3 ?? 0;
  m.contentsDensityKgPerM3 = seg.contentsDensityKgPerM3 ?? 0;
  return shapeOf(sec).props(sec, m);
}

/** Total dry mass per metre (structure + contents + coating), kg/m. */
export function dryMassPerM(p: SectionAt): number {
  return p.structureKgPerM + p.contentsKgPerM + p.coatingKgPerM;
}
