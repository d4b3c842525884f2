/**
 * The case this tab last had open, so a start reopens it even after it was saved (a saved case has no draft).
 * Kept twice: in sessionStorage (this tab: a reload or an update) and in localStorage (the device: a relaunch of
 * the installed app opens a new tab). Only the case id is kept; the case itself is read from the store.
 * Storage switched off simply means nothing is remembered.
 */
export const LAST_CASE_KEY = 'wetmode.lastCase';
const KEY = LAST_CASE_KEY;

function put(area: () => Storage, id: string | null): void {
  try {
    if (id) area().setItem(KEY, id);
    else area().removeItem(KEY);
  } catch {
    /* storage off: nothing remembered */
  }
}

function get(area: () => Storage): string | null {
  try {
    return area().getItem(KEY);
  } catch {
    return null;
  }
}

/** Remembers the open case's id (null: no case open), for this tab and for the device. */
export function rememberOpenCase(id: string | null): void {
  put(() => sessionStorage, id);
  put(() => localStorage, id);
}

/** The case to reopen: this tab's own last case after a reload; in a new tab, the device's last one. */
export function lastOpenCase(fresh: boolean): string | null {
  return get(() => sessionStorage) ?? (fresh ? get(() => localStorage) : null);
}
