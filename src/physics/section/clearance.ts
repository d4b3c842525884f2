/**
 * Clearance of each body: the narrowest liquid gap between it and anything else (other bodies, the
 * enclosure, walls and free surfaces). Panels longer than the gap cannot resolve the flow squeezed through
 * it, and the Richardson estimate is not yet reliable there (see solve.ts).
 */
import { lineDistance } from './lines';
import type { SectionModel } from './model';
import { pointSegmentDistance, type Polygon } from './polygon';

/** Edges per chunk of an outline; a chunk is skipped whole when its bounding box is farther than the best gap. */
const CHUNK = 16;

/** Smallest distance from the vertices of p to the outline q, at most `best` (chunked bounding boxes prune far edges). */
function polygonGap(p: Polygon, q: Polygon, best: number): number {
  const m = q.length / 2;
  const chunks = Math.ceil(m / CHUNK);
  const box = new Float64Array(4 * chunks);
  for (let c = 0; c < chunks; c++) {
    let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
    for (let e = c * CHUNK; e <= Math.min(m, (c + 1) * CHUNK); e++) {
      const k = e % m;
      x0 = Math.min(x0, q[2 * k]);
      x1 = Math.max(x1, q[2 * k]);
      y0 = Math.min(y0, q[2 * k + 1]);
      y1 = Math.max(y1, q[2 * k + 1]);
    }
    box.set([x0, y0, x1, y1], 4 * c);
  }
  let out = best;
  for (let i = 0; i < p.length; i += 2) {
    const x = p[i];
    const y = p[i + 1];
    for (let c = 0; c < chunks; c++) {
      const dx = Math.max(box[4 * c] - x, 0, x - box[4 * c + 2]);
      const dy = Math.max(box[4 * c + 1] - y, 0, y - box[4 * c + 3]);
      if (Math.hypot(dx, dy) >= out) continue;
      const end = Math.min(m, (c + 1) * CHUNK);
      for (let e = c * CHUNK; e < end; e++) {
        const k1 = (e + 1) % m;
        out = Math.min(out, pointSegmentDistance(x, y, q[2 * e], q[2 * e + 1], q[2 * k1], q[2 * k1 + 1]));
      }
    }
  }
  return out;
}

/** Per body, the narrowest gap to any other outline or straight boundary, m (Infinity when alone in open liquid). */
export function bodyClearances(model: SectionModel): number[] {
  const polys = model.bodyPolygons;
  return polys.map((p, k) => {
    let gap = Infinity;
    for (const l of model.lines) {
      // A body cut by the line meets it at a corner, not across a gap: only bodies wholly on the liquid side count.
      let near = Infinity;
      for (let i = 0; i < p.length; i += 2) near = Math.min(near, lineDistance(l, p[i], p[i + 1]));
      if (near >= 0) gap = Math.min(gap, near);
    }
    if (model.enclosurePolygon) gap = polygonGap(p, model.enclosurePolygon, gap);
    polys.forEach((q, j) => {
      if (j !== k) gap = polygonGap(p, q, gap);
    });
    return gap;
  });
}
