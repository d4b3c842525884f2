import type { ComponentChildren } from 'preact';
import type { Case } from '../../case';
import type { Results } from '../state/app-model';
import { sentence } from '../results/display-units';
import { displayUnitsAsTyped, speedTextsOf } from '../results/display-units-of-case';
import { MassTable } from '../results/MassTable';
import { ModesTable } from '../results/ModesTable';
import { AssumptionsPanel, DiagnosticsPanel } from '../results/NotesPanels';
import { failureText } from '../results/summary';
import { SummaryPanel } from '../results/SummaryPanel';
import { methodNotes } from './method-notes';
import { ModeShapesStrip } from './ModeShapesStrip';
import { ReportResonance } from './ReportResonance';
import { PlateReportDetails, PlateReportKey } from '../plate/PlateReport';

type Props = { doc: Case; results: Results | null; current: boolean; children?: ComponentChildren };

/** Why there is nothing to print, or null when there are results. */
function missing(results: Results | null) {
  const answer = results?.answer;
  if (!results || !answer) {
    return <p class="report-warning">No results: the inputs are incomplete or have errors. Complete them on the Member screen, then print again.</p>;
  }
  if (!answer.ok) {
    const f = failureText(answer);
    return (
      <p class="report-warning">
        <strong>{f.title}.</strong> {f.text}
      </p>
    );
  }
  return null;
}

/** Page 1 of the record: the verdict with its margin and critical speed, and every mode's frequencies. */
export function ReportKeyResults({ doc, results, current }: Props) {
  const none = missing(results);
  if (none || !results?.answer?.ok) return <section class="report-section"><h2>Results</h2>{none}</section>;
  return (
    <>
      {!current && (
        <p class="report-warning" role="note">
          These results were computed for earlier inputs than those listed in this record: recompute before relying on it.
        </p>
      )}
      {results.answer.engine === 'plate' ? (
        <PlateReportKey answer={results.answer} />
      ) : (
        <>
          <div class="report-section">
            <SummaryPanel kind={doc.kind} system={doc.unitSystem} answer={results.answer} speedUnit={displayUnitsAsTyped(doc.unitSystem, speedTextsOf(doc)).speed} />
          </div>
          <div class="report-section">
            <ModesTable member={results.answer.member} />
          </div>
        </>
      )}
    </>
  );
}

/** The rest of the record: shapes, mass per metre, resonance, solver report, method and sources, assumptions. */
/** `children` (the case link) sit beside the assumptions, under the solver report. */
export function ReportDetails({ doc, results, children }: Props) {
  const answer = results?.answer;
  if (!results || !answer || !answer.ok) return <>{children}</>;
  const build = results.build;
  if (answer.engine === 'plate' || build.engine === 'plate') {
    return answer.engine === 'plate' && build.engine === 'plate' ? <PlateReportDetails answer={answer} build={build}>{children}</PlateReportDetails> : <>{children}</>;
  }
  const units = displayUnitsAsTyped(doc.unitSystem, speedTextsOf(doc));
  const { member, screening } = answer;
  return (
    <>
      <div class="report-section report-columns report-shapes-mass">
        <section aria-labelledby="report-shape-title">
          <h2 id="report-shape-title">Mode shapes</h2>
          <ModeShapesStrip member={member} lengthM={build.model.lengthM} />
        </section>
        <div>
          <MassTable member={member} units={units} withMethod={false} />
        </div>
      </div>
      {screening && <ReportResonance screening={screening} member={member} units={units} reasonsInSI={doc.unitSystem !== 'si'} />}
      <div class="report-section report-columns">
        <div>
          <DiagnosticsPanel member={member} units={units} inputWarnings={results.inputWarnings} />
          {children}
        </div>
        <AssumptionsPanel member={member} build={build} />
      </div>
      <section class="report-section" aria-labelledby="report-method-title">
        <h2 id="report-method-title">Method and sources</h2>
        <ul class="sourced-list">
          {methodNotes(member, screening, units, false).map((l, i) => (
            <li key={i}>
              {sentence(l.text)} <span class="source">Source: {sentence(l.source)}</span>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}
