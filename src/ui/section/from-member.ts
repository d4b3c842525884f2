/**
 * The Section editor filled from a member: its submerged cross-section (outer size including coating or
 * growth) and the surroundings that confine the liquid around it, moving in sway (x) as the member bends.
 */
import type { MemberModel } from '../../physics/beam/model';
import { sectionBody } from '../../physics/beam/section-bridge';
import { interpolateSection } from '../../physics/beam/section-props';
import type { BodySpec, SectionInput } from '../../physics/section/types';
import type { SectionForm } from './form';
import { formFromInput, leftOutNote } from './form-from-input';

/** A member's submerged section as the solver's input, with a line on where it was taken. */
export interface MemberSection {
  input: SectionInput;
  about: string;
  /**
   * True when the liquid level lies below the member's top: the member stands up through the surface, so its
   * cross-section is horizontal and the Section view is a plan view (walls beside it, neighbouring piles).
   */
  plan: boolean;
}

/**
 * The member's submerged section at mid-depth of its liquid range, or null when nothing is submerged:
 * the body its shape gives the section solver (src/physics/shapes), coating included.
 */
export function sectionFromMember(model: MemberModel): MemberSection | null {
  const liquid = model.liquid;
  if (!liquid) return null;
  const from = Math.max(0, liquid.fromM);
  const to = Math.min(model.lengthM, liquid.toM);
  if (!(to > from)) return null;
  const z = 0.5 * (from + to);
  const seg = model.segments.find((s) => z >= s.fromM && z <= s.toM);
  if (!seg) return null;
  // The body the member's shape gives the section solver (src/physics/shapes), coating included.
  const body: BodySpec = sectionBody(interpolateSection(seg, (z - seg.fromM) / (seg.toM - seg.fromM)), seg.coating?.thicknessM ?? 0);
  // The member's own boundaries, as the member engine solves them (none dropped, no rounding).
  const input: SectionInput = { liquidDensityKgPerM3: liquid.densityKgPerM3, bodies: [body] };
  if (liquid.boundaries && liquid.boundaries.length > 0) input.boundaries = [...liquid.boundaries];
  const about = `This member's section at z = ${Number(z.toPrecision(4))} m, in its surroundings, moving sideways (sway x) as it bends.`;
  return { input, about, plan: liquid.toM < model.lengthM };
}

/** The same section as the editor's form (millimetre text), for showing it; see sectionFromMember. */
export function sectionFormFromMember(model: MemberModel): { form: SectionForm; about: string } | null {
  const s = sectionFromMember(model);
  if (!s) return null;
  const { form, leftOut } = formFromInput(s.input);
  return { form, about: s.about + leftOutNote(leftOut) };
}
