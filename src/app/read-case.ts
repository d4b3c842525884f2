/**
 * A whole case as entered → what the solver needs: the member build and the resonance inputs, or the
 * messages by field. One function for the app, the worker's caller and the command line.
 */
import type { Case } from '../case';
import type { CaseExcitation } from '../physics/excitation/from-member';
import type { MemberBuild } from '../kinds/common/types';
import { kindOf } from '../kinds/registry';
import { readExcitation } from '../forms/excitation';
import { FORM_ERROR_KEY, type FieldErrors } from '../forms/types';

export type CaseReading =
  | { ok: true; build: MemberBuild; excitation: CaseExcitation | null; excitationErrors: FieldErrors }
  | { ok: false; errors: FieldErrors; excitationErrors: FieldErrors };

/**
 * Reads the member fields, then (only if they are good) the resonance fields. Bad resonance inputs do not
 * stop the frequencies: the excitation is null and its messages come back beside the fields.
 */
export function readCase(c: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>): CaseReading {
  // Total: whatever a case holds, reading it gives a build or messages, never a throw (a draft, link or file
  // that threw here would stop the app from opening it, or from starting at all).
  try {
    return readCaseUnsafe(c);
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    return { ok: false, errors: { [FORM_ERROR_KEY]: `These inputs cannot be computed (${why.slice(0, 200)}); check the values for a stray exponent or a wrong unit.` }, excitationErrors: {} };
  }
}

function readCaseUnsafe(c: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>): CaseReading {
  const kind = kindOf(c.kind);
  const r = kind.form.build(c.inputs, c.unitSystem);
  if (!r.ok) return { ok: false, errors: r.errors, excitationErrors: {} };
  const e = readExcitation(kind.resonance, c.excitation, c.unitSystem, r.build);
  return e.ok
    ? { ok: true, build: r.build, excitation: e.excitation, excitationErrors: {} }
    : { ok: true, build: r.build, excitation: null, excitationErrors: e.errors };
}
