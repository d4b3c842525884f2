import { useRef, useState } from 'preact/hooks';
import type { Case, MemberKind, UnitSystem } from '../../case';
import type { DemoCase } from '../../forms';
import { useModel, useServices } from '../state/context';
import { blankCase, caseFromDemo } from '../../app/create-case';
import type { Draft } from '../../store';
import { DraftsPanel } from './DraftsPanel';
import { FilePanel } from './FilePanel';
import { NewCasePanel } from './NewCasePanel';
import { OpenCaseBar } from './OpenCaseBar';
import { useReplaceGuard } from './ReplaceGuard';
import { SavedList } from './SavedList';
import { StatusLine, type Status } from './StatusLine';
import { PersistenceNote, QuotaLine, StorageBanner } from './StorageStatus';
import { useCaseList } from './use-case-list';
import { sentence } from './words';
import './cases.css';

/**
 * The Cases screen: the case open now, new cases and demos, the saved list (search, sort, open, duplicate,
 * rename, delete with undo), case files, and how storage stands on this device.
 */
export function CasesScreen() {
  const { store, storeMessage, storeRetryable } = useServices();
  const [state, model] = useModel();
  const list = useCaseList(store);
  const reload = list.reload;
  const [status, setStatus] = useState<Status | null>(null);
  const [changes, setChanges] = useState(0);
  const statusRef = useRef<HTMLDivElement>(null);
  const { guard, prompt } = useReplaceGuard(store, model);

  function open(doc: Case, mode: 'editing' | 'received', saved: boolean, screen: '#/member' | '#/results') {
    guard(() => {
      const current = model.get();
      // The same saved case, unchanged, is already open: just go to it (keeps its results on screen).
      const already = saved && current.doc?.id === doc.id && current.mode === 'editing' && !model.unsaved();
      if (!already) model.open(doc, mode, saved);
      location.hash = screen;
    });
  }

  const openSaved = (c: Case) => open(c, 'editing', true, '#/member');
  // Taken as this tab's own only once the user has decided about the open case (taking it replaces this tab's draft).
  const openDraft = (d: Draft) =>
    guard(() => {
      if (!store) return;
      void store.adoptDraft(d.key).then((r) => {
        if (!r.ok) return setStatus({ text: sentence(r.message), tone: 'error' });
        model.open(r.value.case, r.value.received ? 'received' : 'editing', false, r.value.baseRevision);
        location.hash = r.value.received ? '#/results' : '#/member';
      });
    });
  const openNew = (kind: MemberKind, system: UnitSystem) => open(blankCase(kind, system), 'editing', false, '#/member');
  const openDemo = (demo: DemoCase) => open(caseFromDemo(demo), 'editing', false, '#/results');
  const openImported = (c: Case, message: string) => {
    setStatus({ text: message, tone: 'ok' });
    open(c, 'received', false, '#/results');
  };

  const afterChange = (): Promise<void> => {
    setChanges((n) => n + 1);
    return reload();
  };

  return (
    <section class="screen cases-screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Cases</h1>
      <StorageBanner store={store} storeMessage={storeMessage} retryable={storeRetryable} />
      {prompt}
      <OpenCaseBar state={state} model={model} store={store} setStatus={setStatus} onSaved={() => void afterChange()} />
      <StatusLine status={status} onDismiss={() => setStatus(null)} focusRef={statusRef} />
      <NewCasePanel onNew={openNew} onDemo={openDemo} />
      {store && <DraftsPanel store={store} onOpen={openDraft} setError={(text) => setStatus({ text, tone: 'error' })} />}
      {store && (
        <section class="saved" aria-labelledby="saved-h">
          <h2 id="saved-h">Saved on this device</h2>
          <SavedList
            store={store}
            model={model}
            list={list}
            reload={afterChange}
            openId={state.mode === 'editing' ? (state.doc?.id ?? null) : null}
            setStatus={setStatus}
            focusStatus={() => statusRef.current?.focus()}
            onOpen={openSaved}
          />
        </section>
      )}
      <FilePanel onImported={openImported} setStatus={setStatus} />
      <div class="storage-status">
        <PersistenceNote />
        {store && <QuotaLine store={store} refresh={changes} />}
      </div>
    </section>
  );
}
