/**
 * Small polygon utilities for validation, areas and masks.
 * A polygon is a flat Float64Array [x0, y0, x1, y1, ...], metres, closed implicitly (last joins first).
 */

/** Closed polygon, metres: [x0, y0, x1, y1, ...]. */
export type Polygon = Float64Array;

/** Signed area (positive when counter-clockwise), shoelace formula. */
export function signedArea(p: Polygon): number {
  const n = p.length / 2;
  let s = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) s += p[2 * j] * p[2 * i + 1] - p[2 * i] * p[2 * j + 1];
  return s / 2;
}

/** Area centroid of a simple polygon (classical shoelace moments). */
export function centroid(p: Polygon): [number, number] {
  const n = p.length / 2;
  let a = 0;
  let cx = 0;
  let cy = 0;
  // Moments about the first vertex reduce round-off for polygons far from the origin.
  const ox = p[0];
  const oy = p[1];
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xj = p[2 * j] - ox;
    const yj = p[2 * j + 1] - oy;
    const xi = p[2 * i] - ox;
    const yi = p[2 * i + 1] - oy;
    const c = xj * yi - xi * yj;
    a += c;
    cx += (xj + xi) * c;
    cy += (yj + yi) * c;
  }
  return [ox + cx / (3 * a), oy + cy / (3 * a)];
}

/** Even–odd point-in-polygon test (ray casting along +x). Points exactly on an edge may go either way. */
export function pointInPolygon(p: Polygon, x: number, y: number): boolean {
  const n = p.length / 2;
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = p[2 * i];
    const yi = p[2 * i + 1];
    const xj = p[2 * j];
    const yj = p[2 * j + 1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
}

/** True when closed segments AB and CD share at least one point (touching counts), within `tol` in area units. */
export function segmentsTouch(
  ax: number, ay: number, bx: number, by: number,
  cx: number, cy: number, dx: number, dy: number, tol = 0,
): boolean {
  const o1 = orient(ax, ay, bx, by, cx, cy);
  const o2 = orient(ax, ay, bx, by, dx, dy);
  const o3 = orient(cx, cy, dx, dy, ax, ay);
  const o4 = orient(cx, cy, dx, dy, bx, by);
  const s = (v: number) => (v > tol ? 1 : v < -tol ? -1 : 0);
  const s1 = s(o1), s2 = s(o2), s3 = s(o3), s4 = s(o4);
  if (s1 * s2 < 0 && s3 * s4 < 0) return true;
  const onSeg = (px: number, py: number, qx: number, qy: number, rx: number, ry: number) =>
    Math.min(px, qx) <= rx && rx <= Math.max(px, qx) && Math.min(py, qy) <= ry && ry <= Math.max(py, qy);
  if (s1 === 0 && onSeg(ax, ay, bx, by, cx, cy)) return true;
  if (s2 === 0 && onSeg(ax, ay, bx, by, dx, dy)) return true;
  if (s3 === 0 && onSeg(cx, cy, dx, dy, ax, ay)) return true;
  if (s4 === 0 && onSeg(cx, cy, dx, dy, bx, by)) return true;
  return false;
}

/** First pair of non-adjacent edges (i, j) that touch, or null for a simple polygon. O(n²), fine for inputs. */
export function selfIntersection(p: Polygon): [number, number] | null {
  const n = p.length / 2;
  for (let i = 0; i < n; i++) {
    const i1 = (i + 1) % n;
    for (let j = i + 1; j < n; j++) {
      const j1 = (j + 1) % n;
      if (j === i1 || j1 === i) continue; // adjacent edges share a vertex by construction
      if (segmentsTouch(p[2 * i], p[2 * i + 1], p[2 * i1], p[2 * i1 + 1], p[2 * j], p[2 * j + 1], p[2 * j1], p[2 * j1 + 1])) {
        return [i, j];
      }
    }
  }
  return null;
}

/** True when the outlines of two polygons cross or touch. */
export function polygonsTouch(p: Polygon, q: Polygon): boolean {
  const n = p.length / 2;
  const m = q.length / 2;
  // Bounding boxes first: most pairs are far apart.
  const bp = bbox(p);
  const bq = bbox(q);
  if (bp[2] < bq[0] || bq[2] < bp[0] || bp[3] < bq[1] || bq[3] < bp[1]) return false;
  for (let i = 0; i < n; i++) {
    const i1 = (i + 1) % n;
    for (let j = 0; j < m; j++) {
      const j1 = (j + 1) % m;
      if (segmentsTouch(p[2 * i], p[2 * i + 1], p[2 * i1], p[2 * i1 + 1], q[2 * j], q[2 * j + 1], q[2 * j1], q[2 * j1 + 1])) return true;
    }
  }
  return false;
}

/** [xmin, ymin, xmax, ymax]. */
export function bbox(p: Polygon): [number, number, number, number] {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (let i = 0; i < p.length; i += 2) {
    x0 = Math.min(x0, p[i]);
    x1 = Math.max(x1, p[i]);
    y0 = Math.min(y0, p[i + 1]);
    y1 = Math.max(y1, p[i + 1]);
  }
  return [x0, y0, x1, y1];
}

/**
 * Sutherland–Hodgman clip of a polygon by the half-plane (x − P)·n ≥ 0. The subject may be concave:
 * the result can then contain zero-width bridges along the line, which leave its area unchanged.
 */
export function clipByHalfPlane(p: Polygon, px: number, py: number, nx: number, ny: number): Polygon {
  const n = p.length / 2;
  // At most two points per edge (a kept start and a crossing), written into one typed array.
  const out = new Float64Array(4 * n);
  let m = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const xi = p[2 * i], yi = p[2 * i + 1], xj = p[2 * j], yj = p[2 * j + 1];
    const di = (xi - px) * nx + (yi - py) * ny;
    const dj = (xj - px) * nx + (yj - py) * ny;
    if (di >= 0) {
      out[m++] = xi;
      out[m++] = yi;
    }
    if ((di >= 0) !== (dj >= 0)) {
      const t = di / (di - dj);
      out[m++] = xi + t * (xj - xi);
      out[m++] = yi + t * (yj - yi);
    }
  }
  return out.slice(0, m);
}

/** Distance from a point to segment AB. */
export function pointSegmentDistance(x: number, y: number, ax: number, ay: number, bx: number, by: number): number {
  const ex = bx - ax, ey = by - ay;
  const l2 = ex * ex + ey * ey;
  let t = l2 > 0 ? ((x - ax) * ex + (y - ay) * ey) / l2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  return Math.hypot(x - ax - t * ex, y - ay - t * ey);
}

/** Smallest distance from a point to the outline of a polygon. */
export function distanceToPolygon(p: Polygon, x: number, y: number): number {
  const n = p.length / 2;
  let d = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    d = Math.min(d, pointSegmentDistance(x, y, p[2 * j], p[2 * j + 1], p[2 * i], p[2 * i + 1]));
  }
  return d;
}
