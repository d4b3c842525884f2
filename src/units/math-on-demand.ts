/**
 * The unit reader as the browser's main thread uses it: the same functions as ./math, but mathjs (a third of
 * the app's script) is fetched only when first needed. Until then, plain entries (`610 mm`, `12`) are read by
 * the quick reader from a table of the display units, which is all the stored or demo case and the Member
 * screen need for a first answer; anything else throws `UnitReaderPending`, and the caller loads and retries.
 *
 * The app's build puts this module in place of ./math for the files of src/units (see
 * build/unit-reader-on-demand.ts); Node (the command line, the tests) keeps ./math and loads mathjs at start.
 */
import type { Unit } from 'mathjs';
import { quickEvaluate, QuickUnit } from './quick-units';
import { UnitReaderPending } from './reader-pending';

type Reader = typeof import('./math');

let reader: Reader | null = null;
let loading: Promise<void> | null = null;

/** Whether mathjs has loaded (after which every entry is read exactly as the command line reads it). */
export function unitReaderLoaded(): boolean {
  return reader !== null;
}

/** Loads mathjs once; later calls return the same promise. A failed load may be tried again. */
export function loadUnitReader(): Promise<void> {
  loading ??= import('./math').then(
    (m) => {
      reader = m;
    },
    (e: unknown) => {
      loading = null;
      throw e;
    },
  );
  return loading;
}

export function evaluateText(text: string): number | Unit {
  if (reader) return reader.evaluateText(text);
  const q = quickEvaluate(text);
  if (!q) throw new UnitReaderPending(text);
  return q.value as number | Unit;
}

export function evaluateWithUnits(text: string): { value: number | Unit; namedUnits: boolean } {
  if (reader) return reader.evaluateWithUnits(text);
  const q = quickEvaluate(text);
  if (!q) throw new UnitReaderPending(text);
  return q as { value: number | Unit; namedUnits: boolean };
}

export function isUnit(v: unknown): v is Unit {
  return v instanceof QuickUnit || (reader !== null && reader.isUnit(v));
}
