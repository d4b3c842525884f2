import './section.css';
import { useEffect, useMemo, useState } from 'preact/hooks';
import type { SectionInput } from '../../physics/section';
import { formatQuantity } from '../../units';
import { patchSurround } from './form';
import { clearance, enclosureOf, straightBoundaries } from './geometry';
import { mapView } from './map-grid';
import { mapDisplay } from './map-values';
import { MOTION_WORDS } from './numbers';
import type { SectionModel, SectionModelState } from './section-model';
import { inputKey, type SolveState } from './section-solves';
import { SURROUND_WORDS } from './view-words';
import { BodyList } from './BodyList';
import { MapControls } from './MapControls';
import { MapLegend } from './MapLegend';
import { PresetBar } from './PresetBar';
import { SectionNumbers } from './SectionNumbers';
import { SectionPlot } from './SectionPlot';
import { FREE_SURFACE_NOTE, SurroundingsEditor, type Clearances } from './SurroundingsEditor';
import { TextField } from '../controls/TextField';

/** The model's state, re-rendered on every change; the model solves only while a screen is attached. */
function useSectionModel(model: SectionModel): SectionModelState {
  const [state, setState] = useState(() => model.get());
  useEffect(() => {
    setState(model.get());
    const off = model.subscribe(() => setState(model.get()));
    const detach = model.attach();
    return () => {
      off();
      detach();
    };
  }, [model]);
  return state;
}

function clearancesOf(input: SectionInput | null): Clearances {
  const out: Clearances = {};
  for (const l of input ? straightBoundaries(input) : []) {
    const which = l.kind === 'free-surface' ? 'freeSurface' : l.normal[1] !== 0 ? 'wallBelow' : 'wallBeside';
    out[which] = clearance(input as SectionInput, l);
  }
  return out;
}

function statusText(solve: SolveState, invalid: boolean, stale: boolean): { text: string; error: boolean } {
  if (invalid) return { text: 'Check the marked fields. Nothing is solved until every field reads; the numbers below are kept but out of date.', error: true };
  if (solve.phase === 'failed') return { text: solve.message ?? 'No numbers for this section.', error: true };
  if (solve.phase === 'solving' || (stale && solve.phase !== 'idle')) return { text: 'Solving…', error: false };
  if (solve.phase === 'checking') return { text: 'Numbers ready. Checking them by kinetic energy…', error: false };
  if (solve.message) return { text: solve.message, error: true };
  return { text: solve.shown ? 'Solved.' : '', error: false };
}

/** The Section view: edit a section and its surroundings, see it to scale with its flow map, read its added mass. */
export function SectionScreen({ model }: { model: SectionModel }) {
  const v = useSectionModel(model);
  const { reading, input, body, solve } = v;
  const words = SURROUND_WORDS[v.view];
  const shown = solve.shown;
  const stale = !shown || shown.key !== inputKey(input);
  const unit = v.system === 'si' ? 'mm' : 'in';
  const formatLength = (m: number) => formatQuantity(m, unit, 4);
  const display = useMemo(
    () => (shown?.field ? mapDisplay(shown.field, shown.input, v.quantity, (m) => formatQuantity(m, unit, 3)) : null),
    [shown, v.quantity, unit],
  );
  const drawn = shown?.input ?? input;
  const status = statusText(solve, !input, stale);
  const hasSurface = (drawn?.boundaries ?? []).some((b) => b.kind === 'free-surface');
  const label = drawn
    ? `Section drawn to scale with ${drawn.bodies.length} ${drawn.bodies.length > 1 ? 'bodies' : 'body'}${enclosureOf(drawn) ? ' in an enclosure' : ''}` +
      (shown?.field ? `; map of ${v.quantity} for body ${shown.field.body + 1} in ${MOTION_WORDS[shown.field.motion]}` : '')
    : 'No section yet';
  return (
    <section class="screen section-screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Section</h1>
      <p class="lead">Added mass of any cross-section in still liquid, near walls, a free surface or inside a pipe. Start from a preset and change it.</p>
      <PresetBar onPick={(p) => model.pickPreset(p)} />
      {v.about && <p class="field-help section-about">{v.about}</p>}
      <div class="section-layout">
        <div class="section-editor">
          <fieldset>
            <legend>Liquid</legend>
            <TextField
              id="sec-density"
              label="Density"
              value={v.form.density}
              unit="kg/m³"
              error={reading.errors['density']}
              help="Seawater about 1025, fresh water 998, fuel about 800."
              onInput={(t) => model.editForm({ ...v.form, density: t })}
            />
          </fieldset>
          <BodyList form={v.form} errors={reading.errors} addLabel={words.addBody} axes={words.axes} onChange={(form) => model.editForm(form)} />
          <SurroundingsEditor
            s={v.form.surround}
            errors={reading.errors}
            clearances={clearancesOf(input)}
            formatLength={formatLength}
            view={v.view}
            onView={(view) => model.setView(view)}
            onChange={(patch) => model.editForm(patchSurround(v.form, patch))}
          />
        </div>
        <div class="section-view">
          <MapControls
            bodies={v.form.bodies.length}
            body={body}
            motion={v.motion}
            quantity={v.quantity}
            onBody={(k) => model.setBody(k)}
            onMotion={(m) => model.setMotion(m)}
            onQuantity={(q) => model.setQuantity(q)}
          />
          <p class={`status section-status${status.error ? ' error' : ''}`} role="status" aria-live="polite">{status.text}</p>
          {drawn ? (
            <SectionPlot
              input={drawn}
              box={mapView(drawn).box}
              field={shown?.field ?? null}
              display={display}
              body={body}
              motion={v.motion}
              stale={stale}
              label={label}
              formatLength={formatLength}
              axes={words.axes}
            />
          ) : (
            <p class="panel notice">The drawing appears once the section reads.</p>
          )}
          {shown?.fieldError && <p class="field-error">No map: {shown.fieldError}</p>}
          {display && <MapLegend display={display} quantity={v.quantity} />}
          {hasSurface && <p class="field-help">{FREE_SURFACE_NOTE}</p>}
        </div>
        <div class="section-results">
          {shown ? (
            <SectionNumbers
              input={shown.input}
              result={shown.result}
              system={v.system}
              onSystem={(system) => model.setSystem(system)}
              checking={solve.phase === 'checking'}
              stale={stale}
              formatLength={formatLength}
            />
          ) : null}
        </div>
      </div>
    </section>
  );
}
