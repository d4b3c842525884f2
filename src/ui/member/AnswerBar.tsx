import type { ModelState } from '../state/app-model';
import { answerFigures } from '../../app/answer-figures';
import { formatHz } from '../format/numbers';
import { VerdictBadge } from '../results/VerdictBadge';
import { AnswerBarBand } from './AnswerBarBand';

/**
 * The answer in one line, kept in view at the bottom of the screen while the surveyor types (portrait and
 * narrow screens, where the answer panel sits far above the field in use). Hidden where the panel is beside
 * the form. Not a live region: the answer panel above already announces changes.
 */
export function AnswerBar({ state, stale }: { state: ModelState; stale: boolean }) {
  const a = state.results?.answer;
  const fig = a && a.ok ? answerFigures(a) : null;
  const errorCount = Object.keys(state.errors).length;
  return (
    <div class={`answer-bar${stale ? ' stale' : ''}`} data-testid="answer-bar">
      {fig ? (
        <>
          <span>
            Dry <strong>{formatHz(fig.lowestDryHz)}</strong>
          </span>
          {fig.lowestWetHz !== null && (
            <span>
              Wet <strong>{formatHz(fig.lowestWetHz)}</strong>
            </span>
          )}
          {fig.verdict && <VerdictBadge verdict={fig.verdict} />}
          <AnswerBarBand />
        </>
      ) : (
        <span>{a && !a.ok ? 'No answer: see the message above' : 'Fill in the member to see its frequencies'}</span>
      )}
      {stale && <span class="answer-bar-note">{errorCount > 0 ? `out of date: ${errorCount} field${errorCount === 1 ? '' : 's'} to fix` : 'updating…'}</span>}
    </div>
  );
}
