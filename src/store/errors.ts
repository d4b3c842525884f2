/**
 * Store results: every store call resolves to `{ ok: true, value }` or a `StoreError` with a kind the UI can act on
 * and a message in plain words it can show as it is. Nothing fails silently and nothing is thrown at the UI.
 */
import type { Case } from '../case';

export type StoreErrorKind =
  /** No IndexedDB, private browsing that refuses it, or site storage turned off. */
  | 'unavailable'
  /** The browser's storage for this site (or the device) is full. */
  | 'quota-exceeded'
  /** An older Wetmode tab keeps the database open, so the upgrade waits. Retry after the other tabs close. */
  | 'blocked'
  /** The database was written by a newer Wetmode than this one. */
  | 'newer-database'
  /** The connection was closed (a newer Wetmode opened in another tab, or the browser closed it). Reload. */
  | 'closed'
  /** No case (or undo entry) with that id or token. */
  | 'not-found'
  /** The case handed to the store does not pass `parseCase` (the message says which field). */
  | 'invalid-case'
  /** A stored record does not pass `parseCase` (the message says why). */
  | 'unreadable'
  /** The saved case changed (another tab or window saved it) since the version this save was based on. */
  | 'conflict'
  /** Anything else; the message names the action and the browser's reason. */
  | 'failed';

export interface StoreError {
  ok: false;
  kind: StoreErrorKind;
  message: string;
  /** With 'conflict': the saved version now on the device (null when that record cannot be read) and its revision. */
  theirs?: { case: Case | null; revision: number };
}

export type StoreResult<T> = { ok: true; value: T } | StoreError;

export function ok<T>(value: T): StoreResult<T> {
  return { ok: true, value };
}

export function storeError(kind: StoreErrorKind, message: string, theirs?: StoreError['theirs']): StoreError {
  return theirs ? { ok: false, kind, message, theirs } : { ok: false, kind, message };
}

/** A store error raised inside an operation; `runOp` returns it as it is (after aborting the transaction). */
export class StoreFailure extends Error {
  constructor(readonly error: StoreError) {
    super(error.message);
  }
}

export const MESSAGES = {
  unavailable:
    'this browser is not letting Wetmode keep cases on this device (private browsing, or site storage turned off). ' +
    'Copy a link or export a file to keep your work.',
  quota:
    'the storage this browser lets Wetmode use is full. Delete cases you no longer need, or free space on the device, then try again.',
  blocked:
    'Wetmode is open in another tab with an older version. Close or reload the other Wetmode tabs to finish the update; your cases are safe.',
  newer: 'the cases on this device were saved by a newer Wetmode. Reload the page to update the app; your cases are safe.',
  closed: 'Wetmode was updated in another tab, or the browser closed its storage. Reload this page to continue; your cases are safe.',
} as const;

function errorName(e: unknown): string {
  return typeof e === 'object' && e !== null && 'name' in e && typeof e.name === 'string' ? e.name : '';
}

/** Turns whatever IndexedDB threw into a typed error whose message starts with the action ("Could not save the case: …"). */
export function toStoreError(e: unknown, action: string): StoreError {
  if (e instanceof StoreFailure) return e.error;
  const name = errorName(e);
  const say = (why: string) => `Could not ${action}: ${why}`;
  switch (name) {
    case 'QuotaExceededError':
      return storeError('quota-exceeded', say(MESSAGES.quota));
    case 'VersionError':
      return storeError('newer-database', say(MESSAGES.newer));
    case 'SecurityError':
    case 'InvalidStateError':
      // Firefox private windows (before version 115) refuse IndexedDB with InvalidStateError; blocked storage gives SecurityError.
      return storeError('unavailable', say(MESSAGES.unavailable));
  }
  const detail = e instanceof Error || (typeof e === 'object' && e !== null && 'message' in e) ? String((e as Error).message) : String(e);
  return storeError('failed', say(`the browser reported ${name || 'an error'}${detail ? ` (${detail.slice(0, 200)})` : ''}.`));
}
