import type { ComponentChildren } from 'preact';
import type { Case } from '../../case';
import type { Results } from '../state/app-model';
import { displayUnitsAsTyped, speedTextsOf } from './display-units-of-case';
import { MassTable } from './MassTable';
import { ModeShapePanel } from './ModeShape';
import { ModesTable } from './ModesTable';
import { AssumptionsPanel, CautionsPanel, DiagnosticsPanel } from './NotesPanels';
import { ResonancePanel } from './ResonancePanel';
import { StatusBanner } from './StatusBanner';
import { PlateResultsBody } from '../plate/PlateResultsView';
import { failureText } from './summary';
import { FailurePanel, SummaryPanel } from './SummaryPanel';
import { RestsOnDefaults } from '../member/RestsOnDefaults';
import { ResultsInputs } from './ResultsInputs';
import './results.css';

export interface ResultsViewProps {
  doc: Case;
  results: Results | null;
  /** The results on screen do not belong to the inputs on screen. */
  stale: boolean;
  computing: boolean;
  /** Field messages on the Member form (member and resonance inputs). */
  errorsCount: number;
  /** Shown after the mass table (the submerged section and its flow map). */
  sectionPanel?: ComponentChildren;
  /** Shown after the modes table (the band over the ranges on uncertain inputs). */
  bandPanel?: ComponentChildren;
}

/**
 * The Results screen body: summary, modes, mode shapes, mass by zone, resonance, warnings, assumptions and
 * cautions. Last results stay on screen when the inputs change, marked out of date.
 */
export function ResultsView({ doc, results, stale, computing, errorsCount, sectionPanel, bandPanel }: ResultsViewProps) {
  const banner = <StatusBanner hasResults={results !== null} stale={stale} computing={computing} errorsCount={errorsCount} />;
  const answer = results?.answer;
  if (!results || !answer) {
    return (
      <div class="results" aria-busy={computing}>
        {banner}
        <CautionsPanel />
      </div>
    );
  }
  if (!answer.ok) {
    return (
      <div class={stale ? 'results results-stale' : 'results'} aria-busy={computing}>
        {banner}
        <FailurePanel {...failureText(answer)} />
        <CautionsPanel />
      </div>
    );
  }
  const build = results.build;
  if (answer.engine === 'plate' || build.engine === 'plate') {
    return (
      <div class={stale ? 'results results-stale' : 'results'} aria-busy={computing}>
        {banner}
        {answer.engine === 'plate' && build.engine === 'plate' && <PlateResultsBody answer={answer} build={build} />}
        <CautionsPanel model="plate" />
      </div>
    );
  }
  const units = displayUnitsAsTyped(doc.unitSystem, speedTextsOf(doc));
  const { member, screening } = answer;
  return (
    <div class={stale ? 'results results-stale' : 'results'} aria-busy={computing}>
      {banner}
      <div class="results-body">
        <SummaryPanel kind={doc.kind} system={doc.unitSystem} answer={answer} speedUnit={units.speed} />
        <RestsOnDefaults doc={doc} />
        <ResultsInputs doc={doc} />
        <ModesTable member={member} />
        {bandPanel}
        <ModeShapePanel build={build} member={member} units={units} />
        <MassTable member={member} units={units} />
        {member.wet && sectionPanel}
        {screening && <ResonancePanel screening={screening} member={member} units={units} reasonsInSI={doc.unitSystem !== 'si'} />}
        <DiagnosticsPanel member={member} units={units} inputWarnings={results.inputWarnings} />
        <AssumptionsPanel member={member} build={build} />
      </div>
      <CautionsPanel />
    </div>
  );
}
