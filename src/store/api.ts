/**
 * The store's public API (what `openStore` resolves to). Every method resolves — it never rejects — to a
 * `StoreResult`: `{ ok: true, value }`, or `{ ok: false, kind, message }` with a message to show as it is.
 * Every case read back goes through `parseCase`; cases handed in are checked by it before they are written.
 */
import type { Case } from '../case';
import type { StoreChange } from './broadcast';
import type { SaveBase } from './case-ops';
import type { CaseSort } from './list-record';
import type { CaseRows } from './list-ops';
import type { StoreResult } from './errors';
import type { PersistenceAnswer, QuotaEstimate, StorageLike } from './persistence';

/** A stored record that did not pass `parseCase`: reported in the list, never dropped or overwritten. */
export interface UnreadableRecord {
  /** Its database key (the case id when it had one), as text. */
  key: string;
  message: string;
}

export interface CaseList {
  /** Readable cases, most recently changed first. */
  cases: Case[];
  unreadable: UnreadableRecord[];
}

/** Opaque token from `deleteCase`; pass it to `undoDelete`. Valid for `TRASH_DAYS`, across reloads. */
export type UndoToken = string;

/** `findSameCase` answer for a received case. */
export type SameCaseAnswer =
  /** No saved case has this id. */
  | { status: 'new' }
  /** A saved case has this id and the same entered content (see `sameCaseContent`), or an earlier received copy of this same content (see `isRenamedCopy`). */
  | { status: 'same'; saved: Case }
  /** A saved case has this id but different content; `saved` is null when that record is unreadable. */
  | { status: 'changed'; saved: Case | null };

/** `saveReceived` outcome. Nothing saved is ever overwritten. */
export type ReceivedOutcome =
  /** Already saved, unchanged: nothing written; `case` is the saved one. */
  | { status: 'same'; case: Case }
  /** Saved under its own id (no case had it). */
  | { status: 'saved'; case: Case }
  /** A different case had its id: saved as a copy with a new id and a name like "Pile B7 (received 2026-12-01)". */
  | { status: 'saved-copy'; case: Case };

/** A draft as loaded: the case a tab is editing, when it was written, and the saved revision it started from. */
export interface Draft {
  /** Its key in the store (for `adoptDraft` and `discardDraft`). */
  key: string;
  /** The tab that wrote it (the store's `tabId`), or "earlier" for a draft kept before drafts had tabs. */
  tab: string;
  case: Case;
  savedAt: string;
  /** Revision of the saved case the edits started from; null when it had never been saved. */
  baseRevision: number | null;
  /** A received or imported case kept before an update (it reopens as received). */
  received?: boolean;
}

/** Every draft on the device (all tabs), newest first, and the ones that cannot be read. */
export interface DraftList {
  drafts: Draft[];
  unreadable: { key: string; tab: string; message: string }[];
}

export interface CaseStore {
  /** All cases, newest change first, plus any record that cannot be read (reported, not dropped). */
  listCases(): Promise<StoreResult<CaseList>>;
  /**
   * The saved list as light rows (no full case read or parsed), in the order of `sort` from the database's own
   * indexes; search the rows with `searchSummaries`. Open a row with `getCase(row.id)`. With `limit`, only the
   * first rows (and the total count): a quick first page to show while the whole list is read.
   */
  listRows(sort: CaseSort, limit?: number): Promise<StoreResult<CaseRows>>;
  /** One case; 'not-found' or 'unreadable' otherwise. */
  getCase(id: string): Promise<StoreResult<Case>>;
  /**
   * Creates or replaces the case with this id; sets updatedAt to now and appVersion to this build. Returns what was
   * written. With `base` (the revision the edits started from, `revisionOf` the case as opened; null for a case never
   * saved) a save over a different saved revision is refused with kind 'conflict' and the saved version in `theirs`.
   * Without `base` it overwrites (the user chose to keep their version).
   */
  saveCase(c: Case, base?: SaveBase): Promise<StoreResult<Case>>;
  /** A copy with a new id, the given name and new times. */
  duplicateCase(id: string, newName: string): Promise<StoreResult<Case>>;
  /** Renames; updatedAt becomes now. */
  renameCase(id: string, newName: string): Promise<StoreResult<Case>>;
  /** Moves the case to the undo store; the token brings it back. */
  deleteCase(id: string): Promise<StoreResult<UndoToken>>;
  /**
   * Restores a deleted case. If its id has been taken since (a received link), it comes back as a copy
   * with a new id and " (restored)" added to its name, so nothing is overwritten. Resolves to the restored
   * case, or to null when the deleted record was one that could not be read (it is back in the list as unreadable).
   */
  undoDelete(token: UndoToken): Promise<StoreResult<Case | null>>;
  /**
   * Keeps the case this tab is editing (one draft per tab; keyed by tab and case). Call it on every change,
   * debounced (about 0.5 s). `baseRevision`: the saved revision the edits started from (null: never saved).
   */
  saveDraft(draft: Case, baseRevision?: number | null, received?: boolean): Promise<StoreResult<Draft>>;
  /** This tab's draft, or null when there is none. A draft that cannot be read is never returned (see listDrafts). */
  loadDraft(): Promise<StoreResult<Draft | null>>;
  /** Every tab's drafts, newest first, and the unreadable ones. */
  listDrafts(): Promise<StoreResult<DraftList>>;
  /** Makes another tab's draft this tab's own ('not-found' if another tab took it first). */
  adoptDraft(key: string): Promise<StoreResult<Draft>>;
  /** Writes a draft kept outside the database (the copy left in localStorage) unless a newer one is there. */
  mergeDraft(tab: string, draft: Case, savedAt: string, baseRevision: number | null, received?: boolean): Promise<StoreResult<boolean>>;
  /** Removes one draft by key. */
  discardDraft(key: string): Promise<StoreResult<void>>;
  /** Removes this tab's draft. */
  clearDraft(): Promise<StoreResult<void>>;
  /** Calls `fn` when another tab or window saves, deletes or restores a case, or changes drafts. */
  onChange(fn: (change: StoreChange) => void): () => void;
  /** For a received link: is this case new here, already saved unchanged, or a changed version of a saved one? */
  findSameCase(c: Case): Promise<StoreResult<SameCaseAnswer>>;
  /** Saves a received case without ever overwriting (see `ReceivedOutcome`). One transaction. */
  saveReceived(c: Case): Promise<StoreResult<ReceivedOutcome>>;
  /** `navigator.storage.persist()` where present. */
  requestPersistence(): Promise<PersistenceAnswer>;
  /** `navigator.storage.estimate()` where present. */
  estimateQuota(): Promise<QuotaEstimate>;
  /** Closes the connection; later calls answer 'closed'. */
  close(): void;
}

export interface StoreOptions {
  /** Database name; default "wetmode". */
  dbName?: string;
  /** Clock; default `() => new Date()`. */
  now?: () => Date;
  /** Id maker; default `newCaseId` (random UUID). */
  newId?: () => string;
  /** Stamped on saved cases; default this build's version. */
  appVersion?: string;
  /** Default `navigator.storage`; null to act as if missing. */
  storage?: StorageLike | null;
  /** Called once if the connection closes under us (newer version in another tab, browser closed it): prompt a reload. */
  onClose?: () => void;
  /** This tab's id, for drafts; default "tab". The app keeps one per tab in sessionStorage. */
  tabId?: string;
  /** Makes the channel to other tabs; default BroadcastChannel where it exists; null for none. */
  channel?: ((name: string) => BroadcastChannel) | null;
}
