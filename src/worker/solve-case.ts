/**
 * What the solver worker does, as plain functions (tested in Node without a worker):
 * a whole case (member modes dry and wet, then the resonance screening), or one section.
 * Input errors come back as messages, never as exceptions across the worker boundary.
 */
import { solveMember } from '../physics/beam';
import type { MemberModel } from '../physics/beam/model';
import type { MemberFailureReason, MemberResult } from '../physics/beam/result';
import { screenResonance } from '../physics/excitation';
import { screeningInputFor, type CaseExcitation } from '../physics/excitation/from-member';
import type { ScreeningResult } from '../physics/excitation/results';

export interface CaseRequest {
  op: 'case';
  model: MemberModel;
  /** Null: no screening inputs yet (frequencies only). */
  excitation: CaseExcitation | null;
}

export type CaseAnswer =
  | {
      ok: true;
      member: MemberResult;
      screening: ScreeningResult | null;
      /** Why the screening could not run, in words (the frequencies are still good). */
      screeningError: string | null;
      elapsedMs: number;
    }
  | { ok: false; reason: MemberFailureReason | 'invalid-input'; message: string };

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function solveCase(req: CaseRequest, now: () => number = () => performance.now()): CaseAnswer {
  const t0 = now();
  let outcome;
  try {
    outcome = solveMember(req.model);
  } catch (e) {
    return { ok: false, reason: 'invalid-input', message: message(e) };
  }
  if (!outcome.ok) return outcome;
  let screening: ScreeningResult | null = null;
  let screeningError: string | null = null;
  if (req.excitation) {
    try {
      screening = screenResonance(screeningInputFor(req.model, outcome.result, req.excitation));
    } catch (e) {
      screeningError = message(e);
    }
  }
  return { ok: true, member: outcome.result, screening, screeningError, elapsedMs: now() - t0 };
}
