/**
 * Words for a solve that gave no answer: the worker ran past its time limit, or stopped. Every screen that
 * solves (Member, Results, Section) shows the same sentence, followed by advice that fits what it solves.
 */
import type { Answer } from '../../worker/solver-client';

export interface SolverAdvice {
  /** What to try after a timeout. */
  timeout: string;
  /** What to try after a crash. */
  crashed: string;
}

/** Advice on the Member and Results screens (a whole case). */
export const CASE_ADVICE: SolverAdvice = {
  timeout: 'Check the inputs for extreme values.',
  crashed: 'Your inputs are kept; change a value to try again.',
};

/** Advice on the Section screen (one cross-section). */
export const SECTION_ADVICE: SolverAdvice = {
  timeout: 'Try fewer bodies.',
  crashed: 'Your section is kept; change a value to try again.',
};

/** The sentence for a timeout or a crash; null for an answer that came back (done) or was replaced (superseded). */
export function solverFailureWords(answer: Answer<unknown>, advice: SolverAdvice): string | null {
  switch (answer.status) {
    case 'timeout':
      return `The solver took longer than ${Math.round(answer.afterMs / 1000)} s and was stopped. ${advice.timeout}`;
    case 'crashed':
      return `The solver stopped unexpectedly (${answer.message}). ${advice.crashed}`;
    default:
      return null;
  }
}
