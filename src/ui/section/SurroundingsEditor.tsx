import type { ComponentChildren } from 'preact';
import { surroundKey, type EnclosureShape, type FieldErrors, type SurroundForm, type WallSide } from './form';
import { TextField } from '../controls/TextField';
import { SECTION_VIEWS, SURROUND_WORDS, type SectionView } from './view-words';

export type Clearances = Partial<Record<'wallBelow' | 'wallBeside' | 'freeSurface', number>>;

interface Props {
  s: SurroundForm;
  errors: FieldErrors;
  /** Clear gap (m) from each straight boundary to the nearest body; negative when a body crosses it. */
  clearances: Clearances;
  formatLength: (m: number) => string;
  /** How the section is seen: the words for the walls and the surface follow it. */
  view: SectionView;
  onView: (view: SectionView) => void;
  onChange: (patch: Partial<SurroundForm>) => void;
}

/** The one-line reason the free surface is φ = 0, shown wherever it is offered or drawn. */
export const FREE_SURFACE_NOTE =
  'The free surface is taken in its high-frequency limit (φ = 0, pressure release): valid well above the sloshing frequencies of the liquid.';

function Toggle({ id, label, checked, onChange, children }: { id: string; label: string; checked: boolean; onChange: (on: boolean) => void; children?: ComponentChildren }) {
  return (
    <div class="section-toggle">
      <label class="check" for={id}>
        <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange((e.target as HTMLInputElement).checked)} />
        <span>{label}</span>
      </label>
      {checked && <div class="field-grid section-fields">{children}</div>}
    </div>
  );
}

/** Walls, free surface and enclosure around the bodies; open water when none is chosen. */
export function SurroundingsEditor({ s, errors, clearances, formatLength, view, onView, onChange }: Props) {
  const w = SURROUND_WORDS[view];
  const err = (f: keyof SurroundForm | 'all') => errors[surroundKey(f)];
  const gap = (m: number | undefined) =>
    m === undefined ? undefined : m > 0 ? `Clear gap to the nearest body: ${formatLength(m)}.` : 'A body reaches or crosses it: only the part on the liquid side is wetted.';
  const len = (f: keyof SurroundForm, label: string, help?: string) => (
    <TextField id={`sec-s-${f}`} label={label} value={s[f] as string} unit="mm" error={err(f)} help={help} onInput={(t) => onChange({ [f]: t })} />
  );
  return (
    <fieldset class="section-surround">
      <legend>Surroundings</legend>
      <div class="field">
        <label for="sec-s-view">Section seen</label>
        <select id="sec-s-view" value={view} onChange={(e) => onView((e.target as HTMLSelectElement).value as SectionView)}>
          {SECTION_VIEWS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <p class="field-help">{w.seen}</p>
      </div>
      <p class="field-help">None ticked: open water, the liquid reaching far in every direction.</p>
      {err('all') && (
        <p class="field-error" role="alert">
          <span aria-hidden="true">✖ </span>
          {err('all')}
        </p>
      )}
      <Toggle id="sec-s-wallBelow" label={w.wallBelow} checked={s.wallBelow} onChange={(on) => onChange({ wallBelow: on })}>
        {len('wallBelowDistance', w.wallBelowDistance, gap(clearances.wallBelow))}
      </Toggle>
      <Toggle id="sec-s-wallBeside" label={w.wallBeside} checked={s.wallBeside} onChange={(on) => onChange({ wallBeside: on })}>
        <div class="field">
          <label for="sec-s-side">Side</label>
          <select id="sec-s-side" value={s.wallBesideSide} onChange={(e) => onChange({ wallBesideSide: (e.target as HTMLSelectElement).value as WallSide })}>
            <option value="right">Right (+x)</option>
            <option value="left">Left (−x)</option>
          </select>
        </div>
        {len('wallBesideDistance', w.wallBesideDistance, gap(clearances.wallBeside))}
      </Toggle>
      {/* A free surface is horizontal: in a plan view it is offered only to switch off one already set. */}
      {(view === 'elevation' || s.freeSurface) && (
        <Toggle id="sec-s-freeSurface" label={w.freeSurface} checked={s.freeSurface} onChange={(on) => onChange({ freeSurface: on })}>
          {len('freeSurfaceDistance', w.freeSurfaceDistance, gap(clearances.freeSurface))}
          <p class="field-help field-wide">{FREE_SURFACE_NOTE}</p>
        </Toggle>
      )}
      <div class={`field${err('enclosure') ? ' has-error' : ''}`}>
        <label for="sec-s-enclosure">Enclosure (pipe, caisson, tank)</label>
        <select
          id="sec-s-enclosure"
          value={s.enclosure}
          aria-describedby={err('enclosure') ? 'sec-s-enclosure-error' : undefined}
          aria-invalid={err('enclosure') ? true : undefined}
          onChange={(e) => onChange({ enclosure: (e.target as HTMLSelectElement).value as EnclosureShape })}
        >
          <option value="none">None</option>
          <option value="circle">Circular</option>
          <option value="rectangle">Rectangular</option>
        </select>
        {err('enclosure') && (
          <p class="field-error" id="sec-s-enclosure-error">
            <span aria-hidden="true">✖ </span>
            {err('enclosure')}
          </p>
        )}
      </div>
      {s.enclosure !== 'none' && (
        <div class="field-grid section-fields">
          {s.enclosure === 'circle' ? (
            len('enclosureDiameter', 'Inside diameter')
          ) : (
            <>
              {len('enclosureWidth', 'Inside width (x)')}
              {len('enclosureHeight', 'Inside height (y)')}
            </>
          )}
          {len('enclosureX', 'Centre x (offset)')}
          {len('enclosureY', 'Centre y (offset)')}
        </div>
      )}
    </fieldset>
  );
}
