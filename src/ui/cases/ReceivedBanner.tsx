import { useEffect, useState } from 'preact/hooks';
import type { Case } from '../../case';
import type { SameCaseAnswer } from '../../store';
import { useModel, useServices } from '../state/context';
import { contentKey } from '../state/app-model';
import { docForSaving, exportCaseFile, saveOpenCase } from './open-case';
import { receivedStatusWords, sentence } from './words';
import './cases.css';

type Said = { text: string; error: boolean; exportOffer?: boolean } | null;

/**
 * Above the results of a case opened from a link or a file: "Received case — not saved on this device", what
 * the device already holds (same case, or another version), and Save to my cases (never overwrites).
 *
 * Render it above the results whenever a case is open: it shows itself only for a received case, and keeps
 * its "Saved …" message after saving (when the case has become an editable one).
 */
export function ReceivedBanner({ doc }: { doc: Case }) {
  const { store, storeMessage } = useServices();
  const [state, model] = useModel();
  const [same, setSame] = useState<SameCaseAnswer | null>(null);
  const [said, setSaid] = useState<Said>(null);
  const [busy, setBusy] = useState(false);
  const received = state.mode === 'received' && state.doc?.id === doc.id;
  const key = `${doc.id}|${doc.name}|${doc.tag}|${doc.note}|${contentKey(doc)}`;

  useEffect(() => {
    setSame(null);
    if (!received) return;
    // A new received case: the message about an earlier one no longer applies.
    setSaid(null);
    if (!store) return;
    let live = true;
    void store.findSameCase(doc).then((r) => {
      if (live && r.ok) setSame(r.value);
      // A failed check changes nothing; saving still works and never overwrites.
    });
    return () => {
      live = false;
    };
  }, [store, key, received]);

  async function save() {
    if (!store) return;
    setBusy(true);
    const r = await saveOpenCase(store, model);
    setBusy(false);
    setSaid(r.ok ? { text: r.text, error: false } : { text: r.text, error: true, exportOffer: r.kind === 'quota-exceeded' });
  }

  function openMine(saved: Case) {
    model.open(saved, 'editing', true);
    setSaid({ text: 'Opened your saved copy.', error: false });
  }

  async function exportNow() {
    const r = await exportCaseFile(docForSaving(model) ?? doc);
    setSaid({ text: r.text, error: !r.ok });
  }

  const status = same ? receivedStatusWords(same) : null;
  return (
    <div class="received-slot">
      {received && (
        <section class="received-banner" aria-labelledby="received-h">
          <h2 id="received-h">
            <span class="received-icon" aria-hidden="true">⇩</span> Received case — not saved on this device
          </h2>
          {status && <p>{status}</p>}
          {!store && <p>{storeMessage ? sentence(storeMessage) : 'The case store is still opening.'} Export it as a case file to keep it.</p>}
          <div class="cases-buttons">
            {store && (
              <button type="button" class="btn primary" disabled={busy} onClick={() => void save()}>Save to my cases</button>
            )}
            {same?.status === 'same' && (
              <button type="button" class="btn" onClick={() => openMine(same.saved)}>Open my copy</button>
            )}
            {(!store || said?.exportOffer) && <button type="button" class="btn" onClick={exportNow}>Export case file</button>}
          </div>
        </section>
      )}
      <div role="status" aria-live="polite">
        {said && (
          <p class={said.error ? 'cases-error' : 'received-said'}>
            {said.text}{' '}
            <button type="button" class="btn" onClick={() => setSaid(null)}>Dismiss</button>
          </p>
        )}
      </div>
    </div>
  );
}

/** For a link that does not decode: the reason in plain words and a way back. Changes nothing. */
export function ReceivedError({ message }: { message: string }) {
  return (
    <section class="screen received-error" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>This link could not be opened</h1>
      <div class="storage-banner" role="alert">
        <p>
          <span class="cases-status-icon" aria-hidden="true">⚠</span> {sentence(message)}
        </p>
      </div>
      <p>Nothing was changed: your saved cases and the case you had open are as they were.</p>
      <a class="btn primary link-button" href="#/cases">Go to Cases</a>
    </section>
  );
}
