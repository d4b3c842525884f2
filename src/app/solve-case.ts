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
import { solvePlate, type PlateInput, type PlateOutcome, type PlateResult } from '../physics/plate';
import type { KindEngine } from '../kinds/kind-module';
import type { PlateExcitation } from '../kinds/plate-panel/excitation';
import { type PlateScreening, screenPlate } from '../kinds/plate-panel/screen';

/** A beam member's request; `engine` absent = 'beam' (`KindModule.engine`, src/kinds/kind-module.ts). */
export interface BeamCaseRequest {
  op: 'case';
  engine?: 'beam';
  model: MemberModel;
  /** Null: no screening inputs yet (frequencies only). */
  excitation: CaseExcitation | null;
}

/** A plate panel's request (src/physics/plate). */
export interface PlateCaseRequest {
  op: 'case';
  engine: 'plate';
  plate: PlateInput;
  excitation: PlateExcitation | null;
}

export type CaseRequest = BeamCaseRequest | PlateCaseRequest;

export interface BeamSolved {
  ok: true;
  engine?: 'beam';
  member: MemberResult;
  screening: ScreeningResult | null;
  /** Why the screening could not run, in words (the frequencies are still good). */
  screeningError: string | null;
  elapsedMs: number;
}

export interface PlateSolved {
  ok: true;
  engine: 'plate';
  plate: PlateResult;
  screening: PlateScreening | null;
  screeningError: string | null;
  elapsedMs: number;
}

type PlateFailureReason = Extract<PlateOutcome, { ok: false }>['reason'];

export type CaseAnswer = BeamSolved | PlateSolved | { ok: false; reason: MemberFailureReason | PlateFailureReason | 'invalid-input'; message: string };

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

export function solveCase(req: CaseRequest, now: () => number = () => performance.now()): CaseAnswer {
  const engine: KindEngine = req.engine ?? 'beam';
  switch (engine) {
    case 'beam':
      return solveBeamCase(req as BeamCaseRequest, now);
    case 'plate':
      return solvePlateCase(req as PlateCaseRequest, now);
  }
}

function solveBeamCase(req: BeamCaseRequest, now: () => number): CaseAnswer {
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

function solvePlateCase(req: PlateCaseRequest, now: () => number): CaseAnswer {
  const t0 = now();
  let outcome: PlateOutcome;
  try {
    outcome = solvePlate(req.plate);
  } catch (e) {
    return { ok: false, reason: 'invalid-input', message: message(e) };
  }
  if (!outcome.ok) return outcome;
  let screening: PlateScreening | null = null;
  let screeningError: string | null = null;
  if (req.excitation) {
    try {
      screening = screenPlate(outcome.result, req.excitation);
    } catch (e) {
      screeningError = message(e);
    }
  }
  return { ok: true, engine: 'plate', plate: outcome.result, screening, screeningError, elapsedMs: now() - t0 };
}
