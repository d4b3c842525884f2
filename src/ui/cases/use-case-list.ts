/** Loads the saved list from the store and reloads it on demand (after every change made on this screen) and when another tab changes it. */
import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import type { CaseList, CaseStore } from '../../store';
import { sentence } from './words';

export type ListState =
  | { status: 'waiting' }
  | { status: 'loaded'; list: CaseList }
  | { status: 'failed'; message: string };

export function useCaseList(store: CaseStore | null): [ListState, () => Promise<void>] {
  const [state, setState] = useState<ListState>({ status: 'waiting' });
  // Only the latest load may write the state (a slow early answer must not replace a newer one).
  const seq = useRef(0);
  const reload = useCallback(async () => {
    if (!store) return;
    const mine = ++seq.current;
    const r = await store.listCases();
    if (mine !== seq.current) return;
    setState(r.ok ? { status: 'loaded', list: r.value } : { status: 'failed', message: sentence(r.message) });
  }, [store]);
  useEffect(() => {
    void reload();
    // Another tab saved, deleted or restored a case: read the list again.
    return store?.onChange((c) => {
      if (c.type !== 'drafts') void reload();
    });
  }, [reload, store]);
  return [state, reload];
}
