/**
 * A round member centred in a round pipe or caisson (the commonest confinement: a stem in its bore, a riser in a
 * concentric caisson) has an exact added mass, so the section solver is not needed there:
 *   m_a = ρ π R1² (R2² + R1²) / (R2² − R1²),   Ca = (R2² + R1²) / (R2² − R1²) on the reference area π R1²
 * R.J. Fritz, "The effect of liquids on the dynamic motions of immersed solids", ASME J. Eng. Industry 94 (1972)
 * 167 (docs/sources.md §S3.2): a circle moving inside a fixed concentric circle, potential flow.
 */
import type { BodySpec, BoundarySpec } from '../section/types';

/** Centres within this fraction of the gap of each other count as concentric (the member's own rounding). */
const CONCENTRIC_RTOL = 1e-9;

/** Fritz's Ca when the body is a circle at the origin inside exactly one concentric circular enclosure; else null. */
export function concentricAnnulusCa(body: BodySpec, boundaries: readonly BoundarySpec[]): number | null {
  if (body.shape !== 'circle' || boundaries.length !== 1) return null;
  const b = boundaries[0];
  if (b.kind !== 'enclosure' || b.shape !== 'circle') return null;
  const r1 = body.diameterM / 2;
  const r2 = b.diameterM / 2;
  if (!(r2 > r1 && r1 > 0)) return null;
  const gap = r2 - r1;
  const [bx, by] = body.centerM ?? [0, 0];
  const [ex, ey] = b.centerM ?? [0, 0];
  if (Math.hypot(bx - ex, by - ey) > CONCENTRIC_RTOL * gap) return null;
  return (r2 * r2 + r1 * r1) / (r2 * r2 - r1 * r1);
}
