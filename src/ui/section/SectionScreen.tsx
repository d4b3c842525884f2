import './section.css';
import { useMemo, useState } from 'preact/hooks';
import type { SectionDof, SectionInput } from '../../physics/section';
import { formatQuantity, type UnitSystem } from '../../units';
import { patchSurround, type SectionForm } from './form';
import { clearance, enclosureOf, straightBoundaries } from './geometry';
import { mapView } from './map-grid';
import { mapDisplay, type MapQuantity } from './map-values';
import { MOTION_WORDS } from './numbers';
import { SECTION_PRESETS, type SectionPreset } from './presets';
import { readSectionForm } from './read-form';
import { inputKey, useSectionSolve, type SolveState } from './use-section-solve';
import { BodyList } from './BodyList';
import { MapControls } from './MapControls';
import { MapLegend } from './MapLegend';
import { PresetBar } from './PresetBar';
import { SectionNumbers } from './SectionNumbers';
import { SectionPlot } from './SectionPlot';
import { FREE_SURFACE_NOTE, SurroundingsEditor, type Clearances } from './SurroundingsEditor';
import { TextField } from '../controls/TextField';

interface ViewState {
  form: SectionForm;
  motion: SectionDof;
  body: number;
  quantity: MapQuantity;
  system: UnitSystem;
  about: string;
}

function fromPreset(p: SectionPreset, keep?: ViewState): ViewState {
  return { form: p.make(), motion: p.motion, body: 0, quantity: keep?.quantity ?? 'speed', system: keep?.system ?? 'si', about: p.about };
}

/** The editor's state outlives the screen (kept for the page's life), so a visit to another screen loses nothing. */
let remembered: ViewState | null = null;

/** Puts a section (for example the open member's) into the editor; the next visit to the screen shows it. */
export function loadSectionForm(form: SectionForm, about: string): void {
  remembered = { form, motion: 'x', body: 0, quantity: remembered?.quantity ?? 'speed', system: remembered?.system ?? 'si', about };
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
export function SectionScreen() {
  const [v, setV] = useState<ViewState>(() => remembered ?? fromPreset(SECTION_PRESETS[0]));
  const update = (patch: Partial<ViewState>) =>
    setV((old) => {
      remembered = { ...old, ...patch };
      return remembered;
    });
  const reading = useMemo(() => readSectionForm(v.form), [v.form]);
  const input = reading.input;
  const body = Math.min(v.body, v.form.bodies.length - 1);
  const mapRequest = useMemo(() => (input ? { body, motion: v.motion, grid: mapView(input).grid } : null), [input, body, v.motion]);
  const solve = useSectionSolve(input, mapRequest);
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
      <PresetBar onPick={(p) => update(fromPreset(p, v))} />
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
              onInput={(t) => update({ form: { ...v.form, density: t }, about: '' })}
            />
          </fieldset>
          <BodyList form={v.form} errors={reading.errors} onChange={(form) => update({ form, about: '' })} />
          <SurroundingsEditor
            s={v.form.surround}
            errors={reading.errors}
            clearances={clearancesOf(input)}
            formatLength={formatLength}
            onChange={(patch) => update({ form: patchSurround(v.form, patch), about: '' })}
          />
        </div>
        <div class="section-view">
          <MapControls
            bodies={v.form.bodies.length}
            body={body}
            motion={v.motion}
            quantity={v.quantity}
            onBody={(k) => update({ body: k })}
            onMotion={(m) => update({ motion: m })}
            onQuantity={(q) => update({ quantity: q })}
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
              onSystem={(system) => update({ system })}
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
