/**
 * Words for a case whose solve gave no answer (the worker ran past its time limit, or stopped): "This input could
 * not be solved: …", naming the field that most likely caused it — the one holding the most extreme number as
 * entered — so the user knows where to look. The last good results stay on screen, marked out of date.
 */
import type { Case } from '../../case';
import { FORMS } from '../../kinds/registry';
import type { Answer } from '../../worker/solver-client';
import { CASE_ADVICE, solverFailureWords } from './solver-words';

/**
 * Orders of magnitude (from 1, in the unit as entered) from which a number is named as the likely cause: no
 * dimension, property, speed or count of a member, entered in its everyday unit, comes within a million of 1
 * either way (common practice, no source).
 */
export const EXTREME_DECADES = 6;

const NUMBER = /[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/;

/** How many decades the first number in an entry lies from 1; 0 for none, zero, or a number that is not finite. */
function decadesFromOne(entry: string): number {
  const m = NUMBER.exec(entry);
  if (!m) return 0;
  const x = Math.abs(Number(m[0]));
  // "1e999" reads as Infinity: as extreme as it gets.
  if (x === Infinity) return Number.MAX_VALUE;
  return x > 0 ? Math.abs(Math.log10(x)) : 0;
}

/** The field (label and entry) most likely to have made the solve fail, or null when no entry is extreme. */
export function likelyField(doc: Pick<Case, 'kind' | 'inputs'>): { label: string; entry: string } | null {
  const fields = FORMS[doc.kind]?.fields ?? [];
  let best: { label: string; entry: string } | null = null;
  let worst = EXTREME_DECADES;
  for (const f of fields) {
    const entry = doc.inputs[f.key];
    if (typeof entry !== 'string') continue;
    const d = decadesFromOne(entry);
    if (d >= worst && (best === null || d > worst)) {
      worst = d;
      best = { label: f.label, entry };
    }
  }
  return best;
}

/** The sentence for a timeout or crash of a case's solve; null for an answer (done) or a replaced request. */
export function caseSolverWords(answer: Answer<unknown>, doc: Pick<Case, 'kind' | 'inputs'>): string | null {
  const likely = likelyField(doc);
  const advice = likely
    ? {
        timeout: `The likely cause is ${likely.label.toLowerCase()} (${JSON.stringify(likely.entry)}): check it for a stray exponent or a wrong unit.`,
        crashed: `The likely cause is ${likely.label.toLowerCase()} (${JSON.stringify(likely.entry)}). Your inputs are kept; change a value to try again.`,
      }
    : CASE_ADVICE;
  const words = solverFailureWords(answer, advice);
  return words === null ? null : `This input could not be solved: ${words.charAt(0).toLowerCase()}${words.slice(1)}`;
}
