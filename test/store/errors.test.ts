import { afterEach, describe, expect, it, vi } from 'vitest';
import { IDBDatabase, IDBObjectStore } from 'fake-indexeddb';
import { DB_VERSION, openStore } from '../../src/store';
import { demoCase } from '../case/fixtures';
import { harness, openRaw, openV1Layout, rawRecords, req, unwrap } from './helpers';

afterEach(() => vi.restoreAllMocks());
afterEach(() => vi.unstubAllGlobals());

const quota = () => new DOMException('The quota has been exceeded.', 'QuotaExceededError');

describe('storage failures come back as typed results with plain messages', () => {
  it('no IndexedDB at all: unavailable', async () => {
    vi.stubGlobal('indexedDB', undefined);
    const r = await openStore();
    expect(r).toMatchObject({ ok: false, kind: 'unavailable' });
    expect(!r.ok && r.message).toContain('private browsing');
  });

  it('a browser that refuses IndexedDB (private mode: InvalidStateError on open): unavailable', async () => {
    const refusing = { open: () => { throw new DOMException('A mutation operation was attempted on a database that did not allow mutations.', 'InvalidStateError'); } };
    const r = await openStore(refusing as unknown as IDBFactory);
    expect(r).toEqual({
      ok: false,
      kind: 'unavailable',
      message:
        'Could not open the saved cases: this browser is not letting Wetmode keep cases on this device (private browsing, or site storage turned off). Copy a link or export a file to keep your work.',
    });
  });

  it('storage full on save: quota-exceeded, and nothing half written', async () => {
    const store = await harness().open();
    vi.spyOn(IDBObjectStore.prototype, 'put').mockImplementation(() => { throw quota(); });
    expect(await store.saveCase(demoCase())).toEqual({
      ok: false,
      kind: 'quota-exceeded',
      message: 'Could not save the case: the storage this browser lets Wetmode use is full. Delete cases you no longer need, or free space on the device, then try again.',
    });
    vi.restoreAllMocks();
    expect(unwrap(await store.listCases()).cases).toEqual([]);
  });

  it('storage full while deleting: the case stays (the move to the undo store is all or nothing)', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    vi.spyOn(IDBObjectStore.prototype, 'add').mockImplementation(() => { throw quota(); });
    expect(await store.deleteCase(demoCase().id)).toMatchObject({ ok: false, kind: 'quota-exceeded' });
    vi.restoreAllMocks();
    expect(unwrap(await store.listCases()).cases.map((c) => c.id)).toEqual([demoCase().id]);
  });

  it('an older tab holding the database blocks the upgrade: blocked, then it opens once that tab closes', async () => {
    const h = harness();
    const old = await openV1Layout(h.factory);
    // The old tab does not close on versionchange (as an old build without the handler would).
    const r = await openStore(h.factory, h.options);
    expect(r).toEqual({
      ok: false,
      kind: 'blocked',
      message: 'Could not open the saved cases: Wetmode is open in another tab with an older version. Close or reload the other Wetmode tabs to finish the update; your cases are safe.',
    });
    old.close();
    const store = await h.open();
    expect(unwrap(await store.listCases())).toEqual({ cases: [], unreadable: [] });
  });

  it('a database from a newer Wetmode: newer-database', async () => {
    const h = harness();
    (await openRaw(h.factory, 'wetmode', DB_VERSION + 5)).close();
    expect(await openStore(h.factory, h.options)).toEqual({
      ok: false,
      kind: 'newer-database',
      message: 'Could not open the saved cases: the cases on this device were saved by a newer Wetmode. Reload the page to update the app; your cases are safe.',
    });
  });

  it('a newer Wetmode opening in another tab: this one steps aside, reports closed, and calls onClose once', async () => {
    const h = harness();
    const onClose = vi.fn();
    const store = await h.open({ onClose });
    unwrap(await store.saveCase(demoCase()));
    const newer = await openRaw(h.factory, 'wetmode', DB_VERSION + 1);
    expect(onClose).toHaveBeenCalledTimes(1);
    expect(await store.listCases()).toEqual({
      ok: false,
      kind: 'closed',
      message: 'Could not list the saved cases: Wetmode was updated in another tab, or the browser closed its storage. Reload this page to continue; your cases are safe.',
    });
    newer.close();
  });

  it('a failed upgrade step leaves the old database and its data exactly as they were', async () => {
    const h = harness();
    const db = await openV1Layout(h.factory);
    await req(db.transaction('cases', 'readwrite').objectStore('cases').put(demoCase()));
    db.close();
    const real = IDBDatabase.prototype.createObjectStore;
    vi.spyOn(IDBDatabase.prototype, 'createObjectStore').mockImplementation(function (this: IDBDatabase, name: string, opts?: IDBObjectStoreParameters) {
      if (name === 'trash') throw new DOMException('disk trouble', 'UnknownError');
      return real.call(this, name, opts);
    });
    const r = await openStore(h.factory, h.options);
    expect(r).toEqual({
      ok: false,
      kind: 'failed',
      message: 'Could not upgrade the saved cases to this version of Wetmode: the browser reported UnknownError (disk trouble). They are unchanged.',
    });
    vi.restoreAllMocks();
    const check = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    expect(check.version).toBe(1);
    check.close();
    expect((await rawRecords(h.factory, 'cases')).values).toEqual([demoCase()]);
  });
});
