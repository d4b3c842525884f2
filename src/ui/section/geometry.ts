/**
 * Geometry of a section input for drawing and for the map's extent: outlines sampled as polygons, boxes,
 * reference points and the farthest point of a body from its reference point. Metres, y up, the same
 * conventions as the solver's input (src/physics/section/types.ts): `widthM` along x and `heightM` along y
 * before a counter-clockwise rotation by `angleDeg` about `centerM`; a polygon turns about its reference
 * point (centerM, else its area centroid).
 */
import type { BodySpec, BoundarySpec, SectionInput, Vec2 } from '../../physics/section';

/** Flat outline [x0, y0, x1, y1, …], metres, closed (last joins first). */
export type Outline = number[];

/** Axis-aligned box: [xMin, yMin, xMax, yMax], metres. */
export type Box = [number, number, number, number];

export type Enclosure = Extract<BoundarySpec, { kind: 'enclosure' }>;
export type StraightBoundary = Extract<BoundarySpec, { kind: 'wall' | 'free-surface' }>;

const DEG = Math.PI / 180;

function rotated(points: Outline, cx: number, cy: number, angleDeg: number): Outline {
  if (!angleDeg) return points;
  const c = Math.cos(angleDeg * DEG), s = Math.sin(angleDeg * DEG);
  const out: Outline = [];
  for (let k = 0; k < points.length; k += 2) {
    const dx = points[k] - cx, dy = points[k + 1] - cy;
    out.push(cx + c * dx - s * dy, cy + s * dx + c * dy);
  }
  return out;
}

function ellipsePoints(cx: number, cy: number, a: number, b: number, samples: number): Outline {
  const out: Outline = [];
  for (let k = 0; k < samples; k++) {
    const t = (2 * Math.PI * k) / samples;
    out.push(cx + a * Math.cos(t), cy + b * Math.sin(t));
  }
  return out;
}

/** Rectangle w × h centred at (cx, cy) with corner radius r (0 = sharp), counter-clockwise. */
function rectanglePoints(cx: number, cy: number, w: number, h: number, r: number, arcSamples = 8): Outline {
  const hw = w / 2, hh = h / 2;
  if (!(r > 0)) return [cx - hw, cy - hh, cx + hw, cy - hh, cx + hw, cy + hh, cx - hw, cy + hh];
  const rr = Math.min(r, hw, hh);
  const corners: [number, number, number][] = [
    [hw - rr, -hh + rr, -Math.PI / 2],
    [hw - rr, hh - rr, 0],
    [-hw + rr, hh - rr, Math.PI / 2],
    [-hw + rr, -hh + rr, Math.PI],
  ];
  const out: Outline = [];
  for (const [ox, oy, t0] of corners) {
    for (let k = 0; k <= arcSamples; k++) {
      const t = t0 + (Math.PI / 2) * (k / arcSamples);
      out.push(cx + ox + rr * Math.cos(t), cy + oy + rr * Math.sin(t));
    }
  }
  return out;
}

/** Area centroid of a closed polygon (shoelace formula, classical). */
export function polygonCentroid(pts: readonly Vec2[]): Vec2 {
  let a = 0, cx = 0, cy = 0;
  for (let k = 0; k < pts.length; k++) {
    const [x0, y0] = pts[k];
    const [x1, y1] = pts[(k + 1) % pts.length];
    const cross = x0 * y1 - x1 * y0;
    a += cross;
    cx += (x0 + x1) * cross;
    cy += (y0 + y1) * cross;
  }
  return a === 0 ? pts[0] : [cx / (3 * a), cy / (3 * a)];
}

/** The rotation reference point of a body: centerM, or the area centroid of a polygon without one. */
export function bodyReference(b: BodySpec): Vec2 {
  if (b.centerM) return b.centerM;
  return b.shape === 'polygon' ? polygonCentroid(b.pointsM) : [0, 0];
}

/** A body's outline as a polygon (curves sampled with `samples` points per turn). */
export function bodyOutline(b: BodySpec, samples = 96): Outline {
  const [cx, cy] = b.centerM ?? [0, 0];
  switch (b.shape) {
    case 'circle':
      return ellipsePoints(cx, cy, b.diameterM / 2, b.diameterM / 2, samples);
    case 'ellipse':
      return rotated(ellipsePoints(cx, cy, b.widthM / 2, b.heightM / 2, samples), cx, cy, b.angleDeg ?? 0);
    case 'rectangle':
      return rotated(rectanglePoints(cx, cy, b.widthM, b.heightM, b.cornerRadiusM ?? 0), cx, cy, b.angleDeg ?? 0);
    case 'plate':
      return rotated(rectanglePoints(cx, cy, b.widthM, b.thicknessM, 0), cx, cy, b.angleDeg ?? 0);
    case 'polygon': {
      const [rx, ry] = bodyReference(b);
      return rotated(b.pointsM.flatMap((p) => [p[0], p[1]]), rx, ry, b.angleDeg ?? 0);
    }
  }
}

export function enclosureOutline(e: Enclosure, samples = 128): Outline {
  switch (e.shape) {
    case 'circle': {
      const [cx, cy] = e.centerM ?? [0, 0];
      return ellipsePoints(cx, cy, e.diameterM / 2, e.diameterM / 2, samples);
    }
    case 'rectangle': {
      const [cx, cy] = e.centerM ?? [0, 0];
      return rotated(rectanglePoints(cx, cy, e.widthM, e.heightM, 0), cx, cy, e.angleDeg ?? 0);
    }
    case 'polygon':
      return e.pointsM.flatMap((p) => [p[0], p[1]]);
  }
}

export function boxOf(points: Outline): Box {
  const box: Box = [Infinity, Infinity, -Infinity, -Infinity];
  for (let k = 0; k < points.length; k += 2) {
    box[0] = Math.min(box[0], points[k]);
    box[1] = Math.min(box[1], points[k + 1]);
    box[2] = Math.max(box[2], points[k]);
    box[3] = Math.max(box[3], points[k + 1]);
  }
  return box;
}

export function unionBox(a: Box, b: Box): Box {
  return [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.max(a[2], b[2]), Math.max(a[3], b[3])];
}

/** Box around all bodies. */
export function bodiesBox(input: SectionInput): Box {
  return input.bodies.map((b) => boxOf(bodyOutline(b))).reduce(unionBox);
}

/** Farthest distance of a body's outline from its reference point, m (its edge speed per unit rotation). */
export function farthestRadius(b: BodySpec): number {
  const [rx, ry] = bodyReference(b);
  const pts = bodyOutline(b, 256);
  let r = 0;
  for (let k = 0; k < pts.length; k += 2) r = Math.max(r, Math.hypot(pts[k] - rx, pts[k + 1] - ry));
  return r;
}

export function enclosureOf(input: SectionInput): Enclosure | null {
  return (input.boundaries ?? []).find((b): b is Enclosure => b.kind === 'enclosure') ?? null;
}

export function straightBoundaries(input: SectionInput): StraightBoundary[] {
  return (input.boundaries ?? []).filter((b): b is StraightBoundary => b.kind !== 'enclosure');
}

/** Signed distance of a point from a straight boundary, positive on the liquid side. */
export function lineDistance(l: StraightBoundary, x: number, y: number): number {
  const n = Math.hypot(l.normal[0], l.normal[1]);
  return ((x - l.pointM[0]) * l.normal[0] + (y - l.pointM[1]) * l.normal[1]) / n;
}

/** The part of a straight boundary inside a box, as a segment [x0, y0, x1, y1]; null if it misses the box. */
export function lineInBox(l: StraightBoundary, box: Box): [number, number, number, number] | null {
  const n = Math.hypot(l.normal[0], l.normal[1]);
  const tx = -l.normal[1] / n, ty = l.normal[0] / n;
  const [px, py] = l.pointM;
  let t0 = -Infinity, t1 = Infinity;
  // Liang–Barsky clipping of the infinite line p + t·d to the box (classical).
  for (const [d, lo, hi, p] of [
    [tx, box[0], box[2], px],
    [ty, box[1], box[3], py],
  ] as const) {
    if (Math.abs(d) < 1e-15) {
      if (p < lo || p > hi) return null;
      continue;
    }
    const a = (lo - p) / d, b = (hi - p) / d;
    t0 = Math.max(t0, Math.min(a, b));
    t1 = Math.min(t1, Math.max(a, b));
  }
  if (!(t1 > t0)) return null;
  return [px + t0 * tx, py + t0 * ty, px + t1 * tx, py + t1 * ty];
}

/** Least signed distance of the bodies from a straight boundary, m: the clear gap, negative when a body crosses it. */
export function clearance(input: SectionInput, l: StraightBoundary): number {
  let d = Infinity;
  for (const b of input.bodies) {
    const pts = bodyOutline(b, 256);
    for (let k = 0; k < pts.length; k += 2) d = Math.min(d, lineDistance(l, pts[k], pts[k + 1]));
  }
  return d;
}

/** The dry side of a straight boundary within a box, as a polygon (empty if the box is all liquid). */
export function dryPart(l: StraightBoundary, box: Box): Outline {
  const corners: [number, number][] = [
    [box[0], box[1]],
    [box[2], box[1]],
    [box[2], box[3]],
    [box[0], box[3]],
  ];
  // Sutherland–Hodgman clipping of the box to the half-plane lineDistance ≤ 0 (classical).
  const out: Outline = [];
  for (let k = 0; k < 4; k++) {
    const [ax, ay] = corners[k];
    const [bx, by] = corners[(k + 1) % 4];
    const da = lineDistance(l, ax, ay), db = lineDistance(l, bx, by);
    if (da <= 0) out.push(ax, ay);
    if ((da < 0 && db > 0) || (da > 0 && db < 0)) {
      const t = da / (da - db);
      out.push(ax + t * (bx - ax), ay + t * (by - ay));
    }
  }
  return out;
}
