/**
 * Runs a range edit or reading that may need the full unit reader, which the app fetches on demand
 * (src/units/math-on-demand.ts): plain entries read at once; otherwise the reader is loaded and the work
 * runs again. Not an input error, so nothing is shown meanwhile.
 */
import { loadUnitReader } from '../../units/math-on-demand';
import { isUnitReaderPending } from '../../units/reader-pending';

/** Runs `fn`; if it needed the unit reader, loads it and runs `fn` once more (then `after`, if given). */
export function withUnitReader(fn: () => void, after?: () => void): void {
  try {
    fn();
  } catch (e) {
    if (!isUnitReaderPending(e)) throw e;
    void loadUnitReader().then(() => {
      fn();
      after?.();
    });
  }
}

/** `read()`, or `fallback` while the unit reader loads (then `loaded` runs, e.g. to draw again). */
export function readWithUnitReader<T>(read: () => T, fallback: T, loaded: () => void): T {
  try {
    return read();
  } catch (e) {
    if (!isUnitReaderPending(e)) throw e;
    void loadUnitReader().then(loaded, () => undefined);
    return fallback;
  }
}
