/**
 * Site evidence kept on the device beside a case: photos (downscaled JPEG data URLs) and an optional location.
 * A small database of its own ('wetmode-attachments'), keyed by case id, so the case store's schema and version
 * ladder are untouched. Not in the case link (far too large); an exported case file carries them beside the case
 * (src/share/site-evidence.ts, src/attachments/evidence-io.ts).
 * Every call resolves; a browser without IndexedDB keeps nothing and says so through `ok: false`.
 */
import { openDB, type IDBPDatabase } from 'idb';

export interface Photo {
  id: string;
  caseId: string;
  /** A JPEG as a data URL ("data:image/jpeg;base64,…"). */
  dataUrl: string;
  takenAt: string;
  widthPx: number;
  heightPx: number;
}

export interface SiteLocation {
  caseId: string;
  latitudeDeg: number;
  longitudeDeg: number;
  accuracyM: number;
  at: string;
}

const DB_NAME = 'wetmode-attachments';
const PHOTOS = 'photos';
const LOCATIONS = 'locations';

let opening: Promise<IDBPDatabase> | null = null;

function db(factory?: IDBFactory): Promise<IDBPDatabase> {
  if (factory) return open(factory);
  opening ??= open();
  return opening;
}

async function open(factory?: IDBFactory): Promise<IDBPDatabase> {
  const upgrade = (d: IDBPDatabase) => {
    const photos = d.createObjectStore(PHOTOS, { keyPath: 'id' });
    photos.createIndex('caseId', 'caseId');
    d.createObjectStore(LOCATIONS, { keyPath: 'caseId' });
  };
  if (!factory) return openDB(DB_NAME, 1, { upgrade });
  // Tests pass a factory of their own (fake-indexeddb); idb's openDB only uses the global one.
  const saved = globalThis.indexedDB;
  Object.defineProperty(globalThis, 'indexedDB', { value: factory, configurable: true, writable: true });
  try {
    return await openDB(DB_NAME, 1, { upgrade });
  } finally {
    Object.defineProperty(globalThis, 'indexedDB', { value: saved, configurable: true, writable: true });
  }
}

export type Kept<T> = { ok: true; value: T } | { ok: false; message: string };

async function attempt<T>(what: string, fn: () => Promise<T>): Promise<Kept<T>> {
  if (typeof indexedDB === 'undefined') return { ok: false, message: `Could not ${what}: this browser offers no storage here.` };
  try {
    return { ok: true, value: await fn() };
  } catch (e) {
    return { ok: false, message: `Could not ${what}: ${e instanceof Error ? e.message : String(e)}` };
  }
}

export function addPhoto(p: Photo, factory?: IDBFactory): Promise<Kept<void>> {
  return attempt('keep the photo', async () => void (await (await db(factory)).put(PHOTOS, p)));
}

/** The case's photos, oldest first. */
export function photosOf(caseId: string, factory?: IDBFactory): Promise<Kept<Photo[]>> {
  return attempt('read the photos', async () => {
    const all = (await (await db(factory)).getAllFromIndex(PHOTOS, 'caseId', caseId)) as Photo[];
    return all.sort((a, b) => a.takenAt.localeCompare(b.takenAt));
  });
}

export function deletePhoto(id: string, factory?: IDBFactory): Promise<Kept<void>> {
  return attempt('remove the photo', async () => (await db(factory)).delete(PHOTOS, id));
}

export function setLocation(l: SiteLocation, factory?: IDBFactory): Promise<Kept<void>> {
  return attempt('keep the location', async () => void (await (await db(factory)).put(LOCATIONS, l)));
}

export function locationOf(caseId: string, factory?: IDBFactory): Promise<Kept<SiteLocation | null>> {
  return attempt('read the location', async () => ((await (await db(factory)).get(LOCATIONS, caseId)) as SiteLocation | undefined) ?? null);
}
