import { useEffect, useRef, useState } from 'preact/hooks';
import type { CaseStore } from '../../store';
import type { AppModel } from '../state/app-model';
import { docForSaving, exportCaseFile, saveOpenCase } from './open-case';
import { isUntouchedStart } from './new-case';
import { replaceWarning } from './words';

/**
 * Opening another case replaces the open one. When the open case has changes not saved as a case (or is a
 * received case not saved here), ask first: save it, export it, open anyway, or cancel. Nothing is lost silently.
 */
export function useReplaceGuard(store: CaseStore | null, model: AppModel) {
  const [pending, setPending] = useState<(() => void) | null>(null);
  const [note, setNote] = useState<{ text: string; error: boolean } | null>(null);
  const first = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (pending) first.current?.focus();
  }, [pending]);

  /** Runs `open` now, or after the user has decided about the open case. */
  function guard(open: () => void): void {
    const { doc } = model.get();
    if (!doc || !model.unsaved() || (model.get().mode === 'editing' && isUntouchedStart(doc))) return open();
    setNote(null);
    // A function in state must be wrapped, or Preact would call it as an updater.
    setPending(() => open);
  }

  function proceed() {
    const run = pending;
    setPending(null);
    run?.();
  }

  async function saveThenProceed() {
    if (!store) return;
    const r = await saveOpenCase(store, model);
    if (r.ok) proceed();
    else setNote({ text: r.text, error: true });
  }

  const doc = model.get().doc;
  const prompt =
    pending && doc ? (
      <div class="replace-guard" role="group" aria-labelledby="replace-guard-text">
        <p id="replace-guard-text">{replaceWarning(doc, model.get().mode, model.get().saved !== null)}</p>
        {note && <p class={note.error ? 'cases-error' : undefined} role={note.error ? 'alert' : 'status'}>{note.text}</p>}
        <div class="cases-buttons">
          {store ? (
            <button ref={first} type="button" class="btn primary" onClick={() => void saveThenProceed()}>Save it, then continue</button>
          ) : (
            <button ref={first} type="button" class="btn primary" onClick={async () => {
              const r = await exportCaseFile(docForSaving(model) ?? doc);
              setNote({ text: r.text, error: !r.ok });
            }}>Export it as a file</button>
          )}
          <button type="button" class="btn cases-danger" onClick={proceed}>Continue without saving</button>
          <button type="button" class="btn" onClick={() => setPending(null)}>Cancel</button>
        </div>
      </div>
    ) : null;

  return { guard, prompt };
}
