/**
 * Clearance of each body: the narrowest liquid gap between it and anything else (other bodies, the
 * enclosure, walls and free surfaces). Panels longer than the gap cannot resolve the flow squeezed through
 * it, and the Richardson estimate is not yet reliable there (see solve.ts).
 */
import { lineDistance } from './lines';
import type { SectionModel } from './model';
import { bbox, type Polygon } from './polygon';

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
  // Squared distances throughout (Math.hypot is slow in V8 and the comparisons need no square root).
  let out2 = best * best;
  for (let i = 0; i < p.length; i += 2) {
    const x = p[i];
    const y = p[i + 1];
    for (let c = 0; c < chunks; c++) {
      const dx = Math.max(box[4 * c] - x, 0, x - box[4 * c + 2]);
      const dy = Math.max(box[4 * c + 1] - y, 0, y - box[4 * c + 3]);
      if (dx * dx + dy * dy >= out2) continue;
      const end = Math.min(m, (c + 1) * CHUNK);
      for (let e = c * CHUNK; e < end; e++) {
        const k1 = (e + 1) % m;
        const ax = q[2 * e], ay = q[2 * e + 1];
        const ex = q[2 * k1] - ax, ey = q[2 * k1 + 1] - ay;
        const l2 = ex * ex + ey * ey;
        let t = l2 > 0 ? ((x - ax) * ex + (y - ay) * ey) / l2 : 0;
        t = t < 0 ? 0 : t > 1 ? 1 : t;
        const rx = x - ax - t * ex, ry = y - ay - t * ey;
        const d2 = rx * rx + ry * ry;
        if (d2 < out2) out2 = d2;
      }
    }
  }
  const out = Math.sqrt(out2);
  return out;
}

/** Per body, the narrowest gap to any other outline or straight boundary, m (Infinity when alone in open liquid). */
export function bodyClearances(model: SectionModel): number[] {
  const polys = model.bodyPolygons;
  const boxes = polys.map(bbox);
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
      // No vertex of p is nearer to q than their bounding boxes are to each other: skip pairs already beaten.
      const [a, b] = [boxes[k], boxes[j]];
      const dx = Math.max(a[0] - b[2], b[0] - a[2], 0);
      const dy = Math.max(a[1] - b[3], b[1] - a[3], 0);
      if (j !== k && dx * dx + dy * dy < gap * gap) gap = polygonGap(p, q, gap);
    });
    return gap;
  });
}
