/**
 * The saved list from the light `list` store: rows in the order of one of its indexes, without reading or parsing
 * any full case. If the list store does not match the cases (a record written by something other than this store),
 * it is rebuilt from the cases first, so a case is never missing from the list.
 */
import type { UnreadableRecord } from './api';
import { inTx, type StoreContext } from './context';
import { CASES, fillListStore, LIST } from './db-schema';
import { isSummary, SORT_INDEX, type CaseSort, type CaseSummary, type ListRecord } from './list-record';
import type { StoreResult } from './errors';

export interface CaseRows {
  /** Readable cases in the order asked for. */
  rows: CaseSummary[];
  unreadable: UnreadableRecord[];
  /** How many readable cases there are in all (more than `rows.length` when a first page was asked for). */
  total: number;
  /** False when only a first page was read (`limit`); its unreadable records are not read either. */
  complete: boolean;
}

/** True when every case record has its list record and no list record is left over. */
async function inStep(ctx: StoreContext): Promise<StoreResult<boolean>> {
  return inTx(ctx, 'list the saved cases', [CASES, LIST], 'readonly', async (tx) => {
    const [nCases, nList] = await Promise.all([tx.objectStore(CASES).count(), tx.objectStore(LIST).count()]);
    return nCases === nList;
  });
}

/** Writes the list store afresh from the case records (only when it was found out of step). */
export function rebuildList(ctx: StoreContext): Promise<StoreResult<void>> {
  return inTx(ctx, 'list the saved cases', [CASES, LIST], 'readwrite', async (tx) => {
    await tx.objectStore(LIST).clear();
    await fillListStore(tx);
  });
}

/**
 * The saved list, sorted by the index of `sort`; with `limit`, only the first `limit` rows (a quick first page to
 * show while the whole list is read).
 */
export async function listRows(ctx: StoreContext, sort: CaseSort, limit?: number): Promise<StoreResult<CaseRows>> {
  const step = await inStep(ctx);
  if (!step.ok) return step;
  if (!step.value) {
    const rebuilt = await rebuildList(ctx);
    if (!rebuilt.ok) return rebuilt;
  }
  return inTx(ctx, 'list the saved cases', [LIST], 'readonly', async (tx) => {
    const index = tx.objectStore(LIST).index(SORT_INDEX[sort]);
    if (limit !== undefined) {
      const [first, total] = await Promise.all([index.getAll(null, limit), index.count()]);
      return { rows: (first as ListRecord[]).filter(isSummary), unreadable: [], total, complete: false };
    }
    const all = (await index.getAll()) as ListRecord[];
    // Unreadable records carry no sort keys and so are not in the indexes: read them apart (few, if any).
    const rows = all.filter(isSummary);
    const unreadable: UnreadableRecord[] = [];
    if (rows.length < (await tx.objectStore(LIST).count())) {
      for (const r of (await tx.objectStore(LIST).getAll()) as ListRecord[]) {
        if (!isSummary(r)) unreadable.push({ key: r.id, message: r.unreadable });
      }
    }
    return { rows, unreadable, total: rows.length, complete: true };
  });
}
