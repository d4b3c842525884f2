/**
 * Exact outlines of bodies and enclosures as chains of pieces (see pieces.ts).
 *
 * Bodies run counter-clockwise, so the right-hand normal of each panel points out of the body, into the
 * liquid. Enclosures run clockwise, so the right-hand normal points inwards, again into the liquid.
 * Corners of rectangles, plates and polygons are flagged for graded panels; smooth joins (circles,
 * ellipses, rounded corners) are not.
 */
import type { BodySpec, BoundarySpec, Vec2 } from './types';
import { arcPiece, linePiece, type Piece } from './pieces';
import { centroid, signedArea } from './polygon';

export interface Outline {
  /** Closed chain of pieces, counter-clockwise for bodies, clockwise for enclosures. */
  pieces: Piece[];
  /** Rotation reference point, m (bodies). */
  refX: number;
  refY: number;
}

const DEG = Math.PI / 180;

/** Turning angle (degrees) above which a polygon vertex is treated as a corner and graded. */
const CORNER_TURN_DEG = 10;

function rotateAbout(x: number, y: number, cx: number, cy: number, c: number, s: number): [number, number] {
  const dx = x - cx;
  const dy = y - cy;
  return [cx + c * dx - s * dy, cy + s * dx + c * dy];
}

/** Pieces of a closed polygon (flat, any winding) made counter-clockwise (ccw = true) or clockwise. */
export function polygonPieces(flat: Float64Array, ccw: boolean): Piece[] {
  const n = flat.length / 2;
  const isCcw = signedArea(flat) > 0;
  const idx = (k: number) => (isCcw === ccw ? k : n - 1 - k);
  const px = (k: number) => flat[2 * idx(((k % n) + n) % n)];
  const py = (k: number) => flat[2 * idx(((k % n) + n) % n) + 1];
  const corner: boolean[] = [];
  for (let k = 0; k < n; k++) {
    const ax = px(k) - px(k - 1), ay = py(k) - py(k - 1);
    const bx = px(k + 1) - px(k), by = py(k + 1) - py(k);
    const turn = Math.abs(Math.atan2(ax * by - ay * bx, ax * bx + ay * by));
    corner.push(turn > CORNER_TURN_DEG * DEG);
  }
  const pieces: Piece[] = [];
  for (let k = 0; k < n; k++) {
    pieces.push(linePiece(px(k), py(k), px(k + 1), py(k + 1), corner[k], corner[(k + 1) % n]));
  }
  return pieces;
}

/** Rectangle of width w (local x), height h (local y), corner radius r, centre c, rotation angle (rad). */
function rectanglePieces(w: number, h: number, r: number, c: Vec2, ang: number, ccw: boolean): Piece[] {
  const co = Math.cos(ang), si = Math.sin(ang);
  const hw = w / 2, hh = h / 2;
  if (!(r > 0)) {
    const local = [-hw, -hh, hw, -hh, hw, hh, -hw, hh];
    const flat = new Float64Array(8);
    for (let k = 0; k < 4; k++) {
      const [x, y] = rotateAbout(c[0] + local[2 * k], c[1] + local[2 * k + 1], c[0], c[1], co, si);
      flat[2 * k] = x;
      flat[2 * k + 1] = y;
    }
    return polygonPieces(flat, ccw);
  }
  // Counter-clockwise: bottom edge, bottom-right arc, right edge, top-right arc, top edge, ... Edges of
  // zero length (r equal to half a side) are left out; the arcs then meet tangentially.
  const pieces: Piece[] = [];
  const ix = hw - r, iy = hh - r;
  const P = (x: number, y: number) => rotateAbout(c[0] + x, c[1] + y, c[0], c[1], co, si);
  const corners: [number, number, number][] = [
    [ix, -iy, -Math.PI / 2],
    [ix, iy, 0],
    [-ix, iy, Math.PI / 2],
    [-ix, -iy, Math.PI],
  ];
  const edges: [number, number, number, number][] = [
    [-ix, -hh, ix, -hh],
    [hw, -iy, hw, iy],
    [ix, hh, -ix, hh],
    [-hw, iy, -hw, -iy],
  ];
  for (let k = 0; k < 4; k++) {
    const [x0, y0, x1, y1] = edges[k];
    if (Math.hypot(x1 - x0, y1 - y0) > 1e-12 * Math.max(w, h)) {
      const a = P(x0, y0), b = P(x1, y1);
      pieces.push(linePiece(a[0], a[1], b[0], b[1], false, false));
    }
    const [cx, cy, t0] = corners[k];
    const cc = P(cx, cy);
    pieces.push(arcPiece(cc[0], cc[1], r, r, ang, t0, t0 + Math.PI / 2));
  }
  return ccw ? pieces : reverseChain(pieces);
}

/** The same closed chain traversed the other way. */
export function reverseChain(pieces: Piece[]): Piece[] {
  return pieces
    .slice()
    .reverse()
    .map((p) => {
      if (p.kind === 'line') return linePiece(p.x1, p.y1, p.x0, p.y0, p.gradeEnd, p.gradeStart);
      const q = arcPiece(p.cx, p.cy, p.a, p.b, 0, p.t1, p.t0, p.gradeEnd, p.gradeStart);
      q.cos = p.cos;
      q.sin = p.sin;
      q.x0 = p.x1;
      q.y0 = p.y1;
      q.x1 = p.x0;
      q.y1 = p.y0;
      return q;
    });
}

function flatPoints(points: readonly Vec2[]): Float64Array {
  const flat = new Float64Array(points.length * 2);
  points.forEach((p, k) => {
    flat[2 * k] = p[0];
    flat[2 * k + 1] = p[1];
  });
  return flat;
}

/** Outline of a (validated) body, counter-clockwise. */
export function bodyOutline(b: BodySpec): Outline {
  const c: Vec2 = b.centerM ?? [0, 0];
  switch (b.shape) {
    case 'circle':
      return { pieces: [arcPiece(c[0], c[1], b.diameterM / 2, b.diameterM / 2, 0, 0, 2 * Math.PI)], refX: c[0], refY: c[1] };
    case 'ellipse':
      return {
        pieces: [arcPiece(c[0], c[1], b.widthM / 2, b.heightM / 2, (b.angleDeg ?? 0) * DEG, 0, 2 * Math.PI)],
        refX: c[0],
        refY: c[1],
      };
    case 'rectangle':
      return { pieces: rectanglePieces(b.widthM, b.heightM, b.cornerRadiusM ?? 0, c, (b.angleDeg ?? 0) * DEG, true), refX: c[0], refY: c[1] };
    case 'plate':
      return { pieces: rectanglePieces(b.widthM, b.thicknessM, 0, c, (b.angleDeg ?? 0) * DEG, true), refX: c[0], refY: c[1] };
    case 'polygon': {
      const flat = flatPoints(b.pointsM);
      const ref = b.centerM ?? centroid(flat);
      const ang = (b.angleDeg ?? 0) * DEG;
      if (ang !== 0) {
        const co = Math.cos(ang), si = Math.sin(ang);
        for (let k = 0; k < flat.length; k += 2) {
          const [x, y] = rotateAbout(flat[k], flat[k + 1], ref[0], ref[1], co, si);
          flat[k] = x;
          flat[k + 1] = y;
        }
      }
      return { pieces: polygonPieces(flat, true), refX: ref[0], refY: ref[1] };
    }
  }
}

/** Outline of an enclosure, clockwise (normals into the liquid). */
export function enclosureOutline(e: Extract<BoundarySpec, { kind: 'enclosure' }>): Outline {
  switch (e.shape) {
    case 'circle': {
      const c = e.centerM ?? [0, 0];
      return { pieces: [arcPiece(c[0], c[1], e.diameterM / 2, e.diameterM / 2, 0, 0, -2 * Math.PI)], refX: c[0], refY: c[1] };
    }
    case 'rectangle': {
      const c = e.centerM ?? [0, 0];
      return { pieces: rectanglePieces(e.widthM, e.heightM, 0, c, (e.angleDeg ?? 0) * DEG, false), refX: c[0], refY: c[1] };
    }
    case 'polygon': {
      const flat = flatPoints(e.pointsM);
      const [cx, cy] = centroid(flat);
      return { pieces: polygonPieces(flat, false), refX: cx, refY: cy };
    }
  }
}
