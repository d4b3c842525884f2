/** What every store operation needs, and the one transaction helper they all go through. */
import type { IDBPDatabase, IDBPTransaction } from 'idb';
import { parseCase, type Case } from '../case';
import { MESSAGES, ok, storeError, StoreFailure, toStoreError, type StoreResult } from './errors';

export interface StoreContext {
  db: IDBPDatabase<unknown>;
  now: () => Date;
  newId: () => string;
  appVersion: string;
  isClosed: () => boolean;
  /** This tab's id (drafts are kept per tab). */
  tabId: string;
}

/** Typed as read-write so writes typecheck; read-only bodies only read. */
export type Tx = IDBPTransaction<unknown, string[], 'readwrite'>;

/**
 * Runs `body` in one transaction and waits for it to commit. Any failure — a StoreFailure raised by the body,
 * a request error, a commit that aborts (quota) — aborts the whole transaction, so nothing is half written,
 * and comes back as a typed error naming the action.
 */
export async function inTx<T>(
  ctx: StoreContext,
  action: string,
  stores: string[],
  mode: IDBTransactionMode,
  body: (tx: Tx) => Promise<T>,
): Promise<StoreResult<T>> {
  const closed = () => storeError('closed', `Could not ${action}: ${MESSAGES.closed}`);
  if (ctx.isClosed()) return closed();
  let tx: Tx;
  try {
    tx = ctx.db.transaction(stores, mode) as unknown as Tx;
  } catch (e) {
    return ctx.isClosed() ? closed() : toStoreError(e, action);
  }
  const done = tx.done;
  done.catch(() => undefined); // observed below; this keeps an abort from being reported as unhandled
  try {
    const value = await body(tx);
    await done;
    return ok(value);
  } catch (e) {
    try {
      tx.abort();
    } catch {
      /* already aborted or committed */
    }
    return ctx.isClosed() ? closed() : toStoreError(e, action);
  }
}

/** Raises a typed error from inside a transaction body (the transaction is then aborted). */
export function failWith(kind: Parameters<typeof storeError>[0], message: string): never {
  throw new StoreFailure(storeError(kind, message));
}

/** Checks a case handed in by the app; raises 'invalid-case' with parseCase's message. */
export function checkIncoming(c: unknown, action: string): Case {
  const r = parseCase(c);
  if (!r.ok) failWith('invalid-case', `Could not ${action}: ${r.message}`);
  return r.value;
}

/** Reads a stored record through parseCase; raises 'unreadable' with the reason. */
export function readStored(raw: unknown, key: string, action: string): Case {
  const r = parseCase(raw);
  if (!r.ok) failWith('unreadable', `Could not ${action}: the saved case ${JSON.stringify(key.slice(0, 64))} cannot be read (${r.message}).`);
  return r.value;
}

/** A case id as a database key (ids are stored in lower case). */
export function caseKey(id: string, action: string): string {
  if (typeof id !== 'string' || id.length === 0 || id.length > 64) failWith('not-found', `Could not ${action}: no saved case has the id ${JSON.stringify(String(id).slice(0, 64))}.`);
  return id.toLowerCase();
}

export function notFound(id: string, action: string): never {
  return failWith('not-found', `Could not ${action}: no saved case has the id ${JSON.stringify(id.slice(0, 64))} (it may have been deleted).`);
}
