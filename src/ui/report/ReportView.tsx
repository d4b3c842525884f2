import type { ComponentChildren } from 'preact';
import { useEffect } from 'preact/hooks';
import type { Case } from '../../case';
import { contentKey, type Results } from '../state/app-model';
import { CautionsPanel } from '../results/NotesPanels';
import { InputsTable } from './InputsTable';
import { inputRows } from './report-inputs';
import { ReportHeader } from './ReportHeader';
import { ReportPhotos } from './ReportPhotos';
import { ReportDetails, ReportKeyResults } from './ReportResults';
import { ReportSignOff } from './ReportSignOff';
import { CaseQr } from './CaseQr';
import { adoptPageRule, pageRule } from './print-header';
import { formatDateTime } from './report-meta';
import '../results/results.css';
import './report.css';
import { kindOf } from '../../kinds/registry';

export interface ReportViewProps {
  doc: Case;
  results: Results | null;
  /** The case link to print as text; null when none could be made. */
  link: string | null;
  appVersion: string;
  /** The band over the ranges on uncertain inputs, printed after the inputs (none when no range is on). */
  band?: ComponentChildren;
}

/**
 * The print view, a screening record an office files: page 1 carries the case, the verdict with its margin and
 * critical speed, the frequencies, the cautions and the sign-off; then inputs (as entered, in SI, entered or
 * default), shapes, resonance, method and sources, and the case link as text and QR code. A running header and
 * page numbers on every page. A white sheet on screen in either theme, A4 or Letter on paper.
 */
export function ReportView({ doc, results, link, appVersion, band }: ReportViewProps) {
  const printedAt = new Date().toISOString();
  const kind = kindOf(doc.kind);
  const memberRows = inputRows(kind.form.fields, doc.inputs, doc.unitSystem, kind.form.defaults(doc.unitSystem));
  const excitationRows = inputRows(kind.resonance.fields, doc.excitation, doc.unitSystem);
  const current = results !== null && results.forKey === contentKey(doc);
  const header = [doc.name.trim() || '(no name)', doc.tag.trim(), formatDateTime(printedAt)].filter((s) => s !== '').join(' · ');
  useEffect(() => adoptPageRule(pageRule(header, appVersion)), [header, appVersion]);
  return (
    <div class="report">
      <div class="report-actions">
        <button type="button" class="btn primary" onClick={() => window.print()}>
          Print or save as PDF
        </button>
        <span class="report-hint">Choose A4 or Letter in the print dialogue; “Save as PDF” files it.</span>
      </div>
      <article class="report-sheet" aria-label="Wetmode screening report">
        <ReportHeader doc={doc} appVersion={appVersion} printedAt={printedAt} />
        <ReportKeyResults doc={doc} results={results} current={current} />
        <div class="report-section report-cautions">
          <CautionsPanel model={kind.engine} />
        </div>
        <ReportSignOff />
        <section class="report-section report-page-start" aria-labelledby="report-inputs-title">
          <h2 id="report-inputs-title">Inputs</h2>
          <div class="report-inputs-cols">
            <InputsTable caption="Member inputs" rows={memberRows} />
            <InputsTable caption="Resonance inputs" rows={excitationRows} />
          </div>
        </section>
        {band}
        <ReportPhotos caseId={doc.id} />
        <ReportDetails doc={doc} results={results} current={current}>
        <section class="report-section report-link" aria-labelledby="report-link-title">
          <h2 id="report-link-title">Case link</h2>
          {link ? (
            <div class="report-link-row">
              <CaseQr link={link} />
              <p class="report-link-text">{link}</p>
            </div>
          ) : (
            <p>Link not available.</p>
          )}
        </section>
        </ReportDetails>
      </article>
    </div>
  );
}
