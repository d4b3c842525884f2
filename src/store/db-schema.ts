/**
 * The IndexedDB layout and its migration ladder, keyed by database version.
 * `DB_STEPS[n]` upgrades a version-n database to version n + 1 inside the version-change transaction;
 * a fresh install climbs from 0. Each step only adds or reshapes: no step deletes user data, and a
 * record a step cannot read is left exactly as it was (the list then reports it as unreadable).
 * If a step fails, the transaction aborts and the database stays at its old version, untouched.
 *
 * Version 1 — pre-release development builds:
 *   `cases`  keyPath "id"   case objects as saved (schema version 0 or 1)
 *   `draft`  out-of-line    the case being edited, stored bare under the key "current"
 * Version 2:
 *   `cases`  keyPath "id"   case objects, schema version 1 (older ones rewritten by the step)
 *   `draft`  out-of-line    `DraftRecord` under the key "current"
 *   `trash`  keyPath "token" `TrashRecord`: deleted cases kept for undo (purged after TRASH_DAYS)
 * Version 3:
 *   `cases`  keyPath "id"   case objects, each with a `revision` beside the case fields (`StoredCase`): 1 when
 *                           first written, +1 on every change; a record without one counts as revision 0
 *   `drafts` keyPath "key"  `TabDraftRecord`: one draft per tab and case (several tabs no longer share one slot);
 *                           the step moves version 2's single draft here under the tab "earlier"
 *   `trash`  as in version 2
 * Version 4 — current:
 *   `list`   keyPath "id"   `ListRecord`: a light summary of every `cases` record (name, tag, kind, time, key result,
 *                           folded search text, sort keys; or the reason it cannot be read), written with the case in
 *                           the same transaction; indexes by-updated, by-name, by-tag, by-kind give the list's orders
 *   `cases`, `drafts`, `trash` as in version 3
 */
import type { IDBPDatabase, IDBPTransaction } from 'idb';
import { parseCase } from '../case';
import { LIST_INDEXES, listRecordOf } from './list-record';

export const DB_NAME = 'wetmode';
export const CASES = 'cases';
/** Version 1–2 draft store (one slot); replaced by DRAFTS in version 3. */
export const DRAFT = 'draft';
export const DRAFTS = 'drafts';
/** The tab name given to a draft kept by a version 2 database (one slot, no tab). */
export const EARLIER_TAB = 'earlier';
/** The tab name of drafts set aside when their tab moved on to another case (offered on the Cases screen). */
export const SET_ASIDE_TAB = 'set-aside';
export const TRASH = 'trash';
/** Version 4: one light summary per case record, for the saved list. */
export const LIST = 'list';
export const DRAFT_KEY = 'current';
/** Deleted cases stay restorable for this many days. */
export const TRASH_DAYS = 30;

/** The draft as stored from version 2: the case being edited and when it was last written. */
export interface DraftRecord {
  savedAt: string;
  /** Read back through parseCase. */
  case: unknown;
}

/** A draft from version 3: the case one tab is editing, keyed by tab and case. */
export interface TabDraftRecord {
  /** `draftKey(tab, caseId)`. */
  key: string;
  tab: string;
  caseId: string;
  savedAt: string;
  /** Revision of the saved case this draft was based on; null when it was never saved (or not known). */
  baseRevision: number | null;
  /** True for a received (link) or imported (file) case kept before an update: it reopens as received. */
  received?: boolean;
  /** Read back through parseCase. */
  case: unknown;
}

export function draftKey(tab: string, caseId: string): string {
  return `${tab}\n${caseId}`;
}

/** A case record as stored from version 3: the case fields plus its revision (parseCase drops the extra field). */
export { REVISION_FIELD, storedRevision } from './stored-revision';

/** A deleted case kept for undo. */
export interface TrashRecord {
  token: string;
  deletedAt: string;
  /** The stored record as it was, unparsed, so even an unreadable record can be restored as it was. */
  record: unknown;
}

export type UpgradeDb = IDBPDatabase<unknown>;
export type UpgradeTx = IDBPTransaction<unknown, string[], 'versionchange'>;
export interface UpgradeContext {
  nowIso: string;
}
export type DbStep = (db: UpgradeDb, tx: UpgradeTx, ctx: UpgradeContext) => Promise<void>;

/** 0 -> 1: the pre-release layout. */
async function dbV0toV1(db: UpgradeDb): Promise<void> {
  db.createObjectStore(CASES, { keyPath: 'id' });
  db.createObjectStore(DRAFT);
}

/** 1 -> 2: the undo store; case records brought to schema 1; the bare draft wrapped with its save time. */
async function dbV1toV2(db: UpgradeDb, tx: UpgradeTx, ctx: UpgradeContext): Promise<void> {
  db.createObjectStore(TRASH, { keyPath: 'token' });
  const cases = tx.objectStore(CASES);
  let cursor = await cases.openCursor();
  while (cursor) {
    const parsed = parseCase(cursor.value);
    if (parsed.ok && parsed.migratedFrom !== undefined) {
      if (parsed.value.id === cursor.key) {
        await cursor.update(parsed.value);
      } else {
        // parseCase lower-cases ids; the key must follow. Write the new record before removing the old one.
        await cases.put(parsed.value);
        await cursor.delete();
      }
    }
    cursor = await cursor.continue();
  }
  const draftStore = tx.objectStore(DRAFT);
  const bare: unknown = await draftStore.get(DRAFT_KEY);
  if (bare !== undefined) {
    const parsed = parseCase(bare);
    const record: DraftRecord = {
      savedAt: parsed.ok ? parsed.value.updatedAt : ctx.nowIso,
      case: parsed.ok ? parsed.value : bare,
    };
    await draftStore.put(record, DRAFT_KEY);
  }
}

/** 2 -> 3: drafts by tab and case; the one draft of version 2 moves there, under the tab "earlier". */
async function dbV2toV3(db: UpgradeDb, tx: UpgradeTx, ctx: UpgradeContext): Promise<void> {
  db.createObjectStore(DRAFTS, { keyPath: 'key' });
  const old: unknown = await tx.objectStore(DRAFT).get(DRAFT_KEY);
  if (old !== undefined) {
    const rec = (typeof old === 'object' && old !== null ? old : {}) as Partial<DraftRecord>;
    const parsed = parseCase(rec.case);
    const caseId = parsed.ok ? parsed.value.id : 'unknown';
    const moved: TabDraftRecord = {
      key: draftKey(EARLIER_TAB, caseId),
      tab: EARLIER_TAB,
      caseId,
      savedAt: typeof rec.savedAt === 'string' ? rec.savedAt : ctx.nowIso,
      // Records from before revisions count as revision 0: a draft of a saved case starts from it (no false conflict).
      baseRevision: parsed.ok && (await tx.objectStore(CASES).getKey(caseId)) !== undefined ? 0 : null,
      // Kept as it was, readable or not: an unreadable draft is listed and can be discarded, never dropped here.
      case: rec.case ?? old,
    };
    await tx.objectStore(DRAFTS).put(moved);
  }
  db.deleteObjectStore(DRAFT);
}

/** Creates the `list` store with its sort indexes (also used to rebuild it). */
export function createListStore(db: UpgradeDb): void {
  const list = db.createObjectStore(LIST, { keyPath: 'id' });
  for (const ix of LIST_INDEXES) list.createIndex(ix.name, ix.keyPath);
}

/** Case records read and summarised at a time: one short task each (about 10 ms), few round trips. */
const FILL_CHUNK = 200;

/** Writes a list record for every case record (readable or not), in key order, a chunk at a time. */
export async function fillListStore(tx: IDBPTransaction<unknown, string[], 'versionchange' | 'readwrite'>): Promise<void> {
  const cases = tx.objectStore(CASES);
  const list = tx.objectStore(LIST);
  let after: IDBValidKey | null = null;
  for (;;) {
    const range: IDBKeyRange | null = after === null ? null : IDBKeyRange.lowerBound(after, true);
    const [keys, values]: [IDBValidKey[], unknown[]] = await Promise.all([cases.getAllKeys(range, FILL_CHUNK), cases.getAll(range, FILL_CHUNK)]);
    if (keys.length === 0) return;
    await Promise.all(keys.map((k, i) => list.put!(listRecordOf(values[i], String(k)))));
    after = keys[keys.length - 1];
  }
}

/** 3 -> 4: the list store, filled from every case record (readable or not; the cases themselves are untouched). */
async function dbV3toV4(db: UpgradeDb, tx: UpgradeTx): Promise<void> {
  createListStore(db);
  await fillListStore(tx);
}

/** The ladder; its length is the current database version. */
export const DB_STEPS: readonly DbStep[] = [dbV0toV1, dbV1toV2, dbV2toV3, dbV3toV4];
export const DB_VERSION = DB_STEPS.length;
