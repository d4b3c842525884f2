import { placeholderOf } from '../../forms';
import { formatQuantity } from '../../units';
import { PlateSchematic } from '../plate/PlateSchematic';
import '../plate/plate.css';
import { useModel } from '../state/context';
import { MemberPlot } from '../plots/MemberPlot';
import { hashFor } from '../shell/router';
import { CaseDetails } from './CaseDetails';
import { FieldList } from './FieldList';
import { MemberToolbar } from './MemberToolbar';
import { QuickResults } from './QuickResults';
import { AnswerBar } from './AnswerBar';
import { kindOf } from '../../kinds/registry';
import { MemberRange } from './MemberRange';
import { RangesBar } from './RangesBar';
import { DefaultMark } from './RestsOnDefaults';
import { SiteEvidence } from './SiteEvidence';
import { useAnswerFirst } from './use-answer-first';

/** The guided form of the open case's member kind, its resonance inputs, a live schematic and the answer. */
export function MemberScreen() {
  const [state, model] = useModel();
  const formShown = useAnswerFirst(state);
  const doc = state.doc;
  if (!doc) {
    return (
      <section class="screen" aria-labelledby="screen-title">
        <h1 id="screen-title" tabIndex={-1}>Member</h1>
        <div class="panel notice">
          <p>No case is open. Start a new one or open a saved case from <a href={hashFor('cases')}>Cases</a>.</p>
        </div>
      </section>
    );
  }
  const form = kindOf(doc.kind).form;
  const stale = !model.resultsCurrent();
  const build = state.results?.build;
  const lengthUnit = doc.unitSystem === 'si' ? 'm' : 'ft';
  const received = state.mode === 'received';
  return (
    <section class="screen member-screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>{form.title}</h1>
      <p class="lead">{form.summary}</p>
      {received && <p class="panel notice">This is a received case. Save it to your cases (on the Results screen) before changing it.</p>}
      <MemberToolbar state={state} model={model} />
      <div class="member-layout">
        <div class="member-form">
          {!formShown && <p class="loading-screen" role="status">Opening the form…</p>}
          {formShown && (
            <>
              <fieldset disabled={received}>
                <legend>Member</legend>
                <FieldList
                  fields={form.fields}
                  values={doc.inputs}
                  system={doc.unitSystem}
                  errors={state.errors}
                  warnings={state.warnings}
                  placeholderOf={(k) => placeholderOf(form, k, doc.inputs, doc.unitSystem)}
                  onInput={(k, t) => model.setField(k, t)}
                  idPrefix="m"
                  moreLabel="More member details"
                  after={(f) => (
                    <>
                      <DefaultMark doc={doc} fieldKey={f.key} />
                      <MemberRange field={f} doc={doc} model={model} disabled={received} />
                    </>
                  )}
                />
                <RangesBar doc={doc} model={model} disabled={received} />
              </fieldset>
              <fieldset disabled={received}>
                <legend>What can drive it</legend>
                <FieldList
                  fields={kindOf(doc.kind).resonance.fields}
                  values={doc.excitation}
                  system={doc.unitSystem}
                  errors={state.excitationErrors}
                  warnings={state.warnings}
                  placeholderOf={(k) => kindOf(doc.kind).resonance.fields.find((f) => f.key === k)?.emptyMeans ?? ''}
                  onInput={(k, t) => model.setExcitation(k, t)}
                  idPrefix="x"
                  moreLabel="More resonance settings"
                />
              </fieldset>
              <fieldset disabled={received}>
                <legend>Case</legend>
                <CaseDetails doc={doc} model={model} readOnly={received} />
              </fieldset>
              <fieldset>
                <legend>Site evidence</legend>
                <SiteEvidence caseId={doc.id} readOnly={received} />
              </fieldset>
            </>
          )}
        </div>
        <aside class="member-side">
          <QuickResults state={state} stale={stale} />
          {formShown && build && build.engine === 'plate' && <PlateSchematic plate={build.plate} lengthUnit={lengthUnit} />}
          {formShown && build && build.engine !== 'plate' && (
            <figure class={`panel schematic${stale ? ' stale' : ''}`}>
              <MemberPlot model={build.model} landmarks={build.landmarks} title={`${form.title} schematic, to scale`} widthPx={280} heightPx={380} />
              <figcaption>
                To scale along the member. z = 0 at the {build.origin}.
                <ul class="landmarks">
                  {build.landmarks.map((l) => (
                    <li key={`${l.id}-${l.label}`}>{l.label}: {formatQuantity(l.zM, lengthUnit)}</li>
                  ))}
                </ul>
              </figcaption>
            </figure>
          )}
        </aside>
      </div>
      <AnswerBar state={state} stale={stale} />
    </section>
  );
}
