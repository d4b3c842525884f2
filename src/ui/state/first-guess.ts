/**
 * The unsaved work the store will open first, guessed from the copies tabs leave in localStorage as they go away
 * (draft-fallback.ts), so the boot can open it before IndexedDB is open. A reload opens the tab's own draft: its
 * own copy, written as the old page went away, is that draft's newest state. A new tab opens the newest draft of a
 * closed tab: the newest copy of a tab that is not open now (a tab merely hidden leaves a copy too, and its draft
 * is not taken). Only cases being edited are guessed (a received case opens on another screen). The
 * store is still read and its choice replaces the guess if they differ and the user has not touched it
 * (early-boot.ts), so a wrong guess costs a moment of the wrong case on screen, never work.
 */
import { parseCase, type Case } from '../../case';
import type { FallbackDraft } from './draft-fallback';

export interface GuessedCase {
  doc: Case;
  baseRevision: number | null;
}

/**
 * `tab`: this tab's id and whether it is new (tab.ts); `liveTabs`: the tabs open now (Web Locks; null when this
 * browser cannot tell, and then a new tab takes no closed tab's draft, as the store's choice would not either).
 * A reload takes only a copy written as its page went away: a copy written when it was merely hidden may be older
 * than the draft it kept after, and edits typed into that older copy would then replace that draft. Null when
 * nothing can be guessed.
 */
export function guessFirstCase(fallbacks: readonly FallbackDraft[], tab: { id: string; fresh: boolean }, liveTabs: ReadonlySet<string> | null): GuessedCase | null {
  let best: FallbackDraft | null = null;
  for (const f of fallbacks) {
    if (f.received || Number.isNaN(Date.parse(f.savedAt))) continue;
    // A new tab has no draft of its own: the newest copy of a closed tab (hidden before it closed, or as it did).
    const candidate = tab.fresh ? liveTabs !== null && f.tab !== tab.id && !liveTabs.has(f.tab) : f.tab === tab.id && f.leaving === true;
    if (candidate && (!best || Date.parse(f.savedAt) > Date.parse(best.savedAt))) best = f;
  }
  if (!best) return null;
  const parsed = parseCase(best.case);
  return parsed.ok ? { doc: parsed.value, baseRevision: best.baseRevision } : null;
}
