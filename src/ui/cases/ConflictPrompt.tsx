import { useEffect, useRef, useState } from 'preact/hooks';
import { useModel, useServices } from '../state/context';
import { displayName, formatCaseDate } from './format';
import { resolveConflict } from './open-case';
import './cases.css';

/**
 * Shown on every screen when a save was refused because another tab or window saved the same case meanwhile:
 * keep mine, keep theirs, or keep both (mine as a copy with a name that says so). Also says, quietly, when
 * another tab changed or deleted the open case's saved copy.
 */
export function ConflictPrompt() {
  const { store } = useServices();
  const [state, model] = useModel();
  const [said, setSaid] = useState<{ text: string; error: boolean } | null>(null);
  const first = useRef<HTMLButtonElement>(null);
  const { conflict, doc } = state;
  useEffect(() => {
    if (conflict) first.current?.focus();
  }, [conflict]);

  async function choose(choice: 'mine' | 'theirs' | 'both') {
    if (!store) return;
    const r = await resolveConflict(store, model, choice);
    setSaid({ text: r.text, error: !r.ok });
  }

  if (conflict && doc) {
    const theirs = conflict.theirs;
    return (
      <section class="replace-guard conflict-prompt" role="alertdialog" aria-labelledby="conflict-h" aria-describedby="conflict-text">
        <h2 id="conflict-h">This case was saved elsewhere</h2>
        <p id="conflict-text">
          {theirs
            ? `“${displayName(theirs)}” was saved in another tab or window (${formatCaseDate(theirs.updatedAt)}) after you opened it here. Your changes are not saved yet. Which version do you want to keep?`
            : 'The saved copy of this case was changed elsewhere and cannot be read. Your changes are not saved yet: keep yours over it, or keep both.'}
        </p>
        {said && <p class={said.error ? 'cases-error' : undefined} role={said.error ? 'alert' : 'status'}>{said.text}</p>}
        <div class="cases-buttons">
          <button ref={first} type="button" class="btn primary" onClick={() => void choose('both')}>Keep both (save mine as a copy)</button>
          <button type="button" class="btn" onClick={() => void choose('mine')}>Keep mine</button>
          {theirs && <button type="button" class="btn cases-danger" onClick={() => void choose('theirs')}>Keep theirs (drop my changes)</button>}
          <button type="button" class="btn" onClick={() => model.setConflict(null)}>Decide later</button>
        </div>
      </section>
    );
  }
  if (said && !said.error) {
    return (
      <p class="case-notice" role="status">
        {said.text} <button type="button" class="btn" onClick={() => setSaid(null)}>OK</button>
      </p>
    );
  }
  if (state.elsewhere) {
    return (
      <p class="case-notice" role="status" data-testid="elsewhere">
        {state.elsewhere} <button type="button" class="btn" onClick={() => model.setElsewhere(null)}>OK</button>
      </p>
    );
  }
  return null;
}
