import type { SectionDof } from '../../physics/section';
import type { MapQuantity } from './map-values';

interface Props {
  bodies: number;
  body: number;
  motion: SectionDof;
  quantity: MapQuantity;
  onBody: (k: number) => void;
  onMotion: (m: SectionDof) => void;
  onQuantity: (q: MapQuantity) => void;
}

const MOTIONS: readonly [SectionDof, string][] = [
  ['x', 'Sway (x)'],
  ['y', 'Heave (y)'],
  ['rotation', 'Rotation'],
];

const QUANTITIES: readonly [MapQuantity, string][] = [
  ['speed', 'Speed'],
  ['potential', 'Potential'],
];

function Segmented<T extends string>({ label, items, value, onPick }: { label: string; items: readonly [T, string][]; value: T; onPick: (v: T) => void }) {
  return (
    <div class="section-control" role="group" aria-label={label}>
      <span class="section-control-label" aria-hidden="true">{label}</span>
      <div class="segmented">
        {items.map(([v, text]) => (
          <button key={v} type="button" class="btn" aria-pressed={v === value} onClick={() => onPick(v)}>
            {text}
          </button>
        ))}
      </div>
    </div>
  );
}

/** What the map shows: which body moves, how, and speed or potential. */
export function MapControls({ bodies, body, motion, quantity, onBody, onMotion, onQuantity }: Props) {
  return (
    <div class="section-controls">
      <Segmented label="Motion" items={MOTIONS} value={motion} onPick={onMotion} />
      {bodies > 1 && (
        <div class="section-control field">
          <label for="sec-map-body" class="section-control-label">Moving body</label>
          <select id="sec-map-body" value={String(body)} onChange={(e) => onBody(Number((e.target as HTMLSelectElement).value))}>
            {Array.from({ length: bodies }, (_, k) => (
              <option key={k} value={String(k)}>Body {k + 1}</option>
            ))}
          </select>
        </div>
      )}
      <Segmented label="Map of" items={QUANTITIES} value={quantity} onPick={onQuantity} />
    </div>
  );
}
