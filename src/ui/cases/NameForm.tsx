import { useEffect, useId, useRef, useState } from 'preact/hooks';
import { CASE_LIMITS } from '../../case';
import { checkCaseName } from './names';

interface Props {
  /** "New name" or "Name of the copy". */
  label: string;
  initial: string;
  submitLabel: string;
  /** Resolves to an error message to show under the field, or null when done. */
  onSubmit: (name: string) => Promise<string | null>;
  onCancel: () => void;
}

/** A small inline form for a name (Rename, Duplicate): focused on open, Escape cancels, errors under the field. */
export function NameForm({ label, initial, submitLabel, onSubmit, onCancel }: Props) {
  const [text, setText] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const id = useId();

  useEffect(() => {
    input.current?.focus();
    input.current?.select();
  }, []);

  async function submit(e: Event) {
    e.preventDefault();
    const checked = checkCaseName(text);
    if (!checked.ok) {
      setError(checked.message);
      return;
    }
    setBusy(true);
    const problem = await onSubmit(checked.name);
    setBusy(false);
    setError(problem);
  }

  return (
    <form class="name-form" onSubmit={submit} onKeyDown={(e) => e.key === 'Escape' && onCancel()}>
      <label for={`${id}-name`}>{label}</label>
      <input
        id={`${id}-name`}
        ref={input}
        type="text"
        value={text}
        maxLength={CASE_LIMITS.nameChars}
        autoComplete="off"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onInput={(e) => setText(e.currentTarget.value)}
      />
      {error && <p id={`${id}-error`} class="cases-error">{error}</p>}
      <div class="name-form-buttons">
        <button type="submit" class="btn primary" disabled={busy}>{submitLabel}</button>
        <button type="button" class="btn" onClick={onCancel}>Cancel</button>
      </div>
    </form>
  );
}
