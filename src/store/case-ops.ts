/** Saved-case operations: list, get, save, duplicate, rename, delete with undo. */
import { cutText, parseCase, type Case } from '../case';
import type { CaseList, UndoToken, UnreadableRecord } from './api';
import { caseKey, checkIncoming, failWith, inTx, notFound, readStored, type StoreContext, type Tx } from './context';
import { CASES, LIST, storedRevision, TRASH, TRASH_DAYS, type TrashRecord } from './db-schema';
import { listRecordOf, summaryOf } from './list-record';
import { storeError, StoreFailure, type StoreResult } from './errors';
import { revisionOf, stamp, stampFrom, toRecord } from './revision';

const DAY_MS = 86_400_000;

function newest(a: Case, b: Case): number {
  // Parse rather than compare strings: foreign cases may carry a zone offset instead of "Z".
  return Date.parse(b.updatedAt) - Date.parse(a.updatedAt) || a.name.localeCompare(b.name);
}

export function listCases(ctx: StoreContext): Promise<StoreResult<CaseList>> {
  return inTx(ctx, 'list the saved cases', [CASES], 'readonly', async (tx) => {
    const store = tx.objectStore(CASES);
    const [keys, values] = await Promise.all([store.getAllKeys(), store.getAll()]);
    const cases: Case[] = [];
    const unreadable: UnreadableRecord[] = [];
    values.forEach((raw, i) => {
      const r = parseCase(raw);
      if (r.ok) cases.push(stampFrom(r.value, raw));
      else unreadable.push({ key: String(keys[i]), message: `This saved case cannot be read: ${r.message}` });
    });
    return { cases: cases.sort(newest), unreadable };
  });
}

export function getCase(ctx: StoreContext, id: string): Promise<StoreResult<Case>> {
  const action = 'open the case';
  return inTx(ctx, action, [CASES], 'readonly', async (tx) => {
    const key = caseKey(id, action);
    const raw: unknown = await tx.objectStore(CASES).get(key);
    if (raw === undefined) notFound(id, action);
    return stampFrom(readStored(raw, key, action), raw);
  });
}

/** What a save is based on: the revision of the saved case the edits started from (null: never saved here). */
export interface SaveBase {
  baseRevision: number | null;
}

/**
 * Saves a case. With `base`, the save is refused with kind 'conflict' (and the saved version in `theirs`) when the
 * case on the device is not the one the edits started from — another tab or window saved it since — so nothing is
 * overwritten silently. Without `base`, it replaces whatever is there (the user chose "keep mine").
 */
export function saveCase(ctx: StoreContext, c: Case, base?: SaveBase): Promise<StoreResult<Case>> {
  const action = 'save the case';
  return inTx(ctx, action, [CASES, LIST], 'readwrite', async (tx) => {
    const incoming = checkIncoming(c, action);
    const store = tx.objectStore(CASES);
    const raw: unknown = await store.get(incoming.id);
    const current = raw === undefined ? null : storedRevision(raw);
    if (base && raw !== undefined && current !== base.baseRevision) {
      const parsed = parseCase(raw);
      const theirs = parsed.ok ? stamp(parsed.value, current!) : null;
      throw new StoreFailure(
        storeError(
          'conflict',
          `Could not save the case: it was saved in another tab or window since you opened it${theirs ? ` (as ${JSON.stringify(theirs.name)}, ${theirs.updatedAt})` : ''}. Choose which version to keep.`,
          { case: theirs, revision: current! },
        ),
      );
    }
    const revision = (current ?? 0) + 1;
    const value: Case = { ...incoming, updatedAt: ctx.now().toISOString(), appVersion: ctx.appVersion };
    await store.put(toRecord(value, revision));
    await tx.objectStore(LIST).put(summaryOf(value, revision));
    return stamp(value, revision);
  });
}

/** Reads one stored case inside a transaction, for the operations that change it. */
async function readForChange(tx: Tx, id: string, action: string): Promise<Case> {
  const key = caseKey(id, action);
  const raw: unknown = await tx.objectStore(CASES).get(key);
  if (raw === undefined) notFound(id, action);
  return stampFrom(readStored(raw, key, action), raw);
}

/** The revision a stored case was read at (by `readForChange`). */
function revisionRead(c: Case): number {
  return revisionOf(c) ?? 0;
}

export function duplicateCase(ctx: StoreContext, id: string, newName: string): Promise<StoreResult<Case>> {
  const action = 'duplicate the case';
  return inTx(ctx, action, [CASES, LIST], 'readwrite', async (tx) => {
    const original = await readForChange(tx, id, action);
    const nowIso = ctx.now().toISOString();
    const copy = checkIncoming({ ...original, id: ctx.newId(), name: newName, createdAt: nowIso, updatedAt: nowIso, appVersion: ctx.appVersion }, action);
    await tx.objectStore(CASES).add(toRecord(copy, 1));
    await tx.objectStore(LIST).put(summaryOf(copy, 1));
    return stamp(copy, 1);
  });
}

export function renameCase(ctx: StoreContext, id: string, newName: string): Promise<StoreResult<Case>> {
  const action = 'rename the case';
  return inTx(ctx, action, [CASES, LIST], 'readwrite', async (tx) => {
    const original = await readForChange(tx, id, action);
    const renamed = checkIncoming({ ...original, name: newName, updatedAt: ctx.now().toISOString(), appVersion: ctx.appVersion }, action);
    const revision = revisionRead(original) + 1;
    await tx.objectStore(CASES).put(toRecord(renamed, revision));
    await tx.objectStore(LIST).put(summaryOf(renamed, revision));
    return stamp(renamed, revision);
  });
}

export function deleteCase(ctx: StoreContext, id: string): Promise<StoreResult<UndoToken>> {
  const action = 'delete the case';
  return inTx(ctx, action, [CASES, TRASH, LIST], 'readwrite', async (tx) => {
    const key = caseKey(id, action);
    const cases = tx.objectStore(CASES);
    // The record is kept exactly as stored, readable or not, so undo gives back what was there.
    const raw: unknown = await cases.get(key);
    if (raw === undefined) notFound(id, action);
    const now = ctx.now();
    const trash = tx.objectStore(TRASH);
    const entry: TrashRecord = { token: ctx.newId(), deletedAt: now.toISOString(), record: raw };
    await trash.add(entry);
    await cases.delete(key);
    await tx.objectStore(LIST).delete(key);
    // Purge what has been in the trash longer than TRASH_DAYS (done here so opening the app does no extra work).
    const limit = now.getTime() - TRASH_DAYS * DAY_MS;
    for (const old of (await trash.getAll()) as TrashRecord[]) {
      if (!(Date.parse(old.deletedAt) >= limit)) await trash.delete(old.token);
    }
    return entry.token;
  });
}

/** " (restored)" name for a case whose id was taken while it was deleted. */
function restoredName(name: string, max: number): string {
  const suffix = ' (restored)';
  return cutText(name, Math.max(0, max - suffix.length)) + suffix;
}

export function undoDelete(ctx: StoreContext, token: UndoToken, nameChars: number): Promise<StoreResult<Case | null>> {
  const action = 'undo the delete';
  return inTx(ctx, action, [CASES, TRASH, LIST], 'readwrite', async (tx) => {
    const trash = tx.objectStore(TRASH);
    const entry = (typeof token === 'string' && token.length > 0 ? await trash.get(token) : undefined) as TrashRecord | undefined;
    if (!entry) failWith('not-found', `Could not ${action}: it is no longer available (already undone, or deleted more than ${TRASH_DAYS} days ago).`);
    const cases = tx.objectStore(CASES);
    const parsed = parseCase(entry.record);
    let restored: Case | null = null;
    if (parsed.ok) {
      const taken = (await cases.getKey(parsed.value.id)) !== undefined;
      restored = taken
        ? checkIncoming({ ...parsed.value, id: ctx.newId(), name: restoredName(parsed.value.name, nameChars) }, action)
        : parsed.value;
      // One more than it had, so a tab still holding the deleted version notices the change when it saves.
      const revision = taken ? 1 : storedRevision(entry.record) + 1;
      await cases.add(toRecord(restored, revision));
      await tx.objectStore(LIST).put(summaryOf(restored, revision));
      stamp(restored, revision);
    } else {
      // An unreadable record goes back exactly as it was; `add` refuses (and aborts) rather than overwrite.
      try {
        const key = await cases.add(entry.record);
        await tx.objectStore(LIST).put(listRecordOf(entry.record, String(key)));
      } catch {
        failWith('unreadable', `Could not ${action}: the deleted record cannot be read and its place is taken; it stays restorable.`);
      }
    }
    await trash.delete(entry.token);
    return restored;
  });
}
