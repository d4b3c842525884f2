import { useEffect, useState } from 'preact/hooks';
import { estimateQuota, type CaseStore } from '../../store';
import { quotaWords } from './format';
import { onPersistenceAnswer, persistenceAnswer } from './persistence';
import { persistenceWords, sentence } from './words';
import './cases.css';

/** When cases cannot be kept on this device: says so and why; links and files still work. */
export function StorageBanner({ store, storeMessage, retryable }: { store: CaseStore | null; storeMessage: string | null; retryable?: boolean }) {
  if (storeMessage) {
    return (
      <div class="storage-banner" role="alert">
        <p>
          <span class="cases-status-icon" aria-hidden="true">⚠</span>
          <strong>Cases cannot be kept on this device.</strong> {sentence(storeMessage)}
        </p>
        {!/link/i.test(storeMessage) && <p>You can still work on a case, copy its link and export it as a case file.</p>}
        {retryable && (
          <p>
            Close any other Wetmode tabs or windows, then{' '}
            <button type="button" class="btn" onClick={() => location.reload()}>Reload Wetmode</button>
          </p>
        )}
      </div>
    );
  }
  if (!store) return <p class="cases-muted">Opening the cases saved on this device…</p>;
  return null;
}

/**
 * What the browser said when asked to keep Wetmode's storage (asked once per visit, after the first save).
 * Shows nothing until then. Place it on any screen; it updates by itself.
 */
export function PersistenceNote() {
  const [answer, setAnswer] = useState(persistenceAnswer);
  useEffect(() => onPersistenceAnswer(() => setAnswer(persistenceAnswer())), []);
  if (!answer) return null;
  return <p class={`persistence-note persistence-${answer}`}>{persistenceWords(answer)}</p>;
}

/** "Using 1.2 MB of 2.1 GB on this device"; re-read whenever `refresh` changes. Nothing where the browser cannot say. */
export function QuotaLine({ store, refresh }: { store: CaseStore | null; refresh: unknown }) {
  const [words, setWords] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    void (store ? store.estimateQuota() : estimateQuota()).then((q) => {
      if (live) setWords(quotaWords(q));
    });
    return () => {
      live = false;
    };
  }, [store, refresh]);
  return words ? <p class="quota-line">{words}</p> : null;
}
