/**
 * A whole case as entered → what the solver needs: the member build and the resonance inputs, or the
 * messages by field. One function for the app, the worker's caller and the command line.
 */
import type { Case } from '../case';
import type { CaseExcitation } from '../physics/excitation/from-member';
import type { MemberBuild, PlateBuild } from '../kinds/common/types';
import { kindOf } from '../kinds/registry';
import { type PlateExcitation, readPlateExcitation } from '../kinds/plate-panel/excitation';
import { readExcitation } from '../forms/excitation';
import { FORM_ERROR_KEY, type FieldErrors, type FieldWarnings } from '../forms/types';
import { isUnitReaderPending } from '../units/reader-pending';
import type { CaseRequest } from './solve-case';

/**
 * `warnings`: accepted values outside their soft range, by field key (member and resonance fields together;
 * their keys differ), to show beside the fields, with the results and in the report.
 */
export type CaseReading =
  | { ok: true; engine: 'beam'; build: MemberBuild; excitation: CaseExcitation | null; excitationErrors: FieldErrors; warnings: FieldWarnings }
  | { ok: true; engine: 'plate'; build: PlateBuild; excitation: PlateExcitation | null; excitationErrors: FieldErrors; warnings: FieldWarnings }
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
    // Not an input error: the browser's unit reader is still loading; the caller loads it and reads again.
    if (isUnitReaderPending(e)) throw e;
    const why = e instanceof Error ? e.message : String(e);
    return { ok: false, errors: { [FORM_ERROR_KEY]: `These inputs cannot be computed (${why.slice(0, 200)}); check the values for a stray exponent or a wrong unit.` }, excitationErrors: {} };
  }
}

function readCaseUnsafe(c: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>): CaseReading {
  const kind = kindOf(c.kind);
  const r = kind.form.build(c.inputs, c.unitSystem);
  if (!r.ok) return { ok: false, errors: r.errors, excitationErrors: {} };
  const build = r.build;
  if (build.engine === 'plate') {
    const e = readPlateExcitation(c.excitation, c.unitSystem);
    return e.ok
      ? { ok: true, engine: 'plate', build, excitation: e.excitation, excitationErrors: {}, warnings: r.warnings }
      : { ok: true, engine: 'plate', build, excitation: null, excitationErrors: e.errors, warnings: r.warnings };
  }
  const e = readExcitation(kind.resonance, c.excitation, c.unitSystem, build);
  return e.ok
    ? { ok: true, engine: 'beam', build, excitation: e.excitation, excitationErrors: {}, warnings: { ...r.warnings, ...e.warnings } }
    : { ok: true, engine: 'beam', build, excitation: null, excitationErrors: e.errors, warnings: r.warnings };
}

/** Input warnings as sentences for the results, the report and the command line: "Liquid density: …". */
export function warningLines(warnings: FieldWarnings): string[] {
  return Object.values(warnings).map((m) => `Input check: ${m.charAt(0).toUpperCase()}${m.slice(1)}.`);
}

/** The solver request for a case that reads, by the engine its kind names. */
export function requestOf(reading: Extract<CaseReading, { ok: true }>): CaseRequest {
  return reading.engine === 'plate'
    ? { op: 'case', engine: 'plate', plate: reading.build.plate, excitation: reading.excitation }
    : { op: 'case', model: reading.build.model, excitation: reading.excitation };
}
