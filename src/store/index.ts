/**
 * The device store (IndexedDB through idb). Start with `openStore()`; every method resolves to a `StoreResult`.
 *
 * ```ts
 * const opened = await openStore();
 * if (!opened.ok) showMessage(opened.message);          // kind: 'unavailable' | 'blocked' | 'newer-database' | 'failed'
 * else {
 *   const store = opened.value;
 *   const list = await store.listCases();               // { cases, unreadable }
 *   const saved = await store.saveCase(editedCase);     // updatedAt set to now
 *   const del = await store.deleteCase(id);             // then: store.undoDelete(del.value)
 * }
 * ```
 */
export type { CaseList, CaseStore, Draft, DraftList, ReceivedOutcome, SameCaseAnswer, StoreOptions, UndoToken, UnreadableRecord } from './api';
export { openStore } from './case-store';
export { DB_NAME, DB_VERSION, TRASH_DAYS } from './db-schema';
export type { StoreError, StoreErrorKind, StoreResult } from './errors';
export { searchCases, sortCases } from './list-view';
export { compareSummaries, searchSummaries, summaryOf, type CaseSort, type CaseSummary } from './list-record';
export type { CaseRows } from './list-ops';
export { APP_VERSION, newCase, newCaseId } from './new-case';
export { estimateQuota, requestPersistence, type PersistenceAnswer, type QuotaEstimate, type StorageLike } from './persistence';
export { revisionOf } from './revision';
export type { StoreChange } from './broadcast';
export type { SaveBase } from './case-ops';
export { EARLIER_TAB, SET_ASIDE_TAB } from './db-schema';
