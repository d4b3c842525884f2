import { useEffect, useId, useMemo, useRef, useState } from 'preact/hooks';
import type { Case } from '../../case';
import { revisionOf, searchSummaries, summaryOf, type CaseSort, type CaseStore, type CaseSummary, type UndoToken } from '../../store';
import type { AppModel } from '../state/app-model';
import { StableCaseRow, type RowEdit } from './CaseRow';
import { afterDeleted, afterRenamed, afterRestored } from './open-case';
import type { Status } from './StatusLine';
import type { CaseListControl } from './use-case-list';
import { deletedWords, listCountWords, noMatchWords, pageWords, quoted, restoredWords, sentence } from './words';

/** Rows put on screen at a time: enough to fill a tall tablet, few enough that a render stays well under 50 ms. */
export const PAGE_ROWS = 50;

const SORTS: readonly { value: CaseSort; label: string }[] = [
  { value: 'updated', label: 'Last change, newest first' },
  { value: 'name', label: 'Name, A to Z' },
  { value: 'tag', label: 'Tag, A to Z' },
  { value: 'kind', label: 'Member kind' },
];

interface Props {
  store: CaseStore;
  model: AppModel;
  list: CaseListControl;
  /** Reads the list again (after renames and copies) and refreshes what depends on it. */
  reload: () => Promise<void>;
  openId: string | null;
  setStatus: (s: Status | null) => void;
  /** Called after a change that removed the focused button, so focus can go to the status line. */
  focusStatus: () => void;
  onOpen: (c: Case) => void;
}

/**
 * The saved cases: search, sort, one row per case in pages of PAGE_ROWS ("Show more" adds the next page), and the
 * records that cannot be read (listed, never hidden). Rows are light summaries; a full case is read only to open it.
 */
export function SavedList({ store, model, list, reload, openId, setStatus, focusStatus, onOpen }: Props) {
  const { state: listState, sort, setSort, dropRow, placeRow } = list;
  const [query, setQuery] = useState('');
  const [limit, setLimit] = useState(PAGE_ROWS);
  const [edit, setEdit] = useState<{ id: string; what: RowEdit } | null>(null);
  const id = useId();
  const rows = listState.status === 'loaded' ? listState.list.rows : null;
  const matched = useMemo(() => (rows ? searchSummaries(rows, query) : []), [rows, query]);
  // After "Show more", keyboard focus goes to the first new row (it would otherwise stay below the list).
  const listRef = useRef<HTMLUListElement>(null);
  const focusRow = useRef<number | null>(null);
  useEffect(() => {
    const at = focusRow.current;
    focusRow.current = null;
    if (at !== null) listRef.current?.children[at]?.querySelector('button')?.focus();
  }, [limit]);

  const fail = (message: string) => setStatus({ text: sentence(message), tone: 'error' });

  async function undo(token: UndoToken, name: string | null) {
    const r = await store.undoDelete(token);
    if (!r.ok) return fail(r.message);
    setStatus({ text: restoredWords(r.value, name), tone: 'ok' });
    if (r.value) {
      afterRestored(model, r.value);
      placeRow(summaryOf(r.value, revisionOf(r.value) ?? 0));
    } else {
      // An unreadable record came back: only the list store knows its reason, so read the list again.
      await reload();
    }
  }

  async function remove(key: string, c: Pick<Case, 'name'> | null) {
    setEdit(null);
    const r = await store.deleteCase(key);
    if (!r.ok) return fail(r.message);
    afterDeleted(model, key);
    setStatus({ text: deletedWords(c), tone: 'ok', actionLabel: 'Undo', action: () => void undo(r.value, c ? c.name : null) });
    dropRow(key);
    focusStatus();
  }

  async function open(row: CaseSummary) {
    const r = await store.getCase(row.id);
    if (!r.ok) return fail(r.message);
    onOpen(r.value);
  }

  async function rename(c: CaseSummary, name: string): Promise<string | null> {
    const r = await store.renameCase(c.id, name);
    if (!r.ok) return sentence(r.message);
    afterRenamed(model, r.value);
    setEdit(null);
    setStatus({ text: `Renamed ${quoted(c)} to ${quoted(r.value)}.`, tone: 'ok' });
    await reload();
    return null;
  }

  async function duplicate(c: CaseSummary, name: string): Promise<string | null> {
    const r = await store.duplicateCase(c.id, name);
    if (!r.ok) return sentence(r.message);
    setEdit(null);
    const copy = r.value;
    setStatus({ text: `Made a copy: ${quoted(copy)}.`, tone: 'ok', actionLabel: 'Open the copy', action: () => onOpen(copy) });
    await reload();
    return null;
  }

  if (listState.status === 'waiting') return <p class="cases-muted">Loading your cases…</p>;
  if (listState.status === 'failed') {
    return (
      <div class="cases-problem" role="alert">
        <p>{listState.message}</p>
        <button type="button" class="btn" onClick={() => void reload()}>Try again</button>
      </div>
    );
  }
  const { unreadable, total } = listState.list;
  const shown = matched.slice(0, limit);

  return (
    <div class="saved-list">
      {total > 0 && (
        <div class="list-tools">
          <div class="list-tool">
            <label for={`${id}-search`}>Search</label>
            <input id={`${id}-search`} type="search" value={query} placeholder="name, tag, note or kind" onInput={(e) => {
              setQuery(e.currentTarget.value);
              setLimit(PAGE_ROWS);
            }} />
          </div>
          <div class="list-tool">
            <label for={`${id}-sort`}>Sort by</label>
            <select id={`${id}-sort`} value={sort} onChange={(e) => {
              setSort(e.currentTarget.value as CaseSort);
              setLimit(PAGE_ROWS);
            }}>
              {SORTS.map((s) => <option key={s.value} value={s.value}>{s.label}</option>)}
            </select>
          </div>
        </div>
      )}
      <p class="list-count" aria-live="polite">{listCountWords(matched.length, total, query)}</p>
      {matched.length === 0 && total > 0 && <p>{noMatchWords(query)}</p>}
      <ul class="case-list" ref={listRef}>
        {shown.map((c) => (
          <StableCaseRow
            key={c.id}
            c={c}
            isOpen={c.id === openId}
            edit={edit?.id === c.id ? edit.what : null}
            onEdit={(what) => setEdit(what ? { id: c.id, what } : null)}
            onOpen={() => void open(c)}
            onDelete={() => void remove(c.id, c)}
            onRename={(name) => rename(c, name)}
            onDuplicate={(name) => duplicate(c, name)}
          />
        ))}
      </ul>
      {matched.length > shown.length && (
        <div class="list-more">
          <p class="cases-muted">{pageWords(shown.length, matched.length)}</p>
          <button
            type="button"
            class="btn"
            onClick={() => {
              focusRow.current = shown.length;
              setLimit(shown.length + PAGE_ROWS);
            }}
          >
            Show {Math.min(PAGE_ROWS, matched.length - shown.length)} more
          </button>
        </div>
      )}
      {unreadable.length > 0 && (
        <div class="unreadable">
          <h3>Saved records that cannot be read ({unreadable.length})</h3>
          <p class="cases-muted">They are kept until you delete them. Delete can be undone.</p>
          <ul class="case-list">
            {unreadable.map((u) => (
              <li key={u.key} class="case-row case-row-unreadable">
                <div class="case-row-main">
                  <p class="case-name">Record {u.key}</p>
                  <p>{u.message}</p>
                </div>
                <div class="case-actions">
                  <button type="button" class="btn cases-danger" onClick={() => void remove(u.key, null)}>
                    Delete<span class="vh"> the unreadable record {u.key}</span>
                  </button>
                </div>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
