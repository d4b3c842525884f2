import type { Case } from '../../case';
import type { Results } from '../state/app-model';
import { displayUnits, sentence } from '../results/display-units';
import { MassTable } from '../results/MassTable';
import { ModeShapeFigure } from '../results/ModeShape';
import { ModesTable } from '../results/ModesTable';
import { AssumptionsPanel, DiagnosticsPanel } from '../results/NotesPanels';
import { ResonancePanel } from '../results/ResonancePanel';
import { failureText } from '../results/summary';
import { SummaryPanel } from '../results/SummaryPanel';
import { methodNotes } from './method-notes';

/** The results part of the report: summary, tables, plots, method notes with sources, assumptions. */
export function ReportResults({ doc, results, current }: { doc: Case; results: Results | null; current: boolean }) {
  const answer = results?.answer;
  if (!results || !answer) {
    return (
      <section class="report-section">
        <h2>Results</h2>
        <p class="report-warning">No results: the inputs are incomplete or have errors. Complete them on the Member screen, then print again.</p>
      </section>
    );
  }
  if (!answer.ok) {
    const f = failureText(answer);
    return (
      <section class="report-section">
        <h2>Results</h2>
        <p class="report-warning">
          <strong>{f.title}.</strong> {f.text}
        </p>
      </section>
    );
  }
  const units = displayUnits(doc.unitSystem);
  const { member, screening } = answer;
  return (
    <>
      {!current && (
        <p class="report-warning" role="note">
          These results were computed for earlier inputs than those listed above: recompute before relying on this report.
        </p>
      )}
      <div class="report-section">
        <SummaryPanel kind={doc.kind} system={doc.unitSystem} answer={answer} />
      </div>
      <div class="report-section">
        <ModesTable member={member} />
      </div>
      <section class="report-section report-figure" aria-labelledby="report-shape-title">
        <h2 id="report-shape-title">Mode shape, mode 1</h2>
        <ModeShapeFigure build={results.build} member={member} modeIndex={0} units={units} />
      </section>
      <div class="report-section">
        <MassTable member={member} units={units} />
      </div>
      {screening && (
        <div class="report-section">
          <ResonancePanel screening={screening} member={member} units={units} reasonsInSI={doc.unitSystem !== 'si'} />
        </div>
      )}
      <div class="report-section">
        <DiagnosticsPanel member={member} units={units} />
      </div>
      <section class="report-section" aria-labelledby="report-method-title">
        <h2 id="report-method-title">Method and sources</h2>
        <ul class="sourced-list">
          {methodNotes(member, screening, units).map((l, i) => (
            <li key={i}>
              {sentence(l.text)} <span class="source">Source: {sentence(l.source)}</span>
            </li>
          ))}
        </ul>
      </section>
      <div class="report-section">
        <AssumptionsPanel member={member} build={results.build} />
      </div>
    </>
  );
}
