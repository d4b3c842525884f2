import { useEffect, useRef, useState } from 'preact/hooks';
import type { Case } from '../../case';
import { copyText, encodeCaseLink, resultsToCsv, shareLink, type CsvCell } from '../../share';
import { useServices } from '../state/context';
import { displayName } from './format';
import { downloadText } from './download';
import { docForSaving, exportCaseFile } from './open-case';
import { csvFileName, resultCsvRows } from './results-csv';
import { copyWords, shareWords } from './words';
import './cases.css';

interface Props {
  doc: Case;
  /** Rows for the CSV; when absent they are built from the model's current results. */
  csvRows?: readonly (readonly CsvCell[])[];
}

function canShare(): boolean {
  return typeof navigator !== 'undefined' && typeof navigator.share === 'function';
}

/** Copy link, Share… (where the system has a share sheet), Export case file, Export results as CSV. */
export function ShareActions({ doc, csvRows }: Props) {
  const { model } = useServices();
  const [said, setSaid] = useState<{ text: string; error: boolean } | null>(null);
  const [manual, setManual] = useState<string | null>(null);
  const field = useRef<HTMLTextAreaElement>(null);
  // The link is made as soon as the case changes, so Copy can write it within the tap's user gesture
  // (Safari refuses clipboard writes that come after a slow await).
  const pending = useRef<{ doc: Case; url: Promise<string> } | null>(null);

  useEffect(() => {
    setSaid(null);
    setManual(null);
  }, [doc.id]);
  useEffect(() => {
    const url = encodeCaseLink(doc, location.origin + location.pathname);
    url.catch(() => undefined); // reported when used
    pending.current = { doc, url };
  }, [doc]);
  useEffect(() => {
    if (manual) field.current?.select();
  }, [manual]);

  async function link(): Promise<string | null> {
    try {
      const made = pending.current?.doc === doc ? pending.current.url : encodeCaseLink(doc, location.origin + location.pathname);
      return await made;
    } catch (e) {
      setSaid({ text: `Could not make a link for this case: ${e instanceof Error ? e.message : String(e)}`, error: true });
      return null;
    }
  }

  async function copy() {
    const url = await link();
    if (!url) return;
    const answer = await copyText(url);
    setManual(answer === 'copied' ? null : url);
    setSaid({ text: copyWords(answer, url.length), error: answer === 'failed' });
  }

  async function share() {
    const url = await link();
    if (!url) return;
    const answer = await shareLink({ url, title: `Wetmode case: ${displayName(doc)}` });
    if (answer === 'unsupported' || answer === 'failed') setManual(url);
    const words = shareWords(answer);
    setSaid(words ? { text: words, error: answer !== 'shared' } : null);
  }

  async function exportFile() {
    const r = await exportCaseFile(model.get().doc?.id === doc.id ? (docForSaving(model) ?? doc) : doc);
    setSaid({ text: r.text, error: !r.ok });
  }

  function exportCsv() {
    const { results } = model.get();
    const current = model.get().doc?.id === doc.id && model.resultsCurrent();
    if (!csvRows && !current) {
      setSaid({ text: 'The results are not up to date with the inputs yet. Wait for them to finish, then export.', error: true });
      return;
    }
    const rows = csvRows ?? resultCsvRows(doc, results?.answer ?? null, new Date().toISOString());
    const name = csvFileName(doc);
    const problem = downloadText(resultsToCsv(rows, { excelBom: true }), name, 'text/csv;charset=utf-8');
    setSaid(problem ? { text: problem, error: true } : { text: `Exported the results as ${name}.`, error: false });
  }

  return (
    <div class="share-actions">
      <div class="cases-buttons">
        <button type="button" class="btn" onClick={() => void copy()}>Copy link</button>
        {canShare() && <button type="button" class="btn" onClick={() => void share()}>Share…</button>}
        <button type="button" class="btn" onClick={exportFile}>Export case file</button>
        <button type="button" class="btn" onClick={exportCsv}>Export results as CSV</button>
      </div>
      <div role="status" aria-live="polite">
        {said && <p class={said.error ? 'cases-error' : 'share-said'}>{said.text}</p>}
      </div>
      {manual && (
        <div class="manual-link">
          <label for="manual-link-field">Link to this case (select it and copy)</label>
          <textarea id="manual-link-field" ref={field} readOnly rows={3} value={manual} onFocus={(e) => e.currentTarget.select()} />
        </div>
      )}
    </div>
  );
}
