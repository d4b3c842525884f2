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
 * Version 2 — current:
 *   `cases`  keyPath "id"   case objects, schema version 1 (older ones rewritten by the step)
 *   `draft`  out-of-line    `DraftRecord` under the key "current"
 *   `trash`  keyPath "token" `TrashRecord`: deleted cases kept for undo (purged after TRASH_DAYS)
 */
import type { IDBPDatabase, IDBPTransaction } from 'idb';
import { parseCase } from '../case';

export const DB_NAME = 'wetmode';
export const CASES = 'cases';
export const DRAFT = 'draft';
export const TRASH = 'trash';
export const DRAFT_KEY = 'current';
/** Deleted cases stay restorable for this many days. */
export const TRASH_DAYS = 30;

/** The draft as stored from version 2: the case being edited and when it was last written. */
export interface DraftRecord {
  savedAt: string;
  /** Read back through parseCase. */
  case: unknown;
}

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

/** The ladder; its length is the current database version. */
export const DB_STEPS: readonly DbStep[] = [dbV0toV1, dbV1toV2];
export const DB_VERSION = DB_STEPS.length;
