import type { PlateSolved } from '../../app/solve-case';
import type { PlateBuild } from '../../kinds/common/types';
import { PlateMethodPanel } from './PlateMethodPanel';
import { PlateModeShapes } from './PlateModeShapes';
import { PlateModesTable } from './PlateModesTable';
import { PlateResonance } from './PlateResonance';
import { PlateSummaryPanel } from './PlateSummaryPanel';
import './plate.css';

/** The Results screen body for a plate panel: summary, frequencies, shapes on the plate, resonance, method. */
export function PlateResultsBody({ answer, build }: { answer: PlateSolved; build: PlateBuild }) {
  return (
    <div class="results-body">
      <PlateSummaryPanel answer={answer} />
      <PlateModesTable result={answer.plate} />
      <PlateModeShapes result={answer.plate} plate={build.plate} />
      <PlateResonance screening={answer.screening} result={answer.plate} />
      <PlateMethodPanel result={answer.plate} build={build} />
    </div>
  );
}
