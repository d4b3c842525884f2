/**
 * The Section editor filled from a member: its submerged cross-section (outer size including coating or
 * growth) and the surroundings that confine the liquid around it, moving in sway (x) as the member bends.
 */
import type { MemberModel } from '../../physics/beam/model';
import { sectionBody } from '../../physics/beam/section-bridge';
import { interpolateSection } from '../../physics/beam/section-props';
import type { BodySpec, BoundarySpec } from '../../physics/section/types';
import type { BodyForm } from './form';
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

/** A section-solver body as the editor's body form (millimetre text; angles in degrees). */
function bodyForm(b: BodySpec): BodyForm {
  const place = { x: mm(b.centerM?.[0] ?? 0), y: mm(b.centerM?.[1] ?? 0) };
  const angle = 'angleDeg' in b && b.angleDeg !== undefined ? { angle: String(b.angleDeg) } : {};
  switch (b.shape) {
    case 'circle':
      return newBody(b.shape, { diameter: mm(b.diameterM), ...(b.centerM ? place : {}) });
    case 'plate':
      return newBody(b.shape, { width: mm(b.widthM), thickness: mm(b.thicknessM), ...angle, ...(b.centerM ? place : {}) });
    case 'rectangle':
      return newBody(b.shape, { width: mm(b.widthM), height: mm(b.heightM), ...(b.cornerRadiusM ? { cornerRadius: mm(b.cornerRadiusM) } : {}), ...angle, ...(b.centerM ? place : {}) });
    case 'ellipse':
      return newBody(b.shape, { width: mm(b.widthM), height: mm(b.heightM), ...angle, ...(b.centerM ? place : {}) });
    case 'polygon':
      return newBody(b.shape, { points: b.pointsM.map(([x, y]) => `${mm(x)} ${mm(y)}`).join(', '), ...angle, ...(b.centerM ? place : {}) });
  }
}

/**
 * The member's submerged section at mid-depth of its liquid range, or null when nothing is submerged:
 * the body its shape gives the section solver (src/physics/shapes), coating included.
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
  const body = bodyForm(sectionBody(interpolateSection(seg, (z - seg.fromM) / (seg.toM - seg.fromM)), seg.coating?.thicknessM ?? 0));
  const { surround, leftOut } = surroundOf(liquid.boundaries ?? []);
  const about =
    `This member's section at z = ${Number(z.toPrecision(4))} m, in its surroundings, moving sideways (sway x) as it bends.` +
    (leftOut > 0 ? ` ${leftOut} boundary${leftOut > 1 ? ' shapes' : ' shape'} could not be shown here and ${leftOut > 1 ? 'were' : 'was'} left out.` : '');
  return { form: { density: String(liquid.densityKgPerM3), bodies: [body], surround }, about };
}
