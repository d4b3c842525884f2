/**
 * The liquid region's boundary as open or closed chains ("spans") of exact pieces.
 *
 * Bodies and the enclosure are clipped by every straight boundary: only the parts on the liquid side
 * are wetted. Points where an outline crosses a line become corners of the liquid region and get graded
 * panels. Without an enclosure the lines are handled by images (lines.ts): a clipped body together with
 * its mirror images is a closed curve, so nothing is panelled along the lines. With an enclosure every
 * line is panelled explicitly along the intervals where it bounds the liquid: those intervals are found
 * from all clip points on the line, testing each sub-interval just off the line for being inside the
 * enclosure, outside every body and on the liquid side of the other lines.
 */
import type { Piece } from './pieces';
import { linePiece, pointAt, subPiece } from './pieces';
import type { Line } from './lines';
import { lineDistance } from './lines';
import type { Polygon } from './polygon';
import { pointInPolygon } from './polygon';

export type SpanRole = 'body' | 'enclosure' | 'line';

/** A chain of pieces on the boundary of the liquid, oriented so that right-hand normals point into the liquid. */
export interface Span {
  role: SpanRole;
  /** Body index, or boundary index for enclosure and lines. */
  owner: number;
  /** 'neumann': normal velocity given (bodies, walls); 'dirichlet': φ = 0 (free surface). */
  bc: 'neumann' | 'dirichlet';
  pieces: Piece[];
  closed: boolean;
}

/** Roots in (0, 1) of the signed distance to a line along a piece. */
function pieceRoots(p: Piece, l: Line, out: number[]): void {
  const pt = [0, 0];
  const d = (s: number) => {
    pointAt(p, s, pt);
    return lineDistance(l, pt[0], pt[1]);
  };
  if (p.kind === 'line') {
    const d0 = lineDistance(l, p.x0, p.y0);
    const d1 = lineDistance(l, p.x1, p.y1);
    if ((d0 < 0 && d1 > 0) || (d0 > 0 && d1 < 0)) out.push(d0 / (d0 - d1));
    return;
  }
  // Arcs: a sinusoid in the parameter has at most two roots per turn; 64 samples per piece find them,
  // bisection to round-off places them.
  const m = 64;
  let s0 = 0;
  let f0 = d(0);
  for (let k = 1; k <= m; k++) {
    const s1 = k / m;
    const f1 = d(s1);
    if ((f0 < 0 && f1 > 0) || (f0 > 0 && f1 < 0)) {
      let lo = s0, hi = s1, flo = f0;
      for (let it = 0; it < 60; it++) {
        const mid = 0.5 * (lo + hi);
        const fm = d(mid);
        if ((fm < 0) === (flo < 0)) {
          lo = mid;
          flo = fm;
        } else hi = mid;
      }
      out.push(0.5 * (lo + hi));
    }
    s0 = s1;
    f0 = f1;
  }
}

interface Kept {
  piece: Piece;
  /** Starts at the start of its source piece / ends at the end of it (so it joins its neighbours). */
  joinsPrev: boolean;
  joinsNext: boolean;
}

/**
 * Clips a closed chain by the liquid half-planes of all lines and returns its wetted spans.
 * `tol` (m) is the distance below which a point counts as on a line (and so not wetted).
 */
export function clipChain(pieces: readonly Piece[], lines: readonly Line[], tol: number): { spans: Piece[][]; closed: boolean } {
  if (lines.length === 0) return { spans: [pieces.slice()], closed: true };
  const kept: Kept[] = [];
  const pt = [0, 0];
  let clippedAny = false;
  for (const p of pieces) {
    const roots: number[] = [];
    for (const l of lines) pieceRoots(p, l, roots);
    roots.sort((a, b) => a - b);
    const cuts = [0, ...roots, 1];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const s0 = cuts[k], s1 = cuts[k + 1];
      if (!(s1 > s0)) continue;
      pointAt(p, 0.5 * (s0 + s1), pt);
      let wet = true;
      for (const l of lines) if (!(lineDistance(l, pt[0], pt[1]) > tol)) wet = false;
      if (!wet) {
        clippedAny = true;
        continue;
      }
      const startCut = k > 0;
      const endCut = k + 2 < cuts.length;
      kept.push({
        piece: subPiece(p, s0, s1, startCut ? true : p.gradeStart, endCut ? true : p.gradeEnd),
        joinsPrev: !startCut,
        joinsNext: !endCut,
      });
    }
  }
  if (!clippedAny) return { spans: [pieces.slice()], closed: true };
  // Chain the kept pieces: a new span starts wherever a piece does not join its predecessor.
  const n = kept.length;
  if (n === 0) return { spans: [], closed: false };
  // Rotate so that the first kept piece starts a span (one exists, since something was clipped).
  let start = 0;
  for (let k = 0; k < n; k++) {
    const prev = kept[(k - 1 + n) % n];
    const joined = kept[k].joinsPrev && prev.joinsNext && samePoint(prev.piece, kept[k].piece, tol);
    if (!joined) {
      start = k;
      break;
    }
  }
  const spans: Piece[][] = [];
  let cur: Piece[] = [];
  for (let q = 0; q < n; q++) {
    const k = (start + q) % n;
    const prev = kept[(k - 1 + n) % n];
    const joined = q > 0 && kept[k].joinsPrev && prev.joinsNext && samePoint(prev.piece, kept[k].piece, tol);
    if (!joined && cur.length > 0) {
      spans.push(cur);
      cur = [];
    }
    cur.push(kept[k].piece);
  }
  if (cur.length > 0) spans.push(cur);
  // A piece dropped because it lies on a line leaves its neighbours unjoined: grade those ends too.
  for (const s of spans) {
    s[0].gradeStart = true;
    s[s.length - 1].gradeEnd = true;
  }
  return { spans, closed: false };
}

function samePoint(a: Piece, b: Piece, tol: number): boolean {
  return Math.hypot(a.x1 - b.x0, a.y1 - b.y0) <= tol;
}

/**
 * Explicit panels along line `l` where it bounds the liquid (enclosure case). `ends` holds the clip
 * points already found on outlines; `enclosure` and `bodies` are closed sample polygons for the
 * inside/outside tests; `scale` sets the size of the off-line nudge.
 */
export function lineIntervals(
  l: Line,
  others: readonly Line[],
  ends: readonly [number, number][],
  enclosure: Polygon,
  bodies: readonly Polygon[],
  scale: number,
): Piece[] {
  // Direction along the line with the normal on its right: t = (−n_y, n_x).
  const tx = -l.ny, ty = l.nx;
  const tol = 1e-9 * scale;
  const taus: number[] = [];
  for (const [x, y] of ends) if (Math.abs(lineDistance(l, x, y)) <= tol) taus.push((x - l.px) * tx + (y - l.py) * ty);
  for (const o of others) {
    const den = o.nx * tx + o.ny * ty;
    if (Math.abs(den) > 1e-12) taus.push(-lineDistance(o, l.px, l.py) / den);
  }
  taus.sort((a, b) => a - b);
  const uniq: number[] = [];
  for (const t of taus) if (uniq.length === 0 || t - uniq[uniq.length - 1] > tol) uniq.push(t);
  const out: Piece[] = [];
  const nudge = 1e-6 * scale;
  for (let k = 0; k + 1 < uniq.length; k++) {
    const tm = 0.5 * (uniq[k] + uniq[k + 1]);
    const x = l.px + tm * tx + nudge * l.nx;
    const y = l.py + tm * ty + nudge * l.ny;
    if (!pointInPolygon(enclosure, x, y)) continue;
    if (others.some((o) => !(lineDistance(o, x, y) > 0))) continue;
    if (bodies.some((b) => pointInPolygon(b, x, y))) continue;
    out.push(
      linePiece(l.px + uniq[k] * tx, l.py + uniq[k] * ty, l.px + uniq[k + 1] * tx, l.py + uniq[k + 1] * ty, true, true),
    );
  }
  return out;
}
