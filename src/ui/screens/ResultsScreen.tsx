import { useModel } from '../state/context';
import { ResultsView } from '../results/ResultsView';
import { hashFor } from '../shell/router';
import type { ComponentChildren } from 'preact';
import { MemberSectionPanel } from '../section/MemberSectionPanel';
import { kindOf } from '../../kinds/registry';
import { LiveBandPanel } from '../results/LiveBandPanel';

/** The Results screen: the open case's results; `banner` is shown above them (a received case). */
export function ResultsScreen({ banner, actions }: { banner?: ComponentChildren; actions?: ComponentChildren }) {
  const [state, model] = useModel();
  const doc = state.doc;
  return (
    <section class="screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Results{doc ? `: ${doc.name || kindOf(doc.kind).title}` : ''}</h1>
      {banner}
      {!doc ? (
        <div class="panel notice">
          <p>No case is open. Open one from <a href={hashFor('cases')}>Cases</a> or start a new member.</p>
        </div>
      ) : (
        <>
          {actions}
          <p class="quick-links">
            <a href={hashFor('measure')} data-testid="to-field-check">Field check: compare with a measured frequency</a>
          </p>
          {state.solverMessage && <p class="field-error" role="alert">{state.solverMessage}</p>}
          <ResultsView
            doc={doc}
            results={state.results}
            stale={!model.resultsCurrent()}
            computing={state.computing}
            errorsCount={Object.keys(state.errors).length}
            sectionPanel={state.results && state.results.build.engine !== 'plate' && <MemberSectionPanel model={state.results.build.model} system={doc.unitSystem} />}
            bandPanel={<LiveBandPanel />}
          />
        </>
      )}
    </section>
  );
}
