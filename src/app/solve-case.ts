/**
 * Solving a case, for the worker (src/worker keeps only the message adapter), the UI's tests and the command
 * line: the member's modes dry and wet by the engine its kind names, then the resonance screening.
 * Input errors come back as messages, never as exceptions across the worker boundary.
 */
import { solveMember } from '../physics/beam';
import type { MemberModel } from '../physics/beam/model';
import type { MemberFailureReason, MemberResult } from '../physics/beam/result';
import { screenResonance } from '../physics/excitation';
import { screeningInputFor, type CaseExcitation } from '../physics/excitation/from-member';
import type { ScreeningResult } from '../physics/excitation/results';
import type { KindEngine } from '../kinds/kind-module';

export interface CaseRequest {
  op: 'case';
  /**
   * The engine that solves the model (`KindModule.engine`, src/kinds/kind-module.ts); absent = 'beam'. A kind
   * that is not a beam adds its engine and model type here as another branch of this request.
   */
  engine?: KindEngine;
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
  const engine: KindEngine = req.engine ?? 'beam';
  switch (engine) {
    case 'beam':
      return solveBeamCase(req, now);
  }
}

function solveBeamCase(req: CaseRequest, now: () => number): CaseAnswer {
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
