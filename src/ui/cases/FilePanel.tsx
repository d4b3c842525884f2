import { useId } from 'preact/hooks';
import type { Case } from '../../case';
import { caseFromFileText } from '../../share/file';
import { importOutcome, importReadProblem, importSizeProblem } from './import-file';
import { restoreEvidence, restoredText } from '../../attachments/evidence-io';
import type { Status } from './StatusLine';

interface Props {
  /** Called with a good case from a file; the caller opens it as received (the user saves it explicitly). */
  onImported: (c: Case, message: string) => void;
  setStatus: (s: Status | null) => void;
}

/** "Import a case file": a file chooser styled as a big button. Nothing is saved or overwritten by importing. */
export function FilePanel({ onImported, setStatus }: Props) {
  const id = useId();

  async function chosen(input: HTMLInputElement) {
    const file = input.files?.[0];
    // Clear the chooser so choosing the same file again fires another change.
    input.value = '';
    if (!file) return;
    const tooBig = importSizeProblem(file.name, file.size);
    if (tooBig) return setStatus({ text: tooBig, tone: 'error' });
    let text: string;
    try {
      text = await file.text();
    } catch (e) {
      return setStatus({ text: importReadProblem(file.name, e), tone: 'error' });
    }
    const parsed = caseFromFileText(text);
    const r = importOutcome(file.name, parsed);
    if (!r.ok) return setStatus({ text: r.message, tone: 'error' });
    // The site evidence goes to this device's attachment store under the case's id, added beside what is kept.
    const dropped = parsed.ok ? (parsed.evidenceDropped ?? []) : [];
    let said = '';
    if (parsed.ok && parsed.evidence) {
      const kept = await restoreEvidence(r.value.id, parsed.evidence);
      said = kept.ok ? restoredText(kept.value, dropped) : `The site photos and location in the file were not kept: ${kept.message}`;
    } else if (dropped.length > 0) said = restoredText({ photosAdded: 0, photosAlreadyKept: 0, locationSet: false, locationKept: false }, dropped);
    onImported(r.value, said ? `${r.message} ${said}` : r.message);
  }

  return (
    <section class="file-panel" aria-labelledby={`${id}-h`}>
      <h2 id={`${id}-h`}>Case files</h2>
      <p class="cases-muted">
        A case file (<code>.wetmode.json</code>) opens as a received case: look at it, then choose Save to my cases. It never replaces a saved case.
      </p>
      <label class="btn file-button">
        Import a case file…
        <input
          type="file"
          class="vh-file"
          accept=".json,.wetmode.json,application/json"
          onChange={(e) => void chosen(e.currentTarget)}
        />
      </label>
    </section>
  );
}
