/**
 * The Section editor filled from a member: its submerged cross-section (outer size including coating or
 * growth) and the surroundings that confine the liquid around it, moving in sway (x) as the member bends.
 */
import type { MemberModel } from '../../physics/beam/model';
import { sectionAt } from '../../physics/beam/section-props';
import type { BoundarySpec } from '../../physics/section/types';
import { newBody, openWater, type SectionForm, type SurroundForm } from './form';

/** Metres to the editor's millimetre text, to 5 significant figures. */
function mm(m: number): string {
  return String(Number((m * 1000).toPrecision(5)));
}

/** The surroundings the editor can show for these boundaries; the rest are listed as left out. */
function surroundOf(boundaries: readonly BoundarySpec[]): { surround: SurroundForm; leftOut: number } {
  const s = openWater();
  let leftOut = 0;
  for (const b of boundaries) {
    if (b.kind === 'enclosure' && b.shape === 'circle') {
      Object.assign(s, { enclosure: 'circle', enclosureDiameter: mm(b.diameterM), enclosureX: mm(b.centerM?.[0] ?? 0), enclosureY: mm(b.centerM?.[1] ?? 0) });
    } else if (b.kind === 'enclosure' && b.shape === 'rectangle' && !b.angleDeg) {
      Object.assign(s, { enclosure: 'rectangle', enclosureWidth: mm(b.widthM), enclosureHeight: mm(b.heightM), enclosureX: mm(b.centerM?.[0] ?? 0), enclosureY: mm(b.centerM?.[1] ?? 0) });
    } else if (b.kind === 'wall' && b.normal[1] === 0 && b.normal[0] !== 0) {
      // A vertical wall x = p: to the left of the member when the liquid is on its +x side.
      Object.assign(s, { wallBeside: true, wallBesideSide: b.normal[0] > 0 ? 'left' : 'right', wallBesideDistance: mm(Math.abs(b.pointM[0])) });
    } else if (b.kind === 'wall' && b.normal[0] === 0 && b.normal[1] > 0) {
      Object.assign(s, { wallBelow: true, wallBelowDistance: mm(Math.abs(b.pointM[1])) });
    } else if (b.kind === 'free-surface' && b.normal[0] === 0 && b.normal[1] < 0) {
      Object.assign(s, { freeSurface: true, freeSurfaceDistance: mm(Math.abs(b.pointM[1])) });
    } else {
      leftOut++;
    }
  }
  return { surround: s, leftOut };
}

/**
 * The member's submerged section at mid-depth of its liquid range, or null when nothing is submerged.
 * A tube or rod is a circle of its outer diameter; a plate strip is a plate with its width across the
 * motion (along y) and its thickness along the motion (x).
 */
export function sectionFormFromMember(model: MemberModel): { form: SectionForm; about: string } | null {
  const liquid = model.liquid;
  if (!liquid) return null;
  const from = Math.max(0, liquid.fromM);
  const to = Math.min(model.lengthM, liquid.toM);
  if (!(to > from)) return null;
  const z = 0.5 * (from + to);
  const seg = model.segments.find((s) => z >= s.fromM && z <= s.toM);
  if (!seg) return null;
  const p = sectionAt(seg, (z - seg.fromM) / (seg.toM - seg.fromM));
  const body =
    seg.section.shape === 'plate-strip'
      ? newBody('plate', { width: mm(p.outerWidthM), thickness: mm(p.depthM), angle: '90' })
      : newBody('circle', { diameter: mm(p.outerWidthM) });
  const { surround, leftOut } = surroundOf(liquid.boundaries ?? []);
  const about =
    `This member's section at z = ${Number(z.toPrecision(4))} m, in its surroundings, moving sideways (sway x) as it bends.` +
    (leftOut > 0 ? ` ${leftOut} boundary${leftOut > 1 ? ' shapes' : ' shape'} could not be shown here and ${leftOut > 1 ? 'were' : 'was'} left out.` : '');
  return { form: { density: String(liquid.densityKgPerM3), bodies: [body], surround }, about };
}
