/**
 * Outline pieces: the exact geometry of body, enclosure and straight-boundary outlines before panelling.
 *
 * An outline is a chain of smooth pieces. A `line` runs from (x0, y0) to (x1, y1). An `arc` is part of
 * an ellipse (a circle when a = b): p(t) = c + Rot(cos, sin) · (a cos t, b sin t), t from t0 to t1
 * (t1 < t0 runs clockwise). Panel nodes are placed on the exact curve; `gradeStart` / `gradeEnd` ask
 * for panels graded towards that end, where the outline has a corner and the flow is singular.
 */
import { hypot2 } from '../linalg/hypot';

export interface Piece {
  kind: 'line' | 'arc';
  /** Start and end points, m (for arcs, computed from the parameters). */
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  /** Arc only: centre, semi-axes, rotation (cos, sin) and parameter range, rad. */
  cx: number;
  cy: number;
  a: number;
  b: number;
  cos: number;
  sin: number;
  t0: number;
  t1: number;
  gradeStart: boolean;
  gradeEnd: boolean;
}

export function linePiece(x0: number, y0: number, x1: number, y1: number, gradeStart: boolean, gradeEnd: boolean): Piece {
  return { kind: 'line', x0, y0, x1, y1, cx: 0, cy: 0, a: 0, b: 0, cos: 1, sin: 0, t0: 0, t1: 1, gradeStart, gradeEnd };
}

export function arcPiece(
  cx: number, cy: number, a: number, b: number, angleRad: number, t0: number, t1: number,
  gradeStart = false, gradeEnd = false,
): Piece {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const p: Piece = { kind: 'arc', x0: 0, y0: 0, x1: 0, y1: 0, cx, cy, a, b, cos: c, sin: s, t0, t1, gradeStart, gradeEnd };
  const out = [0, 0];
  pointAt(p, 0, out);
  p.x0 = out[0];
  p.y0 = out[1];
  pointAt(p, 1, out);
  p.x1 = out[0];
  p.y1 = out[1];
  return p;
}

/** Point at fraction s ∈ [0, 1] of the piece (in parameter, not arc length), written into out[0..1]. */
export function pointAt(p: Piece, s: number, out: number[] | Float64Array): void {
  if (p.kind === 'line') {
    out[0] = p.x0 + s * (p.x1 - p.x0);
    out[1] = p.y0 + s * (p.y1 - p.y0);
    return;
  }
  const t = p.t0 + s * (p.t1 - p.t0);
  const X = p.a * Math.cos(t);
  const Y = p.b * Math.sin(t);
  out[0] = p.cx + p.cos * X - p.sin * Y;
  out[1] = p.cy + p.sin * X + p.cos * Y;
}

/** The part of a piece between fractions s0 < s1, with the given grading flags. */
export function subPiece(p: Piece, s0: number, s1: number, gradeStart: boolean, gradeEnd: boolean): Piece {
  if (p.kind === 'line') {
    const o0 = [0, 0];
    const o1 = [0, 0];
    pointAt(p, s0, o0);
    pointAt(p, s1, o1);
    return linePiece(o0[0], o0[1], o1[0], o1[1], gradeStart, gradeEnd);
  }
  const dt = p.t1 - p.t0;
  const q = arcPiece(p.cx, p.cy, p.a, p.b, 0, p.t0 + s0 * dt, p.t0 + s1 * dt, gradeStart, gradeEnd);
  q.cos = p.cos;
  q.sin = p.sin;
  const out = [0, 0];
  pointAt(q, 0, out);
  q.x0 = out[0];
  q.y0 = out[1];
  pointAt(q, 1, out);
  q.x1 = out[0];
  q.y1 = out[1];
  return q;
}

/** Arc length of a piece (arcs by 64-chord sum, relative error ~1e-4: used only to share out panels). */
export function pieceLength(p: Piece): number {
  if (p.kind === 'line') return hypot2(p.x1 - p.x0, p.y1 - p.y0);
  const out = [0, 0];
  let len = 0;
  let px = p.x0;
  let py = p.y0;
  for (let k = 1; k <= 64; k++) {
    pointAt(p, k / 64, out);
    len += hypot2(out[0] - px, out[1] - py);
    px = out[0];
    py = out[1];
  }
  return len;
}

/** Number of samples `samplePiece` takes of a piece: one for a line (its start), arcs in proportion to their angle. */
function sampleCount(p: Piece, perTurn: number): number {
  return p.kind === 'line' ? 1 : Math.max(2, Math.ceil((perTurn * Math.abs(p.t1 - p.t0)) / (2 * Math.PI)));
}

/**
 * Samples of a piece for geometric tests: `sampleCount` points from s = 0 (inclusive) to s = 1 (exclusive),
 * written as [x, y] pairs into `out` from pair index `at`. Returns the pair index after the last.
 */
export function samplePiece(p: Piece, perTurn: number, out: Float64Array, at: number): number {
  const count = sampleCount(p, perTurn);
  const pt = [0, 0];
  for (let k = 0; k < count; k++) {
    pointAt(p, k / count, pt);
    out[2 * (at + k)] = pt[0];
    out[2 * (at + k) + 1] = pt[1];
  }
  return at + count;
}

/**
 * Closed polygon sampling a closed chain of pieces: flat [x0, y0, x1, y1, ...]. Written straight into one
 * typed array (the 4096-point samples of model.ts were most of a solve's short-lived garbage as growing arrays).
 */
export function sampleChain(pieces: readonly Piece[], perTurn: number): Float64Array {
  let total = 0;
  for (const p of pieces) total += sampleCount(p, perTurn);
  const out = new Float64Array(2 * total);
  let at = 0;
  for (const p of pieces) at = samplePiece(p, perTurn, out, at);
  return out;
}

/**
 * The samples of `sampleChain(pieces, perTurn)` that can be the farthest along the direction (dx, dy),
 * appended as x, y pairs to `out`: each line's start, each arc's two end samples and the samples next to
 * where dx·x + dy·y peaks on it. Along an arc that function is a sinusoid in the parameter,
 * P cos t + Q sin t + const, peaking at t = atan2(Q, P); the samples beside the peak (±2, for round-off in
 * locating it) are the largest there, so the largest over these candidates is the largest over all samples,
 * the same number, from a few points instead of thousands.
 */
export function extremeSamples(pieces: readonly Piece[], perTurn: number, dx: number, dy: number, out: number[]): void {
  const pt = [0, 0];
  const push = (p: Piece, k: number, count: number) => {
    pointAt(p, k / count, pt);
    out.push(pt[0], pt[1]);
  };
  for (const p of pieces) {
    const count = sampleCount(p, perTurn);
    push(p, 0, count);
    if (p.kind === 'line') continue;
    push(p, count - 1, count);
    const P = p.a * (dx * p.cos + dy * p.sin);
    const Q = p.b * (dy * p.cos - dx * p.sin);
    const peak = Math.atan2(Q, P);
    const span = p.t1 - p.t0;
    for (let m = -2; m <= 2; m++) {
      const s = (peak + 2 * Math.PI * m - p.t0) / span;
      if (!(s > -1 / count && s < 1 + 1 / count)) continue;
      const k = Math.round(s * count);
      for (let d = -2; d <= 2; d++) if (k + d >= 0 && k + d < count) push(p, k + d, count);
    }
  }
}

/** Gauss–Legendre nodes and weights on [0, 1], 8 points (exact for polynomials of degree ≤ 15). */
const GL_X = [0.0198550717512319, 0.1016667612931866, 0.2372337950418355, 0.4082826787521751, 0.5917173212478249, 0.7627662049581645, 0.8983332387068134, 0.9801449282487681];
const GL_W = [0.0506142681451881, 0.1111905172266872, 0.1568533229389436, 0.1813418916891810, 0.1813418916891810, 0.1568533229389436, 0.1111905172266872, 0.0506142681451881];

/**
 * ½ ∮ (x dy − y dx) along a chain of pieces: the signed area enclosed by a closed chain (Green's
 * theorem). Lines are exact; arcs use 8-point Gauss–Legendre on sub-arcs of at most π/8, which for the
 * degree-2 trigonometric integrand is exact to round-off.
 */
export function chainArea(pieces: readonly Piece[]): number {
  let s = 0;
  for (const p of pieces) {
    if (p.kind === 'line') {
      s += p.x0 * p.y1 - p.x1 * p.y0;
      continue;
    }
    const dt = p.t1 - p.t0;
    const m = Math.max(1, Math.ceil(Math.abs(dt) / (Math.PI / 8)));
    for (let k = 0; k < m; k++) {
      for (let g = 0; g < 8; g++) {
        const t = p.t0 + ((k + GL_X[g]) / m) * dt;
        const X = p.a * Math.cos(t), Y = p.b * Math.sin(t);
        const dX = -p.a * Math.sin(t), dY = p.b * Math.cos(t);
        const x = p.cx + p.cos * X - p.sin * Y;
        const y = p.cy + p.sin * X + p.cos * Y;
        const dx = p.cos * dX - p.sin * dY;
        const dy = p.sin * dX + p.cos * dY;
        s += GL_W[g] * (x * dy - y * dx) * (dt / m);
      }
    }
  }
  return s / 2;
}
