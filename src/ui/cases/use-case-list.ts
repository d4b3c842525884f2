/**
 * The saved list as light rows from the store's list indexes (no full case is read), in the chosen order. It is
 * read again after changes made elsewhere (another tab) and after renames and copies; a delete or an undo only
 * takes the row out or puts it back in place, without reading the list again.
 */
import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import { compareSummaries, type CaseRows, type CaseSort, type CaseStore, type CaseSummary } from '../../store';
import { sentence } from './words';

export type ListState =
  | { status: 'waiting' }
  | { status: 'loaded'; list: CaseRows }
  | { status: 'failed'; message: string };

export interface CaseListControl {
  state: ListState;
  sort: CaseSort;
  setSort: (s: CaseSort) => void;
  reload: () => Promise<void>;
  /** Takes one row (or unreadable record) out of the loaded list. */
  dropRow: (key: string) => void;
  /** Puts a row into the loaded list at its place in the current order. */
  placeRow: (row: CaseSummary) => void;
}

/** Rows read first, so the screen shows a page at once while the whole (light) list is read. */
const FIRST_ROWS = 50;

export function useCaseList(store: CaseStore | null): CaseListControl {
  const [state, setState] = useState<ListState>({ status: 'waiting' });
  const [sort, setSort] = useState<CaseSort>('updated');
  // Only the latest load may write the state (a slow early answer must not replace a newer one).
  const seq = useRef(0);
  const sortShown = useRef<CaseSort | null>(null);
  // Read at the time of use, so an Undo offered before the order changed puts the row in the current order.
  const sortNow = useRef(sort);
  sortNow.current = sort;
  const reload = useCallback(async () => {
    if (!store) return;
    const mine = ++seq.current;
    const show = (r: Awaited<ReturnType<CaseStore['listRows']>>) =>
      setState(r.ok ? { status: 'loaded', list: r.value } : { status: 'failed', message: sentence(r.message) });
    // Nothing on screen yet (first load): show the first page as soon as it is read, then the whole list.
    if (sortShown.current !== sort) {
      const first = await store.listRows(sort, FIRST_ROWS);
      if (mine !== seq.current) return;
      if (!first.ok || !first.value.complete) {
        sortShown.current = sort;
        show(first);
      }
      if (!first.ok) return;
    }
    const r = await store.listRows(sort);
    if (mine !== seq.current) return;
    sortShown.current = sort;
    show(r);
  }, [store, sort]);
  useEffect(() => {
    void reload();
    // Another tab saved, deleted or restored a case: read the list again.
    return store?.onChange((c) => {
      if (c.type !== 'drafts') void reload();
    });
  }, [reload, store]);
  const dropRow = useCallback((key: string) => {
    seq.current++;
    setState((s) =>
      s.status !== 'loaded'
        ? s
        : {
            status: 'loaded',
            list: {
              ...s.list,
              rows: s.list.rows.filter((r) => r.id !== key),
              unreadable: s.list.unreadable.filter((u) => u.key !== key),
              total: s.list.total - (s.list.rows.some((r) => r.id === key) ? 1 : 0),
            },
          },
    );
  }, []);
  const placeRow = useCallback(
    (row: CaseSummary) => {
      seq.current++;
      setState((s) => {
        if (s.status !== 'loaded') return s;
        const rows = s.list.rows.filter((r) => r.id !== row.id);
        const added = rows.length === s.list.rows.length ? 1 : 0;
        const cmp = compareSummaries(sortNow.current);
        // Binary search for its place: the rows are already in this order.
        let lo = 0;
        let hi = rows.length;
        while (lo < hi) {
          const mid = (lo + hi) >> 1;
          if (cmp(rows[mid], row) <= 0) lo = mid + 1;
          else hi = mid;
        }
        rows.splice(lo, 0, row);
        return { status: 'loaded', list: { ...s.list, rows, total: s.list.total + added } };
      });
    },
    [],
  );
  return { state, sort, setSort, reload, dropRow, placeRow };
}
