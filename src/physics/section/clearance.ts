/**
 * Clearance of each body: the narrowest liquid gap between it and anything else (other bodies, the
 * enclosure, walls and free surfaces). Panels longer than the gap cannot resolve the flow squeezed through
 * it, and the Richardson estimate is not yet reliable there (see solve.ts).
 */
import { lineDistance } from './lines';
import type { SectionModel } from './model';
import { bbox, distanceToPolygon, type Polygon } from './polygon';

/** Smallest distance from the vertices of p to the outline q (q's bounding box first, to skip far pairs). */
function polygonGap(p: Polygon, q: Polygon, best: number): number {
  const b = bbox(q);
  let out = best;
  for (let i = 0; i < p.length; i += 2) {
    const x = p[i];
    const y = p[i + 1];
    const dx = Math.max(b[0] - x, 0, x - b[2]);
    const dy = Math.max(b[1] - y, 0, y - b[3]);
    if (Math.hypot(dx, dy) >= out) continue;
    out = Math.min(out, distanceToPolygon(q, x, y));
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
