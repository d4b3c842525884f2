import type { EdgeSupport, PlateInput } from '../../physics/plate';
import { formatQuantity } from '../../units';

function edgeClass(e: EdgeSupport): string {
  return typeof e === 'string' ? `plate-edge plate-edge-${e}` : 'plate-edge plate-edge-simply-supported';
}

const PAD = 14;

/**
 * The plate as entered, to scale, seen from one face: its edges as held (thick: welded, dashed: bolted or
 * seated, none: free) and, across a tank, the liquid depth (level drawn above the top edge when it passes over).
 */
export function PlateSchematic({ plate, lengthUnit, widthPx = 280 }: { plate: PlateInput; lengthUnit: string; widthPx?: number }) {
  const liquid = plate.liquid;
  const depth = liquid?.setting === 'across-tank' ? liquid.depthM! : liquid ? plate.heightM : 0;
  const top = Math.max(plate.heightM, depth);
  const scale = Math.min((widthPx - 2 * PAD) / plate.widthM, (widthPx * 1.1) / top);
  const w = plate.widthM * scale;
  const h = plate.heightM * scale;
  const H = top * scale;
  const X0 = PAD;
  const Y0 = PAD + H; // bottom edge
  const e = plate.edges;
  const what = liquid ? (liquid.setting === 'across-tank' ? `liquid ${formatQuantity(depth, lengthUnit)} deep` : 'liquid over the whole panel') : 'no liquid';
  return (
    <figure class="panel schematic plate-schematic">
      <svg width={w + 2 * PAD} height={H + 2 * PAD} viewBox={`0 0 ${w + 2 * PAD} ${H + 2 * PAD}`} role="img" aria-label={`Plate panel ${formatQuantity(plate.widthM, lengthUnit)} wide and ${formatQuantity(plate.heightM, lengthUnit)} high, ${what}`}>
        {depth > 0 && <rect x={X0 - PAD / 2} y={Y0 - depth * scale} width={w + PAD} height={depth * scale} class="plate-liquid" />}
        <rect x={X0} y={Y0 - h} width={w} height={h} class="plate-steel" />
        {depth > 0 && <line x1={X0 - PAD / 2} y1={Y0 - depth * scale} x2={X0 + w + PAD / 2} y2={Y0 - depth * scale} class="plate-liquid-line" />}
        <line x1={X0} y1={Y0} x2={X0 + w} y2={Y0} class={edgeClass(e.bottom)} />
        <line x1={X0} y1={Y0 - h} x2={X0 + w} y2={Y0 - h} class={edgeClass(e.top)} />
        <line x1={X0} y1={Y0 - h} x2={X0} y2={Y0} class={edgeClass(e.left)} />
        <line x1={X0 + w} y1={Y0 - h} x2={X0 + w} y2={Y0} class={edgeClass(e.right)} />
      </svg>
      <figcaption>
        To scale, seen from one face: {formatQuantity(plate.widthM, lengthUnit)} wide, {formatQuantity(plate.heightM, lengthUnit)} high, {what}. Thick edge: welded;
        dashed: bolted or seated; no line: free.
      </figcaption>
    </figure>
  );
}
