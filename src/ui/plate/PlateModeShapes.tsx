import type { PlateInput, PlateResult } from '../../physics/plate';
import { PlateShape } from './PlateShape';

/** Dry and wet mode shapes drawn on the plate, with a legend; `max` modes of each (all by default). */
export function PlateModeShapes({ result, plate, max, sizePx }: { result: PlateResult; plate: PlateInput; max?: number; sizePx?: number }) {
  const { nx, ny } = result.grid;
  const group = (name: 'Dry' | 'Wet', set: PlateResult['dry']) => (
    <div class="plate-shapes-group">
      <h3>{name} modes</h3>
      <div class="plate-shapes" data-testid={`plate-shapes-${name.toLowerCase()}`}>
        {set.shapes.slice(0, max ?? set.shapes.length).map((s, i) => (
          <PlateShape key={i} shape={s} nx={nx} ny={ny} widthM={plate.widthM} heightM={plate.heightM} edges={plate.edges} title={`${name} mode ${i + 1}`} frequencyHz={set.frequenciesHz[i]} sizePx={sizePx} />
        ))}
      </div>
    </div>
  );
  return (
    <section class="results-block" aria-labelledby="plate-shapes-title">
      <h2 id="plate-shapes-title">Mode shapes on the plate</h2>
      <p class="plate-legend">
        Seen from one face, width across, height up. <span class="plate-swatch plate-up-swatch" style={{ background: '#1f6fb2' }} aria-hidden="true" />
        one way, <span class="plate-swatch" style={{ background: '#c8620c' }} aria-hidden="true" />the other, darker where it moves more; dashed lines: nodal lines
        (no motion); thick edge: welded, dashed edge: bolted or seated, no line: free.
      </p>
      {group('Dry', result.dry)}
      {result.wet && group('Wet', result.wet)}
    </section>
  );
}
