import type { ModelState } from '../state/app-model';
import { answerFigures } from '../../app/answer-figures';
import { formatHz } from '../format/numbers';
import { VerdictBadge } from '../results/VerdictBadge';
import { hashFor } from '../shell/router';
import { MemberSectionLink } from '../section/MemberSectionLink';
import { QuickBand } from './QuickBand';
import { RestsOnDefaults } from './RestsOnDefaults';

/** The answer beside the form: lowest dry and wet frequency and the verdict, marked when out of date. */
export function QuickResults({ state, stale }: { state: ModelState; stale: boolean }) {
  const a = state.results?.answer;
  const fig = a && a.ok ? answerFigures(a) : null;
  const build = state.results?.build;
  const errorCount = Object.keys(state.errors).length;
  return (
    <section class={`panel quick${stale ? ' stale' : ''}`} aria-labelledby="quick-title" aria-live="polite">
      <h2 id="quick-title">Answer</h2>
      {stale && (
        <p class="stale-note" data-testid="stale-note">
          <span aria-hidden="true">⟳ </span>
          {errorCount > 0 ? `Out of date: fix ${errorCount === 1 ? 'the field' : `${errorCount} fields`} marked ✖` : 'Updating…'}
        </p>
      )}
      {!a && !stale && <p>Fill in the member to see its frequencies.</p>}
      {state.solverMessage && <p class="field-error" role="alert">{state.solverMessage}</p>}
      {Object.keys(state.warnings).length > 0 && (
        <ul class="field-warning quick-warnings" data-testid="quick-warnings">
          {Object.values(state.warnings).map((w) => (
            <li key={w}>⚠ {w}</li>
          ))}
        </ul>
      )}
      {a && !a.ok && <p class="field-error" data-testid="solve-failure">{a.message}</p>}
      {fig && (
        <dl class="quick-figures">
          <div>
            <dt>Lowest dry frequency</dt>
            <dd data-testid="quick-dry">{formatHz(fig.lowestDryHz)}</dd>
          </div>
          {fig.lowestWetHz !== null && (
            <div>
              <dt>Lowest wet frequency</dt>
              <dd data-testid="quick-wet">{formatHz(fig.lowestWetHz)}</dd>
            </div>
          )}
          <div>
            <dt>Resonance</dt>
            <dd data-testid="quick-verdict">{fig.verdict ? <VerdictBadge verdict={fig.verdict} /> : 'not screened: see the resonance inputs'}</dd>
          </div>
        </dl>
      )}
      {fig && state.doc && <RestsOnDefaults doc={state.doc} />}
      <QuickBand />
      <div class="quick-links">
        <a class="btn" href={hashFor('results')}>All results</a>
        {build?.engine !== 'plate' && <a class="btn" href={hashFor('measure')}>Field check</a>}
        {build?.engine !== 'plate' && <MemberSectionLink model={build?.model ?? null} label="Section and flow" />}
      </div>
    </section>
  );
}
