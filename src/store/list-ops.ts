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

/** Records read per request: each answer is turned into objects in one short task, not one long one for all. */
const CHUNK = 250;

type ListIndex = { getAll(range?: IDBKeyRange | null, count?: number): Promise<unknown[]>; };

/**
 * The whole index in its order, CHUNK records at a time. Each chunk starts at the last key read (inclusive, as
 * several records may share a key) and skips the records already taken; a key shared by more records than a
 * chunk holds is read whole.
 */
async function readInChunks(index: ListIndex & { keyPath: string | string[] }): Promise<ListRecord[]> {
  const keyOf = (r: ListRecord): IDBValidKey | undefined => (r as unknown as Record<string, IDBValidKey>)[index.keyPath as string];
  const out: ListRecord[] = [];
  const seen = new Set<string>();
  let from: IDBValidKey | undefined;
  for (;;) {
    const range = from === undefined ? null : IDBKeyRange.lowerBound(from);
    let chunk = (await index.getAll(range, CHUNK)) as ListRecord[];
    let fresh = chunk.filter((r) => !seen.has(r.id));
    if (fresh.length === 0 && chunk.length === CHUNK && from !== undefined) {
      chunk = (await index.getAll(IDBKeyRange.only(from))) as ListRecord[];
      fresh = chunk.filter((r) => !seen.has(r.id));
      for (const r of fresh) {
        seen.add(r.id);
        out.push(r);
      }
      const after = (await index.getAll(IDBKeyRange.lowerBound(from, true), 1)) as ListRecord[];
      if (after.length === 0) return out;
      from = keyOf(after[0]);
      continue;
    }
    for (const r of fresh) {
      seen.add(r.id);
      out.push(r);
    }
    if (chunk.length < CHUNK) return out;
    from = keyOf(chunk[chunk.length - 1]);
  }
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
    const all = await readInChunks(index);
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
