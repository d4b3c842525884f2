import type { Case } from '../../case';
import { formatDateTime } from './report-meta';
import { kindOf } from '../../kinds/registry';

/** Title block: what, which case, when, which app version. Names and notes are shown as text, never markup. */
export function ReportHeader({ doc, appVersion, printedAt }: { doc: Case; appVersion: string; printedAt: string }) {
  return (
    <header class="report-header">
      <h1 id="screen-title" tabIndex={-1}>Wetmode screening report</h1>
      <dl class="report-meta">
        <dt>Case</dt>
        <dd>{doc.name.trim() === '' ? '(no name)' : doc.name}</dd>
        <dt>Tag</dt>
        <dd>{doc.tag.trim() === '' ? '(none)' : doc.tag}</dd>
        <dt>Member</dt>
        <dd>{kindOf(doc.kind).title}</dd>
        <dt>Units</dt>
        <dd>{doc.unitSystem === 'si' ? 'SI (metric)' : 'US customary'}</dd>
        <dt>Last changed</dt>
        <dd>{formatDateTime(doc.updatedAt)}</dd>
        <dt>Printed on</dt>
        <dd>{formatDateTime(printedAt)}</dd>
        <dt>App version</dt>
        <dd>
          Wetmode {appVersion}
          {doc.appVersion !== appVersion ? ` (case last saved by ${doc.appVersion})` : ''}
        </dd>
      </dl>
      {doc.note.trim() !== '' && (
        <div class="report-note">
          <p class="report-note-title">Note</p>
          <p class="report-note-text">{doc.note}</p>
        </div>
      )}
    </header>
  );
}
