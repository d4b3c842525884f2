/**
 * The guided-form engine, shared by the app and the command line. Each kind's form lives in its folder
 * (src/kinds/<kind>/form.ts); `FORMS` and `DEMO_CASES` come from the registry (src/kinds/registry.ts):
 *
 *   const form = KINDS.pile.form;
 *   const values = form.defaults('si');              // { outerDiameter: '610', ... } as typed
 *   const r = form.build(values, 'si');               // reads, checks, builds
 *   if (r.ok) solveMember(r.build.model); else show(r.errors);   // errors by field key, '_form' for the rest
 *   form.convertValues(values, 'si', 'us');          // when the user toggles units
 */

export type * from './types';
export { FORM_ERROR_KEY } from './types';
export { convertFieldValues, defineForm } from './define';
export type { FormSpec } from './define';
export { choiceValue, fieldUnit, isShown, readFields } from './read';
export type { Reader, ReadValue } from './read';
export { placeholderOf } from './hints';
export { CONTENTS_CHOICES, MATERIAL_CHOICES } from './presets';
