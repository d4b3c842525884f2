/**
 * From validated input to the discrete model: wetted spans, panel counts per span, image group,
 * reference points, wetted areas and reference half-widths.
 */
import type { SectionInput } from './types';
import { bodyOutline, enclosureOutline } from './shapes';
import { chainArea, extremeSamples, sampleChain, pieceLength } from './pieces';
import { clipChain, lineIntervals, type Span } from './domain';
import { imageGroup, type ImageMap, type Line } from './lines';
import { planSpan, shareByLength, type SpanPanels } from './panels';
import { bbox, clipByHalfPlane, signedArea, type Polygon } from './polygon';

export interface SectionModel {
  spans: SpanPanels[];
  group: ImageMap[];
  /** True when the liquid region is bounded (an enclosure). */
  closed: boolean;
  refX: number[];
  refY: number[];
  /** Per body: wetted area (m²) and half-extents across x motion (along y) and across y motion (along x). */
  wettedArea: number[];
  halfWidthForX: number[];
  halfWidthForY: number[];
  /** Closed sample polygons: bodies (whole, unclipped) and enclosure, for masks. */
  bodyPolygons: Polygon[];
  enclosurePolygon: Polygon | null;
  lines: Line[];
  notes: string[];
}

/** Straight boundaries of the input as unit-normal lines. */
export function inputLines(input: SectionInput): Line[] {
  const out: Line[] = [];
  (input.boundaries ?? []).forEach((b, index) => {
    if (b.kind === 'enclosure') return;
    const l = Math.hypot(b.normal[0], b.normal[1]);
    out.push({ index, kind: b.kind, px: b.pointM[0], py: b.pointM[1], nx: b.normal[0] / l, ny: b.normal[1] / l });
  });
  return out;
}

/** Fine samples per full turn for areas and extents (relative area error ~ (2π/4096)²/6 ≈ 4e-7). */
const AREA_SAMPLES = 4096;

export function buildModel(input: SectionInput, panelsPerBody: number): SectionModel {
  const lines = inputLines(input);
  const encSpec = (input.boundaries ?? []).find((b) => b.kind === 'enclosure');
  const encIndex = (input.boundaries ?? []).findIndex((b) => b.kind === 'enclosure');
  const closed = encSpec !== undefined && encSpec.kind === 'enclosure';
  const notes: string[] = [];
  const outlines = input.bodies.map(bodyOutline);
  const bodyPolygons = outlines.map((o) => sampleChain(o.pieces, 256));
  const enc = closed ? enclosureOutline(encSpec) : null;
  const enclosurePolygon = enc ? sampleChain(enc.pieces, 512) : null;

  let scale = 0;
  for (const p of bodyPolygons) {
    const b = bbox(p);
    scale = Math.max(scale, b[2] - b[0], b[3] - b[1], Math.abs(b[0]), Math.abs(b[1]), Math.abs(b[2]), Math.abs(b[3]));
  }
  const tol = 1e-10 * scale;
  // Panel counts are planned at the coarsest level (N/4); the solver uses 1×, 2× and 4× these.
  const nb = Math.max(2, Math.round(panelsPerBody / 4));

  const spans: SpanPanels[] = [];
  const ends: [number, number][] = [];
  const wettedPerimeters: number[] = [];
  const bodyPanelsBase: number[] = [];
  outlines.forEach((o, k) => {
    const { spans: pcs, closed: whole } = clipChain(o.pieces, lines, tol);
    const lens = pcs.map((s) => s.reduce((a, p) => a + pieceLength(p), 0));
    const total = lens.reduce((a, b) => a + b, 0);
    wettedPerimeters.push(total);
    // Thin bodies (plates): the two faces of a plate only "see" each other's difference of potential
    // through terms of the order of thickness / panel length, so constant panels converge slowly until
    // panels approach the thickness. More panels for thin outlines: τ = A / (P/2)² is t/w for a thin
    // rectangle, 1/4 for a square; the factor √(0.01/τ) is capped at 2 to bound the cost.
    const perim = o.pieces.reduce((a, p) => a + pieceLength(p), 0);
    const tau = Math.abs(chainArea(o.pieces)) / (perim / 2) ** 2;
    const thin = Math.min(2, Math.max(1, Math.sqrt(0.01 / tau)));
    const nbk = Math.round(nb * thin);
    bodyPanelsBase.push(nbk);
    // Share the body's panels among its wetted spans by length (at least 2 each).
    const counts = shareByLength(lens, lens.map(() => 2), nbk);
    pcs.forEach((pieces, q) => {
      const span: Span = { role: 'body', owner: k, bc: 'neumann', pieces, closed: whole };
      spans.push(planSpan(span, counts[q]));
      if (!whole) ends.push([pieces[0].x0, pieces[0].y0], [pieces[pieces.length - 1].x1, pieces[pieces.length - 1].y1]);
    });
  });

  let group: ImageMap[] = [{ m00: 1, m01: 0, m10: 0, m11: 1, c0: 0, c1: 0, sign: 1 }];
  if (enc && enclosurePolygon) {
    // Outer boundary (enclosure + straight boundaries inside it): panels of about the bodies' mean
    // panel length, from half to once the nominal count of one body (the outer boundary sees a smooth,
    // weak disturbance; this keeps the dense solve within the time budget).
    const hc = wettedPerimeters.reduce((a, b) => a + b, 0) / wettedPerimeters.length / nb;
    const outer: Span[] = [];
    const { spans: es, closed: encWhole } = clipChain(enc.pieces, lines, tol);
    for (const pieces of es) {
      outer.push({ role: 'enclosure', owner: encIndex, bc: 'neumann', pieces, closed: encWhole });
      if (!encWhole) ends.push([pieces[0].x0, pieces[0].y0], [pieces[pieces.length - 1].x1, pieces[pieces.length - 1].y1]);
    }
    for (const l of lines) {
      const pieces = lineIntervals(l, lines.filter((o) => o !== l), ends, enclosurePolygon, bodyPolygons, scale);
      if (pieces.length === 0) notes.push(`boundaries[${l.index}] does not cut the enclosure; it has no effect`);
      for (const p of pieces) {
        outer.push({ role: 'line', owner: l.index, bc: l.kind === 'wall' ? 'neumann' : 'dirichlet', pieces: [p], closed: false });
      }
    }
    const outerLens = outer.map((s) => s.pieces.reduce((a, p) => a + pieceLength(p), 0));
    const outerTotal = outerLens.reduce((a, b) => a + b, 0);
    const budget = Math.min(nb, Math.max(Math.ceil(nb / 2), Math.round(outerTotal / hc)));
    const counts = shareByLength(outerLens, outerLens.map(() => 2), budget);
    outer.forEach((span, q) => spans.push(planSpan(span, counts[q])));
    if (lines.length > 0) notes.push('straight boundaries inside the enclosure are panelled explicitly (walls: ∂φ/∂n = 0, free surface: φ = 0)');
  } else if (lines.length > 0) {
    group = imageGroup(lines);
    notes.push(
      lines.length === 1
        ? 'straight boundary represented exactly by one image (wall: same sign, free surface: opposite sign)'
        : 'two perpendicular straight boundaries represented exactly by three images',
    );
  }

  // Wetted areas and extents from dense samples of the outlines, clipped by the liquid half-planes.
  const wettedArea: number[] = [];
  const halfWidthForX: number[] = [];
  const halfWidthForY: number[] = [];
  outlines.forEach((o) => {
    // A body wholly on the liquid side of every line needs no dense polygon: its area is exact (Green's
    // theorem on the pieces) and the extreme samples give the dense polygon's extents and the clip test.
    const clippedBy = (pts: ArrayLike<number>) =>
      lines.some((l) => {
        for (let q = 0; q < pts.length; q += 2) if (!((pts[q] - l.px) * l.nx + (pts[q + 1] - l.py) * l.ny > 0)) return true;
        return false;
      });
    const candidates: number[] = [];
    for (const l of lines) extremeSamples(o.pieces, AREA_SAMPLES, -l.nx, -l.ny, candidates);
    if (!clippedBy(candidates)) {
      const extremes: number[] = [];
      for (const [dx, dy] of [[1, 0], [-1, 0], [0, 1], [0, -1]]) extremeSamples(o.pieces, AREA_SAMPLES, dx, dy, extremes);
      const b = bbox(Float64Array.from(extremes));
      wettedArea.push(Math.abs(chainArea(o.pieces)));
      halfWidthForX.push((b[3] - b[1]) / 2);
      halfWidthForY.push((b[2] - b[0]) / 2);
      return;
    }
    const whole = sampleChain(o.pieces, AREA_SAMPLES);
    let poly = whole;
    for (const l of lines) poly = clipByHalfPlane(poly, l.px, l.py, l.nx, l.ny);
    // Clipped: dense polygon, area error ~4e-7.
    wettedArea.push(poly.length >= 6 ? Math.abs(signedArea(poly)) : 0);
    const b = bbox(poly);
    halfWidthForX.push((b[3] - b[1]) / 2);
    halfWidthForY.push((b[2] - b[0]) / 2);
  });
  return {
    spans,
    group,
    closed,
    refX: outlines.map((o) => o.refX),
    refY: outlines.map((o) => o.refY),
    wettedArea,
    halfWidthForX,
    halfWidthForY,
    bodyPolygons,
    enclosurePolygon,
    lines,
    notes,
  };
}
