/**
 * This tab's identity, for drafts kept per tab. The id lives in sessionStorage, which survives a reload or an
 * app update in the same tab but not a new tab, so "fresh" says whether this tab is new. While the tab is open it
 * holds a Web Lock named after its id, so other tabs can tell a draft of a closed tab (lock free) from a draft
 * of a tab still open (lock held). Where sessionStorage or Web Locks are missing, the tab still works: its id
 * is then new at each start, and no draft is taken for a closed tab's (they are offered on the Cases screen).
 */
import { newCaseId } from '../../store';

const KEY = 'wetmode.tabId';
const LOCK_PREFIX = 'wetmode-tab:';

export interface TabIdentity {
  id: string;
  /** True when this tab had no id yet: a new tab (not a reload). */
  fresh: boolean;
}

let current: TabIdentity | null = null;

export function tabIdentity(): TabIdentity {
  if (current) return current;
  let id: string | null = null;
  try {
    id = sessionStorage.getItem(KEY);
  } catch {
    /* storage off: a new id each start */
  }
  const fresh = !id;
  if (!id) {
    id = newCaseId();
    try {
      sessionStorage.setItem(KEY, id);
    } catch {
      /* as above */
    }
  }
  current = { id, fresh };
  return current;
}

interface LocksLike {
  request(name: string, options: { signal?: AbortSignal }, cb: (lock: unknown) => Promise<void>): Promise<unknown>;
  query(): Promise<{ held?: { name?: string }[] }>;
}

function locks(): LocksLike | null {
  const l = (globalThis.navigator as { locks?: LocksLike } | undefined)?.locks;
  return l && typeof l.request === 'function' && typeof l.query === 'function' ? l : null;
}

/**
 * Holds this tab's lock for as long as the page lives (released by the browser when the tab closes), and resolves
 * to the tab's identity. A duplicated tab inherits a copy of sessionStorage, so its id may be one another open tab
 * holds: if the lock is not granted within `waitMs` (a reload's old page lets go of it at once), this tab takes a
 * new id, so two tabs never share a draft.
 */
export async function claimTab(waitMs = 1500): Promise<TabIdentity> {
  const tab = tabIdentity();
  const l = locks();
  if (!l) return tab;
  const got = await new Promise<boolean>((resolve) => {
    const stop = new AbortController();
    const timer = setTimeout(() => stop.abort(), waitMs);
    l.request(LOCK_PREFIX + tab.id, { signal: stop.signal }, () => {
      clearTimeout(timer);
      resolve(true);
      return new Promise<void>(() => undefined);
    }).catch(() => resolve(false));
  });
  if (got) return tab;
  current = null;
  try {
    sessionStorage.removeItem(KEY);
  } catch {
    /* storage off */
  }
  const fresh = tabIdentity();
  l.request(LOCK_PREFIX + fresh.id, {}, () => new Promise<void>(() => undefined)).catch(() => undefined);
  return fresh;
}

/** The ids of the tabs open now, or null when this browser cannot say (no Web Locks). */
export async function openTabs(): Promise<Set<string> | null> {
  const l = locks();
  if (!l) return null;
  try {
    const q = await l.query();
    return new Set((q.held ?? []).map((h) => h.name ?? '').filter((n) => n.startsWith(LOCK_PREFIX)).map((n) => n.slice(LOCK_PREFIX.length)));
  } catch {
    return null;
  }
}
