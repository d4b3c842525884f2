import type { EdgeSupport, PlateEdges } from '../../physics/plate';
import { formatHz } from '../format/numbers';
import { nodalSegments } from './nodal-lines';

export interface PlateShapeProps {
  /** Deflection on the grid, largest |w| = 1, layout `[iy·nx + ix]` (iy up from the bottom edge). */
  shape: Float64Array;
  nx: number;
  ny: number;
  widthM: number;
  heightM: number;
  edges: PlateEdges;
  /** "Dry mode 1", "Wet mode 2". */
  title: string;
  frequencyHz: number;
  /** Longer side of the drawing, px. */
  sizePx?: number;
}

const PAD = 6;

function edgeClass(e: EdgeSupport): string {
  return typeof e === 'string' ? `plate-edge plate-edge-${e}` : 'plate-edge plate-edge-simply-supported';
}

/**
 * One mode shape drawn on the plate, to scale: each grid cell shaded by the deflection at its centre (one
 * shade for one side, another for the other, darker where it moves more), the nodal lines where the plate
 * stays still (dashed, they separate the two shades), and the edges as held (thick: welded, dashed: bolted or
 * seated, none: free). The label says the frequency in words for screen readers.
 */
export function PlateShape({ shape, nx, ny, widthM, heightM, edges, title, frequencyHz, sizePx = 150 }: PlateShapeProps) {
  const scale = sizePx / Math.max(widthM, heightM);
  const w = widthM * scale;
  const h = heightM * scale;
  const dx = w / (nx - 1);
  const dy = h / (ny - 1);
  // Grid unit → px, with y up from the bottom edge.
  const X = (gx: number) => PAD + gx * dx;
  const Y = (gy: number) => PAD + h - gy * dy;
  const cells = [];
  for (let iy = 0; iy + 1 < ny; iy++) {
    for (let ix = 0; ix + 1 < nx; ix++) {
      const v = 0.25 * (shape[iy * nx + ix] + shape[iy * nx + ix + 1] + shape[(iy + 1) * nx + ix] + shape[(iy + 1) * nx + ix + 1]);
      const a = Math.min(1, Math.abs(v));
      if (a < 0.04) continue;
      cells.push(<rect key={`${ix}-${iy}`} x={X(ix)} y={Y(iy + 1)} width={dx + 0.3} height={dy + 0.3} class={v > 0 ? 'plate-up' : 'plate-down'} fill-opacity={(0.15 + 0.85 * a).toFixed(2)} />);
    }
  }
  const lines = nodalSegments(shape, nx, ny);
  const label = `${title}, ${formatHz(frequencyHz)}: ${lines.length > 0 ? 'nodal lines drawn where the plate stays still' : 'no nodal line inside the plate'}`;
  return (
    <figure class="plate-shape">
      <svg width={w + 2 * PAD} height={h + 2 * PAD} viewBox={`0 0 ${w + 2 * PAD} ${h + 2 * PAD}`} role="img" aria-label={label}>
        <rect x={PAD} y={PAD} width={w} height={h} class="plate-face" />
        {cells}
        {lines.map(([x0, y0, x1, y1], i) => (
          <line key={i} x1={X(x0)} y1={Y(y0)} x2={X(x1)} y2={Y(y1)} class="plate-nodal" />
        ))}
        <line x1={PAD} y1={PAD + h} x2={PAD + w} y2={PAD + h} class={edgeClass(edges.bottom)} />
        <line x1={PAD} y1={PAD} x2={PAD + w} y2={PAD} class={edgeClass(edges.top)} />
        <line x1={PAD} y1={PAD} x2={PAD} y2={PAD + h} class={edgeClass(edges.left)} />
        <line x1={PAD + w} y1={PAD} x2={PAD + w} y2={PAD + h} class={edgeClass(edges.right)} />
      </svg>
      <figcaption>
        {title}: <strong>{formatHz(frequencyHz)}</strong>
      </figcaption>
    </figure>
  );
}
