/**
 * `openStore(factory?, options?)`: the device store of cases, drafts and undo, on IndexedDB through idb.
 * See `api.ts` for what each method does and `db-schema.ts` for the layout and its migration ladder.
 */
import { CASE_LIMITS, type Case } from '../case';
import { openChangeChannel, type StoreChange } from './broadcast';
import { revisionOf } from './revision';
import type { CaseStore, StoreOptions } from './api';
import * as cases from './case-ops';
import type { StoreContext } from './context';
import { DB_NAME } from './db-schema';
import * as drafts from './draft-ops';
import { MESSAGES, ok, storeError, type StoreResult } from './errors';
import { APP_VERSION, newCaseId } from './new-case';
import { listRows } from './list-ops';
import { openDatabase } from './open-db';
import { defaultStorage, estimateQuota, requestPersistence } from './persistence';
import * as received from './received-ops';

/**
 * Opens (creating or upgrading as needed) the case database. `factory` defaults to the page's `indexedDB`.
 * Resolves to the store, or to a typed error: 'unavailable' (no IndexedDB, private mode), 'blocked'
 * (an older Wetmode tab holds the database: ask the user to close it, then call again), 'newer-database',
 * or 'failed' (the message says why; a failed upgrade leaves the data as it was).
 */
export async function openStore(factory?: IDBFactory, options: StoreOptions = {}): Promise<StoreResult<CaseStore>> {
  const f = factory ?? (typeof indexedDB !== 'undefined' ? indexedDB : undefined);
  if (!f) return storeError('unavailable', `Could not open the saved cases: ${MESSAGES.unavailable}`);
  const now = options.now ?? (() => new Date());
  let closed = false;
  const onClose = () => {
    if (closed) return;
    closed = true;
    options.onClose?.();
  };
  const opened = await openDatabase(f, { name: options.dbName ?? DB_NAME, nowIso: () => now().toISOString(), onClose });
  if (!opened.ok) return opened;
  const db = opened.value;
  const tabId = options.tabId ?? 'tab';
  const ctx: StoreContext = {
    db,
    now,
    newId: options.newId ?? newCaseId,
    appVersion: options.appVersion ?? APP_VERSION,
    isClosed: () => closed,
    tabId,
  };
  const storage = 'storage' in options ? options.storage : defaultStorage();
  const channel = 'channel' in options ? openChangeChannel(options.channel ?? null) : openChangeChannel();
  // After a successful change, tell the other tabs (their lists and open cases follow).
  const told = <T>(r: StoreResult<T>, change: (v: T) => StoreChange | null): StoreResult<T> => {
    const c = r.ok ? change(r.value) : null;
    if (c) channel.post(c);
    return r;
  };
  const savedChange = (c: Case): StoreChange => ({ type: 'saved', id: c.id, revision: revisionOf(c) ?? 0, from: tabId });
  const draftsChange = (): StoreChange => ({ type: 'drafts', from: tabId });
  const store: CaseStore = {
    listCases: () => cases.listCases(ctx),
    listRows: (sort, limit) => listRows(ctx, sort, limit),
    getCase: (id) => cases.getCase(ctx, id),
    saveCase: async (c, base) => told(await cases.saveCase(ctx, c, base), savedChange),
    duplicateCase: async (id, newName) => told(await cases.duplicateCase(ctx, id, newName), savedChange),
    renameCase: async (id, newName) => told(await cases.renameCase(ctx, id, newName), savedChange),
    deleteCase: async (id) => told(await cases.deleteCase(ctx, id), () => ({ type: 'deleted', id: String(id).toLowerCase(), from: tabId })),
    undoDelete: async (token) => told(await cases.undoDelete(ctx, token, CASE_LIMITS.nameChars), (c) => (c ? savedChange(c) : draftsChange())),
    saveDraft: (draft, baseRevision = null, rec = false) => drafts.saveDraft(ctx, draft, baseRevision, rec),
    loadDraft: () => drafts.loadDraft(ctx),
    listDrafts: () => drafts.listDrafts(ctx),
    adoptDraft: async (key) => told(await drafts.adoptDraft(ctx, key), draftsChange),
    mergeDraft: async (tab, draft, savedAt, baseRevision, rec = false) =>
      told(await drafts.mergeDraft(ctx, tab, draft, savedAt, baseRevision, rec), (w) => (w ? draftsChange() : null)),
    discardDraft: async (key) => told(await drafts.discardDraft(ctx, key), draftsChange),
    clearDraft: () => drafts.clearDraft(ctx),
    onChange: (fn) => channel.listen(fn),
    findSameCase: (c) => received.findSameCase(ctx, c),
    saveReceived: async (c) => told(await received.saveReceived(ctx, c), (v) => (v.status === 'same' ? null : savedChange(v.case))),
    requestPersistence: () => requestPersistence(storage),
    estimateQuota: () => estimateQuota(storage),
    close: () => {
      closed = true;
      channel.close();
      db.close();
    },
  };
  return ok(store);
}
