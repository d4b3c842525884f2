import { legendNumber } from './colour-scale';
import type { MapDisplay } from './map-values';

interface Props {
  display: MapDisplay;
  quantity: 'speed' | 'potential';
}

/** The map's bands with their numbers, highest first, and what the numbers are relative to. */
export function MapLegend({ display, quantity }: Props) {
  const { scale } = display;
  const rows = scale.labels.map((label, i) => ({ label, colour: scale.colours[i] })).reverse();
  return (
    <div class="section-legend" role="group" aria-labelledby="sec-legend-title">
      <p class="section-legend-title" id="sec-legend-title">{display.title}</p>
      <ul>
        {rows.map((r) => (
          <li key={r.label}>
            <span class="swatch" style={{ background: r.colour }} aria-hidden="true" />
            {r.label}
          </li>
        ))}
      </ul>
      <p class="field-help">
        {display.basis}. Highest on the map: {legendNumber(display.max)}
        {quantity === 'speed' ? ' × the body speed' : ''}. Blank: no liquid.
      </p>
      {quantity === 'speed' && (
        <p class="field-help">At sharp corners and plate edges the speed in potential flow has no upper bound; the map shows the value at each cell's centre.</p>
      )}
    </div>
  );
}
