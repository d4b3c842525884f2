/**
 * Guided forms for the four member kinds, shared by the app and the command line.
 *
 *   const form = FORMS.pile;
 *   const values = form.defaults('si');              // { outerDiameter: '610', ... } as typed
 *   const r = form.build(values, 'si');               // reads, checks, builds
 *   if (r.ok) solveMember(r.build.model); else show(r.errors);   // errors by field key, '_form' for the rest
 *   form.convertValues(values, 'si', 'us');          // when the user toggles units
 */
import { MEMBER_KINDS, type MemberKind } from '../physics/members';
import { BAFFLE_FORM } from './baffle';
import { PILE_FORM } from './pile';
import { RISER_FORM } from './riser';
import { STEM_FORM } from './stem';
import type { MemberForm } from './types';

export type * from './types';
export { FORM_ERROR_KEY } from './types';
export { convertFieldValues, defineForm } from './define';
export type { FormSpec } from './define';
export { choiceValue, fieldUnit, isShown, readFields } from './read';
export type { Reader, ReadValue } from './read';
export { placeholderOf } from './hints';
export { DEMO_CASES } from './demo-cases';
export { CONTENTS_CHOICES, MATERIAL_CHOICES } from './presets';
export { PILE_FORM, RISER_FORM, BAFFLE_FORM, STEM_FORM };

export { MEMBER_KINDS };

/** The form of each member kind. */
export const FORMS: { readonly [K in MemberKind]: MemberForm<K> } = {
  pile: PILE_FORM,
  riser: RISER_FORM,
  baffle: BAFFLE_FORM,
  stem: STEM_FORM,
};
