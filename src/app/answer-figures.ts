/**
 * The few figures every screen shows for a solved case, whatever engine solved it: the lowest dry and wet
 * frequency and the resonance verdict (the answer panel, the answer bar, the Cases list, the command line).
 */
import type { Verdict } from '../physics/excitation/verdict';
import type { BeamSolved, PlateSolved } from './solve-case';

export interface AnswerFigures {
  lowestDryHz: number;
  /** Null: no liquid, so no wet frequency. */
  lowestWetHz: number | null;
  /** Null: not screened (frequencies only). */
  verdict: Verdict | null;
}

export function answerFigures(a: BeamSolved | PlateSolved): AnswerFigures {
  if (a.engine === 'plate') {
    return { lowestDryHz: a.plate.dry.frequenciesHz[0], lowestWetHz: a.plate.wet?.frequenciesHz[0] ?? null, verdict: a.screening?.verdict ?? null };
  }
  return { lowestDryHz: a.member.dry.frequenciesHz[0], lowestWetHz: a.member.wet?.frequenciesHz[0] ?? null, verdict: a.screening?.verdict ?? null };
}
