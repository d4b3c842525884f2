import { useEffect, useState } from 'preact/hooks';
import type { ModelState } from '../state/app-model';

/** Longest the form waits for the first answer before it is drawn anyway (a slow solve must not hide it). */
const FORM_WAIT_MS = 1000;

/** The page has not shown the Member screen yet (its first showing is the page's first paint of an answer). */
let pageFirstShowing = true;

/**
 * Whether the Member screen may draw its form (and schematic) yet. On the screen's first showing with a solve
 * under way, the answer panel is drawn first, and the form (dozens of fields, the most work on a slow tablet's
 * main thread) in the render after the answer's, or after FORM_WAIT_MS, so the answer is not held back behind
 * the form. The page's first showing does so even when the answer is already in hand: the form is then drawn
 * just after the answer has been painted (effects run after the paint), not in the same long render. Once drawn,
 * the form stays.
 */
export function useAnswerFirst(state: Pick<ModelState, 'computing'>): boolean {
  const [shown, setShown] = useState(() => {
    const first = pageFirstShowing;
    pageFirstShowing = false;
    return !state.computing && !first;
  });
  useEffect(() => {
    if (shown) return;
    // The answer has been drawn (effects run after the render that showed it): the form follows.
    if (!state.computing) {
      setShown(true);
      return;
    }
    const t = setTimeout(() => setShown(true), FORM_WAIT_MS);
    return () => clearTimeout(t);
  }, [shown, state.computing]);
  return shown;
}
