/**
 * The band of a case over the ranges entered in the form: for each mode, dry and wet, the frequency at the
 * likely values and the lowest and highest over the ranges; what drives it; and each resonance check judged
 * over the band. A ranged form field may drive several numbers of the member model (a fixity depth moves the
 * length and every landmark; a growth thickness every growth segment), so the member is rebuilt by the kind's
 * own builder at each setting (`parametricBand` with `modelAt`), and the excitation read again for it (a
 * current profile follows the mudline). One function for the worker and the command line.
 */
import type { MemberBuild } from '../kinds/common/types';
import type { Case } from '../case';
import { readExcitation } from '../forms/excitation';
import { type FormRange, valuesAt } from '../forms/ranges';
import { readCaseRanges } from './case-ranges';
import type { FieldErrors } from '../forms/types';
import { kindOf } from '../kinds/registry';
import type { MemberModel } from '../physics/beam/model';
import type { CaseExcitation } from '../physics/excitation/from-member';
import { type BandResult, type BandVerdict, parametricBand, screenBand } from '../physics/uncertain';
import { rememberingSectionSolver } from '../physics/uncertain/evaluate';

/**
 * Solve budget of a band in the app: enough for the axis scans, every corner and a sampled search over up to
 * six inputs, and a band within a few seconds on a tablet when a mode needs the search (the core's note says
 * when the search stopped at the budget).
 */
export const APP_MAX_SOLVES = 200;

export type BandCase = Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem' | 'ranges'>;

export interface BandRequest {
  op: 'band';
  case: BandCase;
}

export type BandAnswer =
  /** No range is on: nothing to do. */
  | { ok: true; band: null; ranges: [] }
  | {
      ok: true;
      band: BandResult;
      /** The ranged inputs in band order (labels and units for wording; `band.ranges[i].path` is the field key). */
      ranges: FormRange[];
      /** The checks over the band, or null with the reason when there is no screening. */
      verdict: BandVerdict | null;
      verdictError: string | null;
      elapsedMs: number;
    }
  /** Messages by field key (a range that does not read), or one message (the member or a solve failed). */
  | { ok: false; errors: FieldErrors; message: string };

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function bandCase(c: BandCase, now: () => number = () => performance.now()): BandAnswer {
  const t0 = now();
  const kind = kindOf(c.kind);
  const form = kind.form;
  const built = form.build(c.inputs, c.unitSystem);
  if (!built.ok) return { ok: false, errors: built.errors, message: 'the member inputs do not read: fix them first' };
  // Ranges are read for beam members; a plate panel has no uncertain inputs listed yet.
  if (built.build.engine === 'plate') return { ok: true, band: null, ranges: [] };
  const likelyBuild = built.build;
  const read = readCaseRanges(c);
  if (!read.ok) return { ok: false, errors: read.errors, message: Object.values(read.errors)[0] };
  const ranges = read.ranges;
  if (ranges.length === 0) return { ok: true, band: null, ranges: [] };

  const buildAt = (x: ArrayLike<number>): MemberBuild => {
    const r = form.build(valuesAt(form.fields, c.inputs, ranges, x, c.unitSystem), c.unitSystem);
    if (!r.ok) throw new RangeError(Object.values(r.errors)[0] ?? 'the member does not read at this setting');
    if (r.build.engine === 'plate') throw new RangeError('a plate panel has no band');
    return r.build;
  };
  const modelAt = (x: ArrayLike<number>): MemberModel => buildAt(x).model;
  const excitationAt = (x: ArrayLike<number>): CaseExcitation => {
    const e = readExcitation(kind.resonance, c.excitation, c.unitSystem, buildAt(x));
    if (!e.ok) throw new RangeError(Object.values(e.errors)[0] ?? 'the resonance inputs do not read');
    return e.excitation;
  };
  const inputs = ranges.map((r) => ({ path: r.key, low: r.low, high: r.high, likely: r.likely }));
  const sectionSolver = rememberingSectionSolver();
  let outcome;
  try {
    outcome = parametricBand(likelyBuild.model, inputs, modelAt, { sectionSolver, maxSolves: Math.max(APP_MAX_SOLVES, 1 + 4 * inputs.length + 2 ** inputs.length) });
  } catch (e) {
    return { ok: false, errors: {}, message: message(e) };
  }
  if (!outcome.ok) return { ok: false, errors: {}, message: outcome.message };
  const band = outcome.band;

  let verdict: BandVerdict | null = null;
  let verdictError: string | null = null;
  const ex = readExcitation(kind.resonance, c.excitation, c.unitSystem, likelyBuild);
  if (ex.ok) {
    try {
      const s = screenBand(likelyBuild.model, band, ex.excitation, { sectionSolver, modelAt, excitationAt });
      if (s.ok) verdict = s.verdict;
      else verdictError = s.message;
    } catch (e) {
      verdictError = message(e);
    }
  } else {
    verdictError = 'the resonance inputs do not read';
  }
  return { ok: true, band, ranges, verdict, verdictError, elapsedMs: now() - t0 };
}
