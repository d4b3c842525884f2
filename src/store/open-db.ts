/**
 * Opens the database through a given IDBFactory (the page's `indexedDB`, or a fake one in tests) and climbs
 * the ladder in `db-schema.ts`. Like idb's `openDB`, which only uses the global factory.
 * Resolves to a typed result: a blocked upgrade, a newer database or a refused open come back as errors.
 */
import { wrap, type IDBPDatabase } from 'idb';
import { DB_STEPS, DB_VERSION, type UpgradeDb, type UpgradeTx } from './db-schema';
import { MESSAGES, ok, storeError, toStoreError, type StoreResult } from './errors';

export interface OpenDbOptions {
  name: string;
  nowIso: () => string;
  /** Called when this connection closes because a newer version wants the database, or the browser closed it. */
  onClose: () => void;
}

export function openDatabase(factory: IDBFactory, opts: OpenDbOptions): Promise<StoreResult<IDBPDatabase<unknown>>> {
  return new Promise((resolve) => {
    let settled = false;
    const settle = (r: StoreResult<IDBPDatabase<unknown>>) => {
      if (!settled) {
        settled = true;
        resolve(r);
      }
    };
    let request: IDBOpenDBRequest;
    let upgradeError: unknown;
    try {
      request = factory.open(opts.name, DB_VERSION);
    } catch (e) {
      settle(toStoreError(e, 'open the saved cases'));
      return;
    }
    request.addEventListener('upgradeneeded', (event) => {
      const db = wrap(request.result) as UpgradeDb;
      const tx = wrap(request.transaction!) as unknown as UpgradeTx;
      // idb makes a `done` promise for every wrapped transaction; an aborted upgrade is reported through the
      // request's error event below, so this one is observed here to keep it from surfacing as unhandled.
      tx.done.catch(() => undefined);
      const ctx = { nowIso: opts.nowIso() };
      const climb = async () => {
        for (let v = event.oldVersion; v < DB_VERSION; v++) await DB_STEPS[v](db, tx, ctx);
      };
      climb().catch((e: unknown) => {
        upgradeError = e;
        // Abort: the database stays at its old version with its data untouched; the open then fails with AbortError.
        try {
          tx.abort();
        } catch {
          /* already finished */
        }
      });
    });
    request.addEventListener('blocked', () => settle(storeError('blocked', `Could not open the saved cases: ${MESSAGES.blocked}`)));
    request.addEventListener('error', (event) => {
      // Handled here; keep it from reaching the global error handler.
      event.preventDefault();
      if (upgradeError !== undefined) {
        const why = toStoreError(upgradeError, 'upgrade the saved cases to this version of Wetmode').message;
        settle(storeError('failed', `${why} They are unchanged.`));
      } else {
        settle(toStoreError(request.error, 'open the saved cases'));
      }
    });
    request.addEventListener('success', () => {
      const raw = request.result;
      if (settled) {
        // We already answered "blocked"; the caller will open again. Do not keep a stray connection.
        raw.close();
        return;
      }
      raw.addEventListener('versionchange', () => {
        // A newer Wetmode in another tab wants to upgrade: step aside so it is not blocked.
        raw.close();
        opts.onClose();
      });
      raw.addEventListener('close', () => opts.onClose());
      settle(ok(wrap(raw) as IDBPDatabase<unknown>));
    });
  });
}
