/**
 * Checks a section input once at the public entry. Throws RangeError (bad values, bad geometry) or
 * TypeError (wrong kinds) with a message that names the body or boundary, the field, what was expected
 * and what was got. Geometry is checked on dense samples of the exact outlines (256 per turn for curves,
 * the vertices for polygons).
 */
import type { BodySpec, BoundarySpec, SectionInput, Vec2 } from './types';
import { bodyOutline, enclosureOutline } from './shapes';
import { sampleChain } from './pieces';
import { inputLines } from './model';
import { lineDistance, perpendicular, type Line } from './lines';
import { bbox, pointInPolygon, segmentsTouch, selfIntersection, signedArea, type Polygon } from './polygon';
import { checkingKit, mustBe } from '../check/kit';

/** Most bodies in one section (the dense solve grows as (K·N)³). */
export const MAX_BODIES = 24;
/** Most points of one polygon (the self-intersection check grows as n², and every edge takes panels). */
export const MAX_POLYGON_POINTS = 256;
/** Most boundaries (walls, free surfaces, one enclosure). */
export const MAX_BOUNDARIES = 16;
/** Largest nominal panels per body. */
export const MAX_PANELS_PER_BODY = 1024;

const fmt = (v: unknown): string => {
  if (typeof v === 'number') return String(v);
  if (Array.isArray(v)) return `[${v.map(fmt).join(', ')}]`;
  try {
    return JSON.stringify(v) ?? String(v);
  } catch {
    return String(v);
  }
};

// The core's checking kit: a value of the wrong kind is a TypeError, a number out of range a RangeError.
const KIT = checkingKit(fmt, (field, expected, gotText, value) =>
  typeof value === 'number' ? new RangeError(mustBe(field, expected, gotText)) : new TypeError(mustBe(field, expected, gotText)),
);

function number(where: string, v: unknown): void {
  if (typeof v !== 'number') KIT.fail(where, 'a number', v);
}

function positive(where: string, v: unknown): void {
  number(where, v);
  KIT.positive(where, v);
}

function finite(where: string, v: unknown): void {
  number(where, v);
  KIT.finite(where, v);
}

function vec(where: string, v: unknown): void {
  if (!Array.isArray(v) || v.length !== 2) throw new TypeError(`${where} must be a pair [x, y] of numbers, got ${fmt(v)}`);
  finite(`${where}[0]`, v[0]);
  finite(`${where}[1]`, v[1]);
}

function optionalVec(where: string, v: unknown): void {
  if (v !== undefined) vec(where, v);
}

function optionalFinite(where: string, v: unknown): void {
  if (v !== undefined) finite(where, v);
}

function polygonPoints(where: string, pts: unknown): void {
  if (!Array.isArray(pts) || pts.length < 3 || pts.length > MAX_POLYGON_POINTS) {
    throw new RangeError(`${where} must list from 3 to ${MAX_POLYGON_POINTS} points [x, y], got ${Array.isArray(pts) ? `${pts.length} points` : fmt(pts)}`);
  }
  pts.forEach((p, k) => vec(`${where}[${k}]`, p));
  const flat = new Float64Array(pts.length * 2);
  (pts as Vec2[]).forEach((p, k) => {
    flat[2 * k] = p[0];
    flat[2 * k + 1] = p[1];
  });
  const b = bbox(flat);
  const size = Math.max(b[2] - b[0], b[3] - b[1]);
  for (let k = 0; k < pts.length; k++) {
    const k1 = (k + 1) % pts.length;
    if (Math.hypot(flat[2 * k1] - flat[2 * k], flat[2 * k1 + 1] - flat[2 * k + 1]) <= 1e-12 * size) {
      throw new RangeError(`${where} has a zero-length edge: points ${k} and ${k1} coincide at ${fmt(pts[k])}`);
    }
  }
  const hit = selfIntersection(flat);
  if (hit) {
    const [i, j] = hit;
    const n = pts.length;
    throw new RangeError(`${where} is self-intersecting: edge ${i} (points ${i}–${(i + 1) % n}) crosses edge ${j} (points ${j}–${(j + 1) % n})`);
  }
  if (!(Math.abs(signedArea(flat)) > 1e-12 * size * size)) throw new RangeError(`${where} encloses no area`);
}

function checkBody(b: BodySpec, k: number): void {
  const w = `bodies[${k}]`;
  if (typeof b !== 'object' || b === null) throw new TypeError(`${w} must be an object, got ${fmt(b)}`);
  optionalVec(`${w}.centerM`, (b as { centerM?: unknown }).centerM);
  switch (b.shape) {
    case 'circle':
      positive(`${w}.diameterM`, b.diameterM);
      return;
    case 'ellipse':
      positive(`${w}.widthM`, b.widthM);
      positive(`${w}.heightM`, b.heightM);
      optionalFinite(`${w}.angleDeg`, b.angleDeg);
      return;
    case 'rectangle': {
      positive(`${w}.widthM`, b.widthM);
      positive(`${w}.heightM`, b.heightM);
      optionalFinite(`${w}.angleDeg`, b.angleDeg);
      if (b.cornerRadiusM !== undefined) {
        finite(`${w}.cornerRadiusM`, b.cornerRadiusM);
        const half = Math.min(b.widthM, b.heightM) / 2;
        if (b.cornerRadiusM < 0 || b.cornerRadiusM > half) {
          throw new RangeError(`${w}.cornerRadiusM must be from 0 to half the smaller side (${half}), got ${b.cornerRadiusM}`);
        }
      }
      return;
    }
    case 'plate':
      positive(`${w}.widthM`, b.widthM);
      positive(`${w}.thicknessM`, b.thicknessM);
      optionalFinite(`${w}.angleDeg`, b.angleDeg);
      return;
    case 'polygon':
      polygonPoints(`${w}.pointsM`, b.pointsM);
      optionalFinite(`${w}.angleDeg`, b.angleDeg);
      return;
    default:
      throw new TypeError(`${w}.shape must be one of circle, rectangle, ellipse, plate, polygon, got ${fmt((b as { shape?: unknown }).shape)}`);
  }
}

function checkBoundary(b: BoundarySpec, k: number): void {
  const w = `boundaries[${k}]`;
  if (typeof b !== 'object' || b === null) throw new TypeError(`${w} must be an object, got ${fmt(b)}`);
  switch (b.kind) {
    case 'wall':
    case 'free-surface': {
      vec(`${w}.pointM`, b.pointM);
      vec(`${w}.normal`, b.normal);
      if (!(Math.hypot(b.normal[0], b.normal[1]) > 0)) throw new RangeError(`${w}.normal must have non-zero length, got ${fmt(b.normal)}`);
      return;
    }
    case 'enclosure':
      switch (b.shape) {
        case 'circle':
          positive(`${w}.diameterM`, b.diameterM);
          optionalVec(`${w}.centerM`, b.centerM);
          return;
        case 'rectangle':
          positive(`${w}.widthM`, b.widthM);
          positive(`${w}.heightM`, b.heightM);
          optionalVec(`${w}.centerM`, b.centerM);
          optionalFinite(`${w}.angleDeg`, b.angleDeg);
          return;
        case 'polygon':
          polygonPoints(`${w}.pointsM`, b.pointsM);
          return;
        default:
          throw new TypeError(`${w}.shape must be one of circle, rectangle, polygon, got ${fmt((b as { shape?: unknown }).shape)}`);
      }
    default:
      throw new TypeError(`${w}.kind must be one of wall, free-surface, enclosure, got ${fmt((b as { kind?: unknown }).kind)}`);
  }
}

/** Index of an edge of `p` lying on one of the lines (both ends within tol), for contact exemptions. */
function edgeOnLine(p: Polygon, e: number, lines: readonly Line[], tol: number): boolean {
  const n = p.length / 2;
  const e1 = (e + 1) % n;
  return lines.some(
    (l) => Math.abs(lineDistance(l, p[2 * e], p[2 * e + 1])) <= tol && Math.abs(lineDistance(l, p[2 * e1], p[2 * e1 + 1])) <= tol,
  );
}

/** Edges of p lying on one of the lines, as flags (computed once per outline, not per pair of edges). */
function edgesOnLines(p: Polygon, lines: readonly Line[], tol: number): Uint8Array {
  const n = p.length / 2;
  const out = new Uint8Array(n);
  if (lines.length > 0) for (let e = 0; e < n; e++) out[e] = edgeOnLine(p, e, lines, tol) ? 1 : 0;
  return out;
}

/** Indices of the edges of p whose bounding box meets the box b widened by tol. */
function edgesNear(p: Polygon, b: readonly number[], tol: number): number[] {
  const n = p.length / 2;
  const out: number[] = [];
  for (let e = 0; e < n; e++) {
    const e1 = (e + 1) % n;
    const x0 = Math.min(p[2 * e], p[2 * e1]);
    const x1 = Math.max(p[2 * e], p[2 * e1]);
    const y0 = Math.min(p[2 * e + 1], p[2 * e1 + 1]);
    const y1 = Math.max(p[2 * e + 1], p[2 * e1 + 1]);
    if (x1 >= b[0] - tol && x0 <= b[2] + tol && y1 >= b[1] - tol && y0 <= b[3] + tol) out.push(e);
  }
  return out;
}

/**
 * True when outlines p and q cross or touch anywhere except along a common straight boundary. Only edges
 * inside the other outline's bounding box are compared (a pile in the middle of its caisson compares none).
 */
function outlinesTouch(p: Polygon, q: Polygon, lines: readonly Line[], tol: number): boolean {
  const n = p.length / 2;
  const m = q.length / 2;
  const bp = bbox(p);
  const bq = bbox(q);
  if (bp[2] < bq[0] - tol || bq[2] < bp[0] - tol || bp[3] < bq[1] - tol || bq[3] < bp[1] - tol) return false;
  const pe = edgesNear(p, bq, tol);
  const qe = edgesNear(q, bp, tol);
  if (pe.length === 0 || qe.length === 0) return false;
  const pOn = edgesOnLines(p, lines, tol);
  const qOn = edgesOnLines(q, lines, tol);
  for (const i of pe) {
    if (pOn[i]) continue;
    const i1 = (i + 1) % n;
    for (const j of qe) {
      if (qOn[j]) continue;
      const j1 = (j + 1) % m;
      if (segmentsTouch(p[2 * i], p[2 * i + 1], p[2 * i1], p[2 * i1 + 1], q[2 * j], q[2 * j + 1], q[2 * j1], q[2 * j1 + 1])) {
        // A touch exactly on a straight boundary (a body and the tank floor meeting on a wall line) is allowed.
        const x = [p[2 * i], p[2 * i1], q[2 * j], q[2 * j1]];
        const y = [p[2 * i + 1], p[2 * i1 + 1], q[2 * j + 1], q[2 * j1 + 1]];
        const onLine = lines.some((l) => x.some((xx, k) => Math.abs(lineDistance(l, xx, y[k])) <= tol) && !segmentsCross(p, i, q, j));
        if (!onLine) return true;
      }
    }
  }
  return false;
}

/** Proper crossing (interiors intersect transversally). */
function segmentsCross(p: Polygon, i: number, q: Polygon, j: number): boolean {
  const n = p.length / 2, m = q.length / 2;
  const i1 = (i + 1) % n, j1 = (j + 1) % m;
  const o = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) => (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
  const d1 = o(p[2 * i], p[2 * i + 1], p[2 * i1], p[2 * i1 + 1], q[2 * j], q[2 * j + 1]);
  const d2 = o(p[2 * i], p[2 * i + 1], p[2 * i1], p[2 * i1 + 1], q[2 * j1], q[2 * j1 + 1]);
  const d3 = o(q[2 * j], q[2 * j + 1], q[2 * j1], q[2 * j1 + 1], p[2 * i], p[2 * i + 1]);
  const d4 = o(q[2 * j], q[2 * j + 1], q[2 * j1], q[2 * j1 + 1], p[2 * i1], p[2 * i1 + 1]);
  return d1 * d2 < 0 && d3 * d4 < 0;
}

/** Nominal panels per body: an integer from 16 to MAX_PANELS_PER_BODY (absent = the default). */
export function checkPanelsPerBody(n: unknown): void {
  if (n !== undefined && !(typeof n === 'number' && Number.isInteger(n) && n >= 16 && n <= MAX_PANELS_PER_BODY)) {
    throw new RangeError(`panelsPerBody must be an integer from 16 to ${MAX_PANELS_PER_BODY}, got ${fmt(n)}`);
  }
}

/** Validates a section input; throws with a clear message on the first problem found. */
export function validateSectionInput(input: SectionInput): void {
  if (typeof input !== 'object' || input === null) throw new TypeError(`section input must be an object, got ${fmt(input)}`);
  positive('liquidDensityKgPerM3', input.liquidDensityKgPerM3);
  if (!Array.isArray(input.bodies) || input.bodies.length === 0) {
    throw new RangeError(`bodies must be a non-empty array, got ${Array.isArray(input.bodies) ? 'an empty array' : fmt(input.bodies)}`);
  }
  if (input.bodies.length > MAX_BODIES) throw new RangeError(`bodies may hold at most ${MAX_BODIES} bodies, got ${input.bodies.length}`);
  if (input.boundaries !== undefined && !Array.isArray(input.boundaries)) throw new TypeError(`boundaries must be an array, got ${fmt(input.boundaries)}`);
  if (input.boundaries !== undefined && input.boundaries.length > MAX_BOUNDARIES) {
    throw new RangeError(`boundaries may hold at most ${MAX_BOUNDARIES} boundaries, got ${input.boundaries.length}`);
  }
  checkPanelsPerBody(input.panelsPerBody);
  input.bodies.forEach(checkBody);
  const boundaries = input.boundaries ?? [];
  boundaries.forEach(checkBoundary);
  const encIdx = boundaries.flatMap((b, k) => (b.kind === 'enclosure' ? [k] : []));
  if (encIdx.length > 1) throw new RangeError(`at most one enclosure is allowed, got ${encIdx.length} (boundaries[${encIdx.join('], boundaries[')}])`);

  const lines = inputLines(input);
  if (encIdx.length === 0 && lines.length > 0) {
    if (lines.length > 2) {
      throw new RangeError(
        `without an enclosure at most two straight boundaries are supported (they are represented by images), got ${lines.length}; add an enclosure to close the region`,
      );
    }
    if (lines.length === 2 && !perpendicular(lines[0], lines[1])) {
      throw new RangeError(
        `boundaries[${lines[0].index}] and boundaries[${lines[1].index}] are not perpendicular: without an enclosure two straight boundaries must cross at right angles (parallel or oblique pairs need an infinite image series); add an enclosure to close the region`,
      );
    }
  }

  const polys = input.bodies.map((b) => sampleChain(bodyOutline(b).pieces, 256));
  let scale = 0;
  for (const p of polys) {
    const b = bbox(p);
    scale = Math.max(scale, b[2] - b[0], b[3] - b[1], Math.abs(b[0]), Math.abs(b[1]), Math.abs(b[2]), Math.abs(b[3]));
  }
  const tol = 1e-9 * scale;
  const wetted = (x: number, y: number) => {
    for (const l of lines) if (!(lineDistance(l, x, y) > tol)) return false;
    return true;
  };

  polys.forEach((p, k) => {
    for (const l of lines) {
      let any = false;
      for (let q = 0; q < p.length; q += 2) if (lineDistance(l, p[q], p[q + 1]) > tol) any = true;
      if (!any) throw new RangeError(`bodies[${k}] lies entirely on the dry side of boundaries[${l.index}] (its normal points into the liquid)`);
    }
    let wet = false;
    for (let q = 0; q < p.length; q += 2) if (wetted(p[q], p[q + 1])) wet = true;
    if (!wet) throw new RangeError(`bodies[${k}] has no part in the liquid (it lies on the dry side of the straight boundaries)`);
  });

  for (let a = 0; a < polys.length; a++) {
    for (let b = a + 1; b < polys.length; b++) {
      const pa = polys[a], pb = polys[b];
      const inside = pointInPolygon(pa, pb[0], pb[1]) || pointInPolygon(pb, pa[0], pa[1]);
      if (inside || outlinesTouch(pa, pb, [], tol)) throw new RangeError(`bodies[${a}] and bodies[${b}] overlap or touch; bodies must be apart`);
    }
  }

  if (encIdx.length === 1) {
    const k = encIdx[0];
    const enc = sampleChain(enclosureOutline(boundaries[k] as Extract<BoundarySpec, { kind: 'enclosure' }>).pieces, 512);
    for (const l of lines) {
      let any = false;
      for (let q = 0; q < enc.length; q += 2) if (lineDistance(l, enc[q], enc[q + 1]) > tol) any = true;
      if (!any) throw new RangeError(`the enclosure boundaries[${k}] lies entirely on the dry side of boundaries[${l.index}]`);
    }
    polys.forEach((p, b) => {
      if (outlinesTouch(p, enc, lines, tol)) {
        throw new RangeError(
          `bodies[${b}] touches or crosses the enclosure boundaries[${k}]; a body standing on the tank floor needs a wall boundary along the floor`,
        );
      }
      // The outlines neither cross nor touch, so without straight boundaries (whose edges may be shared) the
      // body lies wholly inside or wholly outside: one point decides. With them, every wetted point is checked.
      for (let q = 0; q < p.length; q += 2) {
        if (wetted(p[q], p[q + 1]) && !pointInPolygon(enc, p[q], p[q + 1])) {
          throw new RangeError(`bodies[${b}] lies (partly) outside the enclosure boundaries[${k}]`);
        }
        if (lines.length === 0) break;
      }
    });
  }
}
