import type { CaseStore } from '../../store';
import type { AppModel, ModelState } from '../state/app-model';
import { displayName, kindTitle } from './format';
import { docForSaving, exportCaseFile, saveOpenCase } from './open-case';
import type { Status } from './StatusLine';

interface Props {
  state: ModelState;
  model: AppModel;
  store: CaseStore | null;
  setStatus: (s: Status | null) => void;
  /** After a save, so the list and the storage line are read again. */
  onSaved: () => void;
}

/** The case open in the app: its state in words, and Continue, Save and Export case file. */
export function OpenCaseBar({ state, model, store, setStatus, onSaved }: Props) {
  const doc = state.doc;
  if (!doc) return null;
  const unsaved = model.unsaved();
  const received = state.mode === 'received';
  const where = received
    ? 'Received case, not saved on this device'
    : !unsaved
      ? 'Saved'
      : state.saved === null
        ? 'Not saved yet'
        : 'Changes not saved';

  async function save() {
    if (!store) return;
    const r = await saveOpenCase(store, model);
    setStatus(
      r.ok
        ? { text: r.text, tone: 'ok' }
        : r.kind === 'quota-exceeded'
          ? { text: r.text, tone: 'error', actionLabel: 'Export case file', action: exportNow }
          : { text: r.text, tone: 'error' },
    );
    if (r.ok) onSaved();
  }

  async function exportNow() {
    const d = docForSaving(model);
    if (!d) return;
    const r = await exportCaseFile(d);
    setStatus({ text: r.text, tone: r.ok ? 'ok' : 'error' });
  }

  return (
    <section class="open-case panel" aria-label="Open case">
      <p class="open-case-text">
        <span class="cases-muted">Open now: </span>
        <strong>{displayName(doc)}</strong> <span class="cases-muted">({kindTitle(doc.kind)})</span>
        <span class={`open-case-state${unsaved ? ' unsaved' : ''}`}> — {where}</span>
      </p>
      <div class="cases-buttons">
        <a class="btn link-button" href={received ? '#/results' : '#/member'}>Continue with it</a>
        {store && unsaved && (
          <button type="button" class="btn primary" onClick={() => void save()}>
            {received ? 'Save to my cases' : 'Save'}
          </button>
        )}
        <button type="button" class="btn" onClick={exportNow}>Export case file</button>
      </div>
    </section>
  );
}
