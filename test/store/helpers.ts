/** Test helpers for the store: a fresh fake IndexedDB per test, a settable clock and predictable ids. */
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { expect } from 'vitest';
import { openStore, type CaseStore, type StoreOptions, type StoreResult } from '../../src/store';

export interface Harness {
  factory: IDBFactory;
  clock: { now: Date };
  ids: string[];
  options: StoreOptions;
  open(extra?: StoreOptions): Promise<CaseStore>;
}

/** Ids of the form 00000000-0000-4000-8000-00000000000n, in order. */
export function idNumber(n: number): string {
  return `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

export function harness(start = '2026-12-01T12:00:00.000Z'): Harness {
  const factory = new IDBFactory();
  const clock = { now: new Date(start) };
  const ids: string[] = [];
  let n = 0;
  const options: StoreOptions = {
    now: () => new Date(clock.now),
    newId: () => {
      const id = idNumber(++n);
      ids.push(id);
      return id;
    },
    appVersion: '0.2.0',
    storage: null,
    // No channel to other tabs unless a test asks for one (test/store/revisions-drafts.test.ts).
    channel: null,
  };
  return {
    factory,
    clock,
    ids,
    options,
    async open(extra = {}) {
      return unwrap(await openStore(factory, { ...options, ...extra }));
    },
  };
}

/** The value of a result that must be ok (fails the test with the store's message otherwise). */
export function unwrap<T>(r: StoreResult<T>): T {
  if (!r.ok) expect.fail(`store said ${r.kind}: ${r.message}`);
  return r.value;
}

/** Raw IndexedDB request as a promise, for building and inspecting databases without the store. */
export function req<T>(r: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

/** Opens a database by hand at a version, running `upgrade` for the layout. */
export function openRaw(factory: IDBFactory, name: string, version: number, upgrade?: (db: IDBDatabase, tx: IDBTransaction) => void): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const r = factory.open(name, version);
    r.onupgradeneeded = () => upgrade?.(r.result, r.transaction!);
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

/** Every record of a store, with keys, read by hand. */
export async function rawRecords(factory: IDBFactory, storeName: string, name = 'wetmode'): Promise<{ keys: IDBValidKey[]; values: unknown[] }> {
  const db = await openRaw(factory, name, undefined as unknown as number);
  try {
    const tx = db.transaction(storeName, 'readonly');
    const s = tx.objectStore(storeName);
    return { keys: await req(s.getAllKeys()), values: await req(s.getAll()) };
  } finally {
    db.close();
  }
}

/** Database version 1 as pre-release builds laid it out (built by hand, independent of src/store/db-schema.ts). */
export function openV1Layout(factory: IDBFactory): Promise<IDBDatabase> {
  return openRaw(factory, 'wetmode', 1, (d) => {
    d.createObjectStore('cases', { keyPath: 'id' });
    d.createObjectStore('draft');
  });
}
