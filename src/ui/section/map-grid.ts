/**
 * The region the Section view draws and maps: a box around the bodies and their boundaries, split into
 * square cells whose centres are the flow map's grid points (FlowFieldGrid, points inclusive).
 *
 * Open water: the bodies' box widened by the largest body's size on each side (three body sizes across
 * for one body), where the disturbance has fallen to a few per cent of the body speed. An enclosure: its
 * whole outline with a small margin, unless it is very large against the bodies (then the open-water rule
 * applied with four body sizes). A straight boundary within reach is brought into view and the box is
 * trimmed just past it, leaving a thin strip of the dry side for its hatching.
 */
import type { FlowFieldGrid, SectionInput } from '../../physics/section';
import { bodiesBox, bodyOutline, boxOf, enclosureOf, enclosureOutline, straightBoundaries, type Box } from './geometry';

/** Cells across the longer side of the map (the brief asks for about 60–90). */
export const MAP_CELLS = 80;
/** Longest side over shortest side of the view, so a long row of bodies still leaves room above and below. */
export const MAX_ASPECT = 2.5;

export interface MapView {
  /** What is drawn, m: [xMin, yMin, xMax, yMax]. Cells tile it exactly. */
  box: Box;
  /** Cell centres: nx × ny points. */
  grid: FlowFieldGrid;
  /** Side of one square cell, m. */
  cell: number;
}

/** Largest extent of a single body, m. */
function largestBodySize(input: SectionInput): number {
  let s = 0;
  for (const b of input.bodies) {
    const [x0, y0, x1, y1] = boxOf(bodyOutline(b));
    s = Math.max(s, x1 - x0, y1 - y0);
  }
  return s;
}

function grow(b: Box, m: number): Box {
  return [b[0] - m, b[1] - m, b[2] + m, b[3] + m];
}

/** Widens the shorter side about the centre so that long / short ≤ MAX_ASPECT. */
function limitAspect(b: Box): Box {
  const w = b[2] - b[0], h = b[3] - b[1];
  if (w > MAX_ASPECT * h) {
    const d = (w / MAX_ASPECT - h) / 2;
    return [b[0], b[1] - d, b[2], b[3] + d];
  }
  if (h > MAX_ASPECT * w) {
    const d = (h / MAX_ASPECT - w) / 2;
    return [b[0] - d, b[1], b[2] + d, b[3]];
  }
  return b;
}

/** Brings an axis-aligned straight boundary into view (if within `reach` of the box) and trims its dry side. */
function fitLine(box: Box, nx: number, ny: number, px: number, py: number, reach: number, pad: number): Box {
  const b: Box = [...box];
  const n = Math.hypot(nx, ny);
  const ux = nx / n, uy = ny / n;
  const horizontal = Math.abs(uy) > 1 - 1e-9;
  if (!horizontal && !(Math.abs(ux) > 1 - 1e-9)) return b; // oblique: drawn where it crosses the box, no trimming
  const axis: 0 | 1 = horizontal ? 1 : 0;
  const c = axis === 1 ? py : px;
  const liquidUp = (axis === 1 ? uy : ux) > 0;
  if (liquidUp) {
    // Liquid on the + side: the line is the lower (left) edge of the liquid.
    if (c - b[axis] > -reach) b[axis] = Math.min(b[axis + 2] - pad, c - pad);
  } else if (b[axis + 2] - c > -reach) {
    b[axis + 2] = Math.max(b[axis] + pad, c + pad);
  }
  return b;
}

/** The drawn and mapped region of a (valid) section input, with `cells` cells across its longer side. */
export function mapView(input: SectionInput, cells = MAP_CELLS): MapView {
  const bodies = bodiesBox(input);
  const size = largestBodySize(input);
  let box = grow(bodies, size);
  const enclosure = enclosureOf(input);
  if (enclosure) {
    const e = boxOf(enclosureOutline(enclosure));
    const limit = grow(bodies, 4 * size);
    const m = 0.04 * Math.max(e[2] - e[0], e[3] - e[1]);
    box = [Math.max(e[0] - m, limit[0]), Math.max(e[1] - m, limit[1]), Math.min(e[2] + m, limit[2]), Math.min(e[3] + m, limit[3])];
  } else {
    box = limitAspect(box);
    const pad = 0.05 * Math.max(box[2] - box[0], box[3] - box[1]);
    for (const l of straightBoundaries(input)) box = fitLine(box, l.normal[0], l.normal[1], l.pointM[0], l.pointM[1], 2 * size, pad);
  }
  box = limitAspect(box);
  const w = box[2] - box[0], h = box[3] - box[1];
  const cell = Math.max(w, h) / cells;
  const nx = Math.max(2, Math.round(w / cell));
  const ny = Math.max(2, Math.round(h / cell));
  // Re-centre so that whole cells tile the box.
  const cx = (box[0] + box[2]) / 2, cy = (box[1] + box[3]) / 2;
  const tiled: Box = [cx - (nx * cell) / 2, cy - (ny * cell) / 2, cx + (nx * cell) / 2, cy + (ny * cell) / 2];
  return {
    box: tiled,
    cell,
    grid: { x0: tiled[0] + cell / 2, y0: tiled[1] + cell / 2, x1: tiled[2] - cell / 2, y1: tiled[3] - cell / 2, nx, ny },
  };
}
