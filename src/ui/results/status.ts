/**
 * The line above the results that says whether they belong to the inputs on screen. Last results stay
 * visible when the inputs change or have errors, marked out of date, never silently.
 */

export interface StatusInput {
  hasResults: boolean;
  stale: boolean;
  computing: boolean;
  /** Field messages on the Member form (member and resonance inputs). */
  errorsCount: number;
}

export interface StatusLine {
  tone: 'stale' | 'busy' | 'empty' | 'note';
  text: string;
}

function errorsWord(n: number): string {
  return n === 1 ? '1 error' : `${n} errors`;
}

export function statusLine({ hasResults, stale, computing, errorsCount }: StatusInput): StatusLine | null {
  if (!hasResults) {
    if (errorsCount > 0) return { tone: 'empty', text: `No results yet: the Member form has ${errorsWord(errorsCount)}. Fix the marked fields and the results appear here.` };
    if (computing) return { tone: 'busy', text: 'Computing…' };
    return { tone: 'empty', text: 'No results yet. Fill in the Member form: the results appear here as soon as the inputs are complete.' };
  }
  if (stale) {
    if (errorsCount > 0) {
      return { tone: 'stale', text: `Out of date: the inputs have ${errorsWord(errorsCount)}. These are the last results; fix the marked fields on the Member form.` };
    }
    return { tone: 'stale', text: computing ? 'Out of date: the inputs changed. Recomputing…' : 'Out of date: the inputs changed since these results.' };
  }
  if (computing) return { tone: 'busy', text: 'Recomputing…' };
  // Results current but some (resonance) inputs unreadable: the frequencies stand, the verdict may be missing.
  if (errorsCount > 0) return { tone: 'note', text: `The Member form has ${errorsWord(errorsCount)}: fix them for a complete result.` };
  return null;
}
