/**
 * Motion records kept on this device only, by measurement id, in their own IndexedDB database (apart from the
 * case store: a record is large, never travels in a link or a case file, and losing it loses no case). The case
 * keeps the frequency read from the record; the record is kept so the spectrum can be looked at again here.
 */
import { openDB, type IDBPDatabase } from 'idb';
import type { MotionRecord } from '../../physics/signal';

const DB_NAME = 'wetmode-motion-records';
const STORE = 'records';

interface StoredRecord {
  id: string;
  savedAt: string;
  timeS: Float64Array;
  axes: Float64Array[];
  axisNames: string[];
}

let db: Promise<IDBPDatabase> | null = null;

function open(): Promise<IDBPDatabase> {
  db ??= openDB(DB_NAME, 1, { upgrade: (d) => void d.createObjectStore(STORE, { keyPath: 'id' }) });
  return db;
}

export type RecordStoreAnswer<T> = { ok: true; value: T } | { ok: false; message: string };

const why = (e: unknown) => (e instanceof Error ? e.message : String(e));

/** Keeps a record under a measurement id (typed arrays are stored as they are, by structured clone). */
export async function keepRecord(id: string, record: MotionRecord, now = new Date()): Promise<RecordStoreAnswer<null>> {
  try {
    const value: StoredRecord = { id, savedAt: now.toISOString(), timeS: record.timeS, axes: record.axes, axisNames: record.axisNames };
    await (await open()).put(STORE, value);
    return { ok: true, value: null };
  } catch (e) {
    return { ok: false, message: `the motion record could not be kept on this device (${why(e)}); the measured frequency is kept with the case` };
  }
}

/** The record kept under a measurement id on this device, or null when it was made on another device. */
export async function loadRecord(id: string): Promise<RecordStoreAnswer<MotionRecord | null>> {
  try {
    const v = (await (await open()).get(STORE, id)) as StoredRecord | undefined;
    return { ok: true, value: v ? { timeS: v.timeS, axes: v.axes, axisNames: v.axisNames } : null };
  } catch (e) {
    return { ok: false, message: `the motion records on this device could not be read (${why(e)})` };
  }
}

/** Ids of the measurements whose record is on this device. */
export async function recordIds(): Promise<Set<string>> {
  try {
    return new Set(((await (await open()).getAllKeys(STORE)) as string[]).map(String));
  } catch {
    return new Set();
  }
}
