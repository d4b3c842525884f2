import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import type { CaseStore, Draft, DraftList } from '../../store';
import { openTabs, tabIdentity } from '../state/tab';
import { displayName, formatCaseDate, kindTitle } from './format';
import { isUntouchedStart } from './new-case';
import { sentence } from './words';

interface Props {
  store: CaseStore;
  /** Opens the draft's case (through the screen's replace guard, which takes the draft as this tab's own). */
  onOpen: (d: Draft) => void;
  setError: (text: string) => void;
}

/**
 * Unsaved work left by tabs that were closed (a new tab reopens the newest by itself; the others wait here) or
 * set aside when a tab moved on to another case, and drafts that cannot be read (set aside so they never stop
 * the app; they can be discarded). Drafts of tabs still open are theirs and not shown.
 */
export function DraftsPanel({ store, onOpen, setError }: Props) {
  const [list, setList] = useState<DraftList | null>(null);
  // The latest setter, without making the loader change (and reload) on every render of the screen.
  const errorRef = useRef(setError);
  errorRef.current = setError;
  const load = useCallback(async () => {
    const [r, live] = await Promise.all([store.listDrafts(), openTabs()]);
    if (!r.ok) return errorRef.current(sentence(r.message));
    const me = tabIdentity().id;
    // Without Web Locks we cannot tell open tabs from closed ones: show every other tab's draft.
    const closed = (tab: string) => tab !== me && !(live?.has(tab) ?? false);
    // A draft holding only what a "new case" button or a demo put there is no work to recover: not offered.
    setList({ drafts: r.value.drafts.filter((d) => closed(d.tab) && !isUntouchedStart(d.case)), unreadable: r.value.unreadable });
  }, [store]);
  useEffect(() => {
    void load();
    return store.onChange(() => void load());
  }, [load, store]);

  async function discard(key: string) {
    const r = await store.discardDraft(key);
    if (!r.ok) errorRef.current(sentence(r.message));
    await load();
  }

  if (!list || (list.drafts.length === 0 && list.unreadable.length === 0)) return null;
  return (
    <section class="saved drafts-panel" aria-labelledby="drafts-h">
      <h2 id="drafts-h">Unsaved drafts</h2>
      <p class="cases-muted">Work not saved as a case, left in closed tabs or set aside when another case was opened.</p>
      <ul class="case-list">
        {list.drafts.map((d) => (
          <li key={d.key}>
            <span><strong>{displayName(d.case)}</strong> <span class="cases-muted">({kindTitle(d.case.kind)}, kept {formatCaseDate(d.savedAt)})</span></span>
            <span class="cases-buttons">
              <button type="button" class="btn" onClick={() => onOpen(d)}>Open draft</button>
              <button type="button" class="btn cases-danger" onClick={() => void discard(d.key)}>Discard</button>
            </span>
          </li>
        ))}
        {list.unreadable.map((u) => (
          <li key={u.key} class="cases-problem">
            <span>A kept draft could not be read and was set aside: {u.message}.</span>
            <button type="button" class="btn cases-danger" onClick={() => void discard(u.key)}>Discard it</button>
          </li>
        ))}
      </ul>
    </section>
  );
}
