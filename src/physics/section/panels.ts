/**
 * Flat straight panels with nodes on the exact outline (chords of curved pieces).
 *
 * Panel counts are planned per span at the coarsest level (N/4 per body) and multiplied by 1, 2 and 4
 * for the three resolutions. Node positions depend only on k/n through a fixed map per piece, so each
 * coarser mesh is exactly every other node of the finer one (nested meshes keep the Richardson
 * estimate clean).
 *
 * Grading towards corners: Kress-type sigmoidal map s = G(u), G(u) = uᵝ / (uᵝ + (1−u)ᵝ) (R. Kress,
 * "A Nyström method for boundary integral equations in domains with corners", Numer. Math. 58 (1990)
 * 145). Near a corner the potential behaves like r^λ (λ = 2/3 at a right-angled body corner, 1/2 at a
 * plate edge). β = 2 was measured best for constant panels: the square converges at order 1.9 (β = 3
 * also reaches order 2 but with larger errors; uniform panels give order 1.25). Corners next to a much
 * shorter piece (the edge of a thin plate) get an extra edge zone of nodes on the short piece's scale
 * (see `PieceGrading`).
 */
import type { Piece } from './pieces';
import { pieceLength, pointAt } from './pieces';
import type { Span } from './domain';
import { hypot2 } from '../linalg/hypot';

export const GRADING_BETA = 2;

/**
 * Panel set. Layout: panel j runs from node `pa[j]` to node `pb[j]`; its unit tangent (tx, ty) points
 * from a to b and its unit normal (nx, ny) = (ty, −tx) points into the liquid; (mx, my) is the
 * midpoint (collocation point), `len` the length. `bc[j]` is 0 for Neumann, 1 for Dirichlet (φ = 0).
 * `owner[j]` is the body index, or −1 for enclosure and line panels.
 */
export interface PanelSet {
  count: number;
  nodeCount: number;
  nodeX: Float64Array;
  nodeY: Float64Array;
  pa: Int32Array;
  pb: Int32Array;
  mx: Float64Array;
  my: Float64Array;
  tx: Float64Array;
  ty: Float64Array;
  nx: Float64Array;
  ny: Float64Array;
  len: Float64Array;
  bc: Uint8Array;
  owner: Int32Array;
}

/** Inverse of the sigmoid G(u) = uᵝ / (uᵝ + (1−u)ᵝ): u = 1 / (1 + ((1−y)/y)^(1/β)). */
function sigmoidInverse(y: number, beta: number): number {
  if (y <= 0) return 0;
  if (y >= 1) return 1;
  return 1 / (1 + Math.pow((1 - y) / y, 1 / beta));
}

/**
 * How nodes are spread along one piece. The node at fraction u = k/n of the piece's panels sits where
 * the cumulative node density U(f) equals u (f = fraction of the piece's parameter). U mixes:
 *  - a main part: sigmoid-graded towards corner ends (or uniform), weight 1 − zone weights;
 *  - edge zones at corners next to a much shorter piece (the edge of a thin plate): a fraction
 *    `ZONE_WEIGHT` of the nodes graded within `zone` (fraction of the piece) of that end, so the corner
 *    is resolved on the scale of the short piece (the plate thickness) without refining the whole face.
 */
export interface PieceGrading {
  g0: boolean;
  g1: boolean;
  /** Edge-zone length as a fraction of the piece at its start / end (0 = none). */
  zone0: number;
  zone1: number;
}

export const ZONE_WEIGHT = 0.15;

function cumulative(f: number, g: PieceGrading, beta: number): number {
  const w0 = g.zone0 > 0 ? ZONE_WEIGHT : 0;
  const w1 = g.zone1 > 0 ? ZONE_WEIGHT : 0;
  const wm = 1 - w0 - w1;
  let main: number;
  if (g.g0 && g.g1) main = sigmoidInverse(f, beta);
  else if (g.g0) main = 2 * sigmoidInverse(0.5 * f, beta);
  else if (g.g1) main = 2 * sigmoidInverse(0.5 + 0.5 * f, beta) - 1;
  else main = f;
  let u = wm * main;
  if (w0 > 0) u += w0 * (f >= g.zone0 ? 1 : 2 * sigmoidInverse((0.5 * f) / g.zone0, beta));
  if (w1 > 0) u += w1 * (1 - f >= g.zone1 ? 0 : 1 - 2 * sigmoidInverse((0.5 * (1 - f)) / g.zone1, beta));
  return u;
}

/** Parameter fraction of the node at u ∈ [0, 1] (inverse of the cumulative density, by bisection). */
export function gradedFraction(u: number, g: PieceGrading, beta = GRADING_BETA): number {
  if (u <= 0) return 0;
  if (u >= 1) return 1;
  if (!g.g0 && !g.g1 && g.zone0 === 0 && g.zone1 === 0) return u;
  let lo = 0;
  let hi = 1;
  for (let it = 0; it < 60; it++) {
    const mid = 0.5 * (lo + hi);
    if (cumulative(mid, g, beta) < u) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Shares `total` panels among items of the given lengths: each gets its minimum, the rest by
 * length (largest-remainder rounding). The result sums to max(total, Σ mins).
 */
export function shareByLength(lens: readonly number[], mins: readonly number[], total: number): number[] {
  const counts = mins.slice();
  let left = total - counts.reduce((a, b) => a + b, 0);
  const sum = lens.reduce((a, b) => a + b, 0);
  if (left > 0 && sum > 0) {
    const extra = lens.map((l, k) => Math.max(0, (l / sum) * total - mins[k]));
    const es = extra.reduce((a, b) => a + b, 0);
    const exact = es > 0 ? extra.map((e) => (e / es) * left) : lens.map((l) => (l / sum) * left);
    const fl = exact.map(Math.floor);
    fl.forEach((f, k) => (counts[k] += f));
    left -= fl.reduce((a, b) => a + b, 0);
    const order = exact.map((e, k) => [e - fl[k], k]).sort((a, b) => b[0] - a[0]);
    for (let q = 0; q < left; q++) counts[order[q % order.length][1]]++;
  }
  return counts;
}

/**
 * Coarse panel counts for the pieces of a span: `total` shared by length with a minimum per piece
 * (2 for a piece graded at both ends, so that the grading means something; 1 otherwise).
 */
export function sharePanels(pieces: readonly Piece[], total: number): number[] {
  return shareByLength(
    pieces.map(pieceLength),
    pieces.map((p) => (p.gradeStart && p.gradeEnd ? 2 : 1)),
    total,
  );
}

export interface SpanPanels {
  span: Span;
  /** Coarse panel count per piece; the fine mesh uses twice as many. */
  coarseCounts: number[];
  /** Node spreading per piece. */
  gradings: PieceGrading[];
  /**
   * Per piece, the graded fractions already found (by node position u = k/n on the piece): the levels are
   * nested, so a coarser level's nodes (u = q/n = 2q/2n exactly) are all found at the finer one, and each
   * costs a 60-step bisection.
   */
  fractions: Map<number, number>[];
}

/** A corner zone is added where the neighbouring piece is shorter than this fraction of the piece. */
const ZONE_RATIO = 0.25;
/** Zone length in units of the shorter neighbour's length. */
const ZONE_SCALE = 2;

/**
 * Plans the panels of a span: shares `total` coarse panels among its pieces by length, adds edge zones
 * at corners next to much shorter pieces and gives those short pieces as many panels as a zone.
 */
export function planSpan(span: Span, total: number): SpanPanels {
  const pieces = span.pieces;
  const m = pieces.length;
  const lens = pieces.map(pieceLength);
  const counts = sharePanels(pieces, total);
  const gradings: PieceGrading[] = pieces.map((p) => ({ g0: p.gradeStart, g1: p.gradeEnd, zone0: 0, zone1: 0 }));
  const neighbour = (k: number, d: -1 | 1): number => {
    const q = k + d;
    if (q >= 0 && q < m) return q;
    return span.closed ? (q + m) % m : -1;
  };
  for (let k = 0; k < m; k++) {
    const g = gradings[k];
    const prev = neighbour(k, -1);
    const next = neighbour(k, 1);
    if (g.g0 && prev >= 0 && prev !== k && lens[prev] < ZONE_RATIO * lens[k]) g.zone0 = (ZONE_SCALE * lens[prev]) / lens[k];
    if (g.g1 && next >= 0 && next !== k && lens[next] < ZONE_RATIO * lens[k]) g.zone1 = (ZONE_SCALE * lens[next]) / lens[k];
  }
  const base = counts.slice();
  for (let k = 0; k < m; k++) {
    const g = gradings[k];
    const zw = (g.zone0 > 0 ? ZONE_WEIGHT : 0) + (g.zone1 > 0 ? ZONE_WEIGHT : 0);
    if (zw === 0) continue;
    // Keep the main part's density: the zones come on top of the piece's share.
    counts[k] = Math.round(base[k] / (1 - zw));
    const zoneCount = Math.ceil((ZONE_WEIGHT * base[k]) / (1 - zw));
    if (g.zone0 > 0) counts[neighbour(k, -1)] = Math.max(counts[neighbour(k, -1)], zoneCount);
    if (g.zone1 > 0) counts[neighbour(k, 1)] = Math.max(counts[neighbour(k, 1)], zoneCount);
  }
  return { span, coarseCounts: counts, gradings, fractions: pieces.map(() => new Map<number, number>()) };
}

/** Builds the panel set at level `factor` (1 = coarse, 2 = fine) from spans with their coarse counts. */
export function buildPanels(spans: readonly SpanPanels[], factor: number): PanelSet {
  let count = 0;
  let nodeCount = 0;
  for (const s of spans) {
    const n = s.coarseCounts.reduce((a, b) => a + b, 0) * factor;
    count += n;
    nodeCount += s.span.closed ? n : n + 1;
  }
  const P: PanelSet = {
    count,
    nodeCount,
    nodeX: new Float64Array(nodeCount),
    nodeY: new Float64Array(nodeCount),
    pa: new Int32Array(count),
    pb: new Int32Array(count),
    mx: new Float64Array(count),
    my: new Float64Array(count),
    tx: new Float64Array(count),
    ty: new Float64Array(count),
    nx: new Float64Array(count),
    ny: new Float64Array(count),
    len: new Float64Array(count),
    bc: new Uint8Array(count),
    owner: new Int32Array(count),
  };
  let node = 0;
  let panel = 0;
  const pt = [0, 0];
  for (const s of spans) {
    const first = node;
    s.span.pieces.forEach((piece, k) => {
      const n = s.coarseCounts[k] * factor;
      // Nodes from the start of the piece; its end is the next piece's start (or the span's last node).
      const known = s.fractions[k];
      const g = s.gradings[k];
      for (let q = 0; q < n; q++) {
        const u = q / n;
        let f = known.get(u);
        if (f === undefined) {
          f = gradedFraction(u, g);
          known.set(u, f);
        }
        pointAt(piece, f, pt);
        P.nodeX[node] = pt[0];
        P.nodeY[node] = pt[1];
        node++;
      }
    });
    if (!s.span.closed) {
      const last = s.span.pieces[s.span.pieces.length - 1];
      P.nodeX[node] = last.x1;
      P.nodeY[node] = last.y1;
      node++;
    }
    const nodesInSpan = node - first;
    const panelsInSpan = s.span.closed ? nodesInSpan : nodesInSpan - 1;
    const owner = s.span.role === 'body' ? s.span.owner : -1;
    const bc = s.span.bc === 'dirichlet' ? 1 : 0;
    for (let q = 0; q < panelsInSpan; q++) {
      const a = first + q;
      const b = s.span.closed ? first + ((q + 1) % nodesInSpan) : a + 1;
      const dx = P.nodeX[b] - P.nodeX[a];
      const dy = P.nodeY[b] - P.nodeY[a];
      const L = hypot2(dx, dy);
      P.pa[panel] = a;
      P.pb[panel] = b;
      P.len[panel] = L;
      P.tx[panel] = dx / L;
      P.ty[panel] = dy / L;
      P.nx[panel] = dy / L;
      P.ny[panel] = -dx / L;
      P.mx[panel] = 0.5 * (P.nodeX[a] + P.nodeX[b]);
      P.my[panel] = 0.5 * (P.nodeY[a] + P.nodeY[b]);
      P.bc[panel] = bc;
      P.owner[panel] = owner;
      panel++;
    }
  }
  return P;
}
