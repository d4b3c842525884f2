/**
 * Persistent storage is asked for once per visit, after the user's first save (a user gesture; Firefox shows
 * a prompt then). The answer is kept here so `PersistenceNote` can show it wherever it is placed.
 */
import type { PersistenceAnswer } from '../../store/persistence';

interface Asker {
  requestPersistence(): Promise<PersistenceAnswer>;
}

let answer: PersistenceAnswer | null = null;
let asking: Promise<PersistenceAnswer> | null = null;
const listeners = new Set<() => void>();

/** The browser's answer, or null when not asked yet in this visit. */
export function persistenceAnswer(): PersistenceAnswer | null {
  return answer;
}

export function onPersistenceAnswer(fn: () => void): () => void {
  listeners.add(fn);
  return () => listeners.delete(fn);
}

/** Call after a successful save by the user. Asks only the first time; later calls give the same answer. */
export function askPersistenceOnce(store: Asker): Promise<PersistenceAnswer> {
  if (!asking) {
    asking = store.requestPersistence().then((a) => {
      answer = a;
      for (const fn of listeners) fn();
      return a;
    });
  }
  return asking;
}

/** For tests: forget the answer. */
export function resetPersistenceForTests(): void {
  answer = null;
  asking = null;
  listeners.clear();
}
