/**
 * Reading the ranges of a case, on its own so the Member screen (which reads one range as it is typed) does not
 * bring the band solver (src/physics/uncertain, the beam solver behind it) into the app's first load.
 */
import type { Case } from '../case';
import { type FormRange, readRanges } from '../forms/ranges';
import type { FieldErrors } from '../forms/types';
import { kindOf } from '../kinds/registry';
import { rangesOf } from '../kinds/ranges-registry';

/** The ranges of a case as read (SI), or messages by field key naming the field in the user's units. */
export function readCaseRanges(c: Pick<Case, 'kind' | 'inputs' | 'unitSystem' | 'ranges'>): { ok: true; ranges: FormRange[] } | { ok: false; errors: FieldErrors } {
  const form = kindOf(c.kind).form;
  return readRanges(form.fields, rangesOf(c.kind), c.inputs, c.ranges, c.unitSystem);
}
