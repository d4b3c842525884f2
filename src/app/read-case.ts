/**
 * A whole case as entered → what the solver needs: the member build and the resonance inputs, or the
 * messages by field. One function for the app, the worker's caller and the command line.
 */
import type { Case } from '../case';
import type { CaseExcitation } from '../physics/excitation/from-member';
import type { MemberBuild } from '../kinds/common/types';
import { kindOf } from '../kinds/registry';
import { readExcitation } from '../forms/excitation';
import type { FieldErrors } from '../forms/types';

export type CaseReading =
  | { ok: true; build: MemberBuild; excitation: CaseExcitation | null; excitationErrors: FieldErrors }
  | { ok: false; errors: FieldErrors; excitationErrors: FieldErrors };

/**
 * Reads the member fields, then (only if they are good) the resonance fields. Bad resonance inputs do not
 * stop the frequencies: the excitation is null and its messages come back beside the fields.
 */
export function readCase(c: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>): CaseReading {
  const kind = kindOf(c.kind);
  const r = kind.form.build(c.inputs, c.unitSystem);
  if (!r.ok) return { ok: false, errors: r.errors, excitationErrors: {} };
  const e = readExcitation(kind.resonance, c.excitation, c.unitSystem, r.build);
  return e.ok
    ? { ok: true, build: r.build, excitation: e.excitation, excitationErrors: {} }
    : { ok: true, build: r.build, excitation: null, excitationErrors: e.errors };
}
