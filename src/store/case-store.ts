/**
 * `openStore(factory?, options?)`: the device store of cases, drafts and undo, on IndexedDB through idb.
 * See `api.ts` for what each method does and `db-schema.ts` for the layout and its migration ladder.
 */
import { CASE_LIMITS } from '../case';
import type { CaseStore, StoreOptions } from './api';
import * as cases from './case-ops';
import type { StoreContext } from './context';
import { DB_NAME } from './db-schema';
import * as drafts from './draft-ops';
import { MESSAGES, ok, storeError, type StoreResult } from './errors';
import { APP_VERSION, newCaseId } from './new-case';
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
  const ctx: StoreContext = {
    db,
    now,
    newId: options.newId ?? newCaseId,
    appVersion: options.appVersion ?? APP_VERSION,
    isClosed: () => closed,
  };
  const storage = 'storage' in options ? options.storage : defaultStorage();
  const store: CaseStore = {
    listCases: () => cases.listCases(ctx),
    getCase: (id) => cases.getCase(ctx, id),
    saveCase: (c) => cases.saveCase(ctx, c),
    duplicateCase: (id, newName) => cases.duplicateCase(ctx, id, newName),
    renameCase: (id, newName) => cases.renameCase(ctx, id, newName),
    deleteCase: (id) => cases.deleteCase(ctx, id),
    undoDelete: (token) => cases.undoDelete(ctx, token, CASE_LIMITS.nameChars),
    saveDraft: (draft) => drafts.saveDraft(ctx, draft),
    loadDraft: () => drafts.loadDraft(ctx),
    clearDraft: () => drafts.clearDraft(ctx),
    findSameCase: (c) => received.findSameCase(ctx, c),
    saveReceived: (c) => received.saveReceived(ctx, c),
    requestPersistence: () => requestPersistence(storage),
    estimateQuota: () => estimateQuota(storage),
    close: () => {
      closed = true;
      db.close();
    },
  };
  return ok(store);
}
