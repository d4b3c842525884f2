import type { ComponentChildren } from 'preact';
import type { PlateSolved } from '../../app/solve-case';
import type { PlateBuild } from '../../kinds/common/types';
import { PlateMethodPanel } from './PlateMethodPanel';
import { PlateModeShapes } from './PlateModeShapes';
import { PlateModesTable } from './PlateModesTable';
import { PlateResonance } from './PlateResonance';
import { PlateSummaryPanel } from './PlateSummaryPanel';
import './plate.css';

/** Page 1 of a plate's record: the verdict and every mode's frequencies with their error estimates. */
export function PlateReportKey({ answer }: { answer: PlateSolved }) {
  return (
    <>
      <div class="report-section">
        <PlateSummaryPanel answer={answer} />
      </div>
      <div class="report-section">
        <PlateModesTable result={answer.plate} />
      </div>
    </>
  );
}

/** The rest of a plate's record, kept compact: every shape dry and wet, small; the governing checks; method. */
export function PlateReportDetails({ answer, build, children }: { answer: PlateSolved; build: PlateBuild; children?: ComponentChildren }) {
  return (
    <>
      <div class="report-section">
        <PlateModeShapes result={answer.plate} plate={build.plate} sizePx={64} />
      </div>
      <div class="report-section">
        <PlateResonance screening={answer.screening} result={answer.plate} governing />
      </div>
      <div class="report-section report-columns">
        <div>{children}</div>
        <PlateMethodPanel result={answer.plate} build={build} />
      </div>
    </>
  );
}
