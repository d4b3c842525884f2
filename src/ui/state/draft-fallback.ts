/**
 * The synchronous copy of a tab's draft. An IndexedDB write started as the page goes away (a reload, a
 * navigation) is not waited for and often never commits, so the last edit before a reload was lost. When the page
 * is hidden or left, the open case is also written to localStorage, which is synchronous; at the next start every
 * such copy is merged into the database (the newer of the two wins) and removed.
 */
import type { Case } from '../../case';

const PREFIX = 'wetmode.draft.';

export interface FallbackDraft {
  tab: string;
  case: unknown;
  savedAt: string;
  baseRevision: number | null;
  received: boolean;
  /** Written as the page went away for good (pagehide, not kept for back/forward), not merely hidden. */
  leaving?: boolean;
}

export function writeFallback(tab: string, doc: Case, baseRevision: number | null, received: boolean, leaving = false): void {
  try {
    localStorage.setItem(PREFIX + tab, JSON.stringify({ savedAt: new Date().toISOString(), baseRevision, received, leaving, case: doc }));
  } catch {
    /* storage full or off: the database draft is all there is */
  }
}

export function clearFallback(tab: string): void {
  try {
    localStorage.removeItem(PREFIX + tab);
  } catch {
    /* nothing to clear */
  }
}

/** Whether any tab left a copy (read without parsing; throws when localStorage cannot be read). */
export function hasFallbacks(): boolean {
  for (let i = 0; i < localStorage.length; i++) if (localStorage.key(i)?.startsWith(PREFIX)) return true;
  return false;
}

/** Every copy left by any tab (unparsed cases: the store checks them). Damaged entries are removed. */
export function readFallbacks(): FallbackDraft[] {
  const out: FallbackDraft[] = [];
  try {
    for (let i = localStorage.length - 1; i >= 0; i--) {
      const key = localStorage.key(i);
      if (!key?.startsWith(PREFIX)) continue;
      try {
        const v = JSON.parse(localStorage.getItem(key) ?? '') as Partial<FallbackDraft>;
        if (typeof v.savedAt !== 'string') throw new Error('no time');
        const base = typeof v.baseRevision === 'number' ? v.baseRevision : null;
        out.push({ tab: key.slice(PREFIX.length), case: v.case, savedAt: v.savedAt, baseRevision: base, received: v.received === true, leaving: v.leaving === true });
      } catch {
        localStorage.removeItem(key);
      }
    }
  } catch {
    /* storage off */
  }
  return out;
}
