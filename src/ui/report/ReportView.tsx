import type { Case } from '../../case';
import { contentKey, type Results } from '../state/app-model';
import { CautionsPanel } from '../results/NotesPanels';
import { InputsTable } from './InputsTable';
import { inputRows } from './report-inputs';
import { ReportHeader } from './ReportHeader';
import { ReportResults } from './ReportResults';
import '../results/results.css';
import './report.css';
import { kindOf } from '../../kinds/registry';

export interface ReportViewProps {
  doc: Case;
  results: Results | null;
  /** The case link to print as text; null when none could be made. */
  link: string | null;
  appVersion: string;
}

/**
 * The print view: a white sheet on screen in either theme, A4 or Letter on paper. Everything printed
 * comes from the case as entered and its results; the cautions are printed in full.
 */
export function ReportView({ doc, results, link, appVersion }: ReportViewProps) {
  const memberRows = inputRows(kindOf(doc.kind).form.fields, doc.inputs, doc.unitSystem);
  const excitationRows = inputRows(kindOf(doc.kind).resonance.fields, doc.excitation, doc.unitSystem);
  const current = results !== null && results.forKey === contentKey(doc);
  return (
    <div class="report">
      <div class="report-actions">
        <button type="button" class="btn primary" onClick={() => window.print()}>
          Print or save as PDF
        </button>
        <span class="report-hint">Choose A4 or Letter in the print dialogue; “Save as PDF” files it.</span>
      </div>
      <article class="report-sheet" aria-label="Wetmode screening report">
        <ReportHeader doc={doc} appVersion={appVersion} printedAt={new Date().toISOString()} />
        <section class="report-section" aria-labelledby="report-inputs-title">
          <h2 id="report-inputs-title">Inputs</h2>
          <InputsTable caption="Member inputs" rows={memberRows} />
          <InputsTable caption="Resonance inputs" rows={excitationRows} />
        </section>
        <ReportResults doc={doc} results={results} current={current} />
        <div class="report-section">
          <CautionsPanel />
        </div>
        <section class="report-section report-link" aria-labelledby="report-link-title">
          <h2 id="report-link-title">Case link</h2>
          {link ? <p class="report-link-text">{link}</p> : <p>Link not available.</p>}
        </section>
      </article>
    </div>
  );
}
