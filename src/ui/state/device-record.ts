/**
 * Whether this device may hold work in the case store, known synchronously (localStorage), so the boot can open the
 * demo case and mount the UI before IndexedDB has opened (a few hundred ms on a slow tablet). A first start on a
 * device has nothing: no store record, no draft copy, no last open case; anything the store has ever been given
 * leaves a mark here first (`noteStoreHolds`, called on every write to the store, and by the boot when the store
 * turns out to hold something). The mark only ever says "maybe something": the store is still read at every start
 * and wins over the guess (early-boot.ts), so a mark lost with cleared storage costs a moment of the demo, never work.
 */
import { hasFallbacks } from './draft-fallback';
import { LAST_CASE_KEY } from './last-case';

const KEY = 'wetmode.storeHolds';

let noted = false;

/** Marks the device as holding (or about to hold) cases or drafts. Cheap to call often: writes once per page. */
export function noteStoreHolds(): void {
  if (noted) return;
  try {
    localStorage.setItem(KEY, '1');
    noted = true;
  } catch {
    // No localStorage (private mode) or full: freshDevice() then answers false here too, so nothing is guessed.
  }
}

/**
 * True only when localStorage is readable and holds no sign of earlier work: no store mark (whatever its value: a
 * damaged entry counts as a mark), no draft copy left by a closing tab, no last open case for this tab or device.
 * Unreadable storage answers false: the boot then waits for the store as before.
 */
export function freshDevice(): boolean {
  try {
    if (localStorage.getItem(KEY) !== null) return false;
    if (localStorage.getItem(LAST_CASE_KEY) !== null || sessionStorage.getItem(LAST_CASE_KEY) !== null) return false;
    return !hasFallbacks();
  } catch {
    return false;
  }
}

/** For tests: forget that the mark was written in this page. */
export function resetNotedForTests(): void {
  noted = false;
}
