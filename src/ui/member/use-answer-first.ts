import { useEffect, useState } from 'preact/hooks';
import type { ModelState } from '../state/app-model';

/** Longest the form waits for the first answer before it is drawn anyway (a slow solve must not hide it). */
const FORM_WAIT_MS = 1000;

/**
 * Whether the Member screen may draw its form yet. On the screen's first showing with a solve under way, the
 * answer panel is drawn first and the form (dozens of fields, the most work on a slow tablet's main thread) once
 * the answer has come, or after FORM_WAIT_MS, so the answer is not held back behind the form. Once drawn, the
 * form stays.
 */
export function useAnswerFirst(state: Pick<ModelState, 'computing'>): boolean {
  const [shown, setShown] = useState(!state.computing);
  const ready = shown || !state.computing;
  useEffect(() => {
    if (ready) {
      if (!shown) setShown(true);
      return;
    }
    const t = setTimeout(() => setShown(true), FORM_WAIT_MS);
    return () => clearTimeout(t);
  }, [ready, shown]);
  return ready;
}
