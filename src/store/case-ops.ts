/** Saved-case operations: list, get, save, duplicate, rename, delete with undo. */
import { cutText, parseCase, type Case } from '../case';
import type { CaseList, UndoToken, UnreadableRecord } from './api';
import { caseKey, checkIncoming, failWith, inTx, notFound, readStored, type StoreContext, type Tx } from './context';
import { CASES, TRASH, TRASH_DAYS, type TrashRecord } from './db-schema';
import type { StoreResult } from './errors';

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
      if (r.ok) cases.push(r.value);
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
    return readStored(raw, key, action);
  });
}

export function saveCase(ctx: StoreContext, c: Case): Promise<StoreResult<Case>> {
  const action = 'save the case';
  return inTx(ctx, action, [CASES], 'readwrite', async (tx) => {
    const value: Case = { ...checkIncoming(c, action), updatedAt: ctx.now().toISOString(), appVersion: ctx.appVersion };
    await tx.objectStore(CASES).put(value);
    return value;
  });
}

/** Reads one stored case inside a transaction, for the operations that change it. */
async function readForChange(tx: Tx, id: string, action: string): Promise<Case> {
  const key = caseKey(id, action);
  const raw: unknown = await tx.objectStore(CASES).get(key);
  if (raw === undefined) notFound(id, action);
  return readStored(raw, key, action);
}

export function duplicateCase(ctx: StoreContext, id: string, newName: string): Promise<StoreResult<Case>> {
  const action = 'duplicate the case';
  return inTx(ctx, action, [CASES], 'readwrite', async (tx) => {
    const original = await readForChange(tx, id, action);
    const nowIso = ctx.now().toISOString();
    const copy = checkIncoming({ ...original, id: ctx.newId(), name: newName, createdAt: nowIso, updatedAt: nowIso, appVersion: ctx.appVersion }, action);
    await tx.objectStore(CASES).add(copy);
    return copy;
  });
}

export function renameCase(ctx: StoreContext, id: string, newName: string): Promise<StoreResult<Case>> {
  const action = 'rename the case';
  return inTx(ctx, action, [CASES], 'readwrite', async (tx) => {
    const original = await readForChange(tx, id, action);
    const renamed = checkIncoming({ ...original, name: newName, updatedAt: ctx.now().toISOString(), appVersion: ctx.appVersion }, action);
    await tx.objectStore(CASES).put(renamed);
    return renamed;
  });
}

export function deleteCase(ctx: StoreContext, id: string): Promise<StoreResult<UndoToken>> {
  const action = 'delete the case';
  return inTx(ctx, action, [CASES, TRASH], 'readwrite', async (tx) => {
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
  return inTx(ctx, action, [CASES, TRASH], 'readwrite', async (tx) => {
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
      await cases.add(restored);
    } else {
      // An unreadable record goes back exactly as it was; `add` refuses (and aborts) rather than overwrite.
      try {
        await cases.add(entry.record);
      } catch {
        failWith('unreadable', `Could not ${action}: the deleted record cannot be read and its place is taken; it stays restorable.`);
      }
    }
    await trash.delete(entry.token);
    return restored;
  });
}
