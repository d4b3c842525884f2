/**
 * Kinetic-energy cross-check of the diagonal added-mass terms.
 *
 * For a unit velocity of motion c the liquid's kinetic energy is T = ½ m_cc, and T = ½ ρ ∫ |∇φ_c|² dA
 * over the liquid (classical, e.g. Lamb, Hydrodynamics §44). The boundary-integral value m_cc = −ρ ∮ φ q ds
 * (solve-level.ts) follows from the same energy by Green's identity; evaluating the area integral on a
 * field grid is an independent check of the solution in the liquid, not only on the boundary.
 *
 * Quadrature: a square grid of `cells` × `cells` cells over the liquid (the enclosure's box, or a box
 * centred on the straight boundaries' crossing / the bodies, reaching about three body sizes out).
 * Cells within about one cell of a boundary are split 4 × 4 (16 × 16 next to corners and clip points,
 * where the velocity is singular) and only sub-cell centres in the liquid count, so the region is
 * resolved to 1/4 cell at the outlines; elsewhere the midpoint rule.
 * Far-field tail (unbounded liquid): φ → μ·r / (2π r²) with dipole moment μ = Σ (φ_j n_j − q_j (x_j − c)) L_j
 * (images included), |∇φ|² = |μ|² / (4π² r⁴); outside a square of half-side L centred on c this
 * integrates to |μ|² (1 + π/2) / (4π² L²), of which the liquid holds 1/(number of image copies).
 */
import type { EnergyCheck, SectionDof } from './types';
import type { SectionModel } from './model';
import type { LevelSolution } from './solve-level';
import { evaluatePointInto, fieldContext, inLiquid, zeroLines } from './field-eval';
import { bbox } from './polygon';

const DOFS: SectionDof[] = ['x', 'y', 'rotation'];
/** Sub-cells per side in cells next to a boundary. */
const SPLIT = 4;
/** Sub-cells per side in cells next to a corner or clip point. */
const HOT_SPLIT = 16;

export function energyCheck(model: SectionModel, fine: LevelSolution, m: Float64Array, rho: number, cells: number): EnergyCheck[] {
  const P = fine.panels;
  const K = model.refX.length;
  const m3 = 3 * K;
  // Skip blocked motions and motions that move no liquid (a circle turning about its centre): their
  // added mass is round-off against ρ A (translation) or ρ A² (rotation), A the wetted area.
  const columns: number[] = [];
  for (let c = 0; c < m3; c++) {
    const A = model.wettedArea[Math.floor(c / 3)];
    const scale = rho * (c % 3 < 2 ? A : A * A);
    if (!fine.blocked[c] && m[c * m3 + c] > 1e-6 * scale) columns.push(c);
  }
  if (columns.length === 0) return [];

  // Integration box.
  let cx: number, cy: number, half: number;
  let bx0 = Infinity, by0 = Infinity, bx1 = -Infinity, by1 = -Infinity;
  for (const p of model.bodyPolygons) {
    const b = bbox(p);
    bx0 = Math.min(bx0, b[0]);
    by0 = Math.min(by0, b[1]);
    bx1 = Math.max(bx1, b[2]);
    by1 = Math.max(by1, b[3]);
  }
  if (model.enclosurePolygon) {
    const b = bbox(model.enclosurePolygon);
    cx = (b[0] + b[2]) / 2;
    cy = (b[1] + b[3]) / 2;
    half = (Math.max(b[2] - b[0], b[3] - b[1]) / 2) * 1.001;
  } else {
    cx = (bx0 + bx1) / 2;
    cy = (by0 + by1) / 2;
    const L = model.lines;
    if (L.length === 1) {
      // Project the bodies' centre onto the line: the box is then symmetric about it.
      const d = (cx - L[0].px) * L[0].nx + (cy - L[0].py) * L[0].ny;
      cx -= d * L[0].nx;
      cy -= d * L[0].ny;
    } else if (L.length === 2) {
      // Crossing point of two perpendicular lines: P0 + s t0 with t0 ⟂ n0 on line 1.
      const t0x = -L[0].ny, t0y = L[0].nx;
      const s = -((L[0].px - L[1].px) * L[1].nx + (L[0].py - L[1].py) * L[1].ny) / (t0x * L[1].nx + t0y * L[1].ny);
      cx = L[0].px + s * t0x;
      cy = L[0].py + s * t0y;
    }
    const reach = Math.max(Math.abs(bx0 - cx), Math.abs(bx1 - cx), Math.abs(by0 - cy), Math.abs(by1 - cy));
    const size = Math.max(bx1 - bx0, by1 - by0);
    half = reach + 3 * size;
  }
  const h = (2 * half) / cells;
  const x0 = cx - half;
  const y0 = cy - half;

  // Cells near a boundary: mark the cell of every boundary sample (spacing ≤ h/4) and its neighbours.
  const near = new Uint8Array(cells * cells);
  const mark = (x: number, y: number) => {
    const i = Math.floor((x - x0) / h);
    const j = Math.floor((y - y0) / h);
    for (let dj = -1; dj <= 1; dj++) {
      for (let di = -1; di <= 1; di++) {
        const ii = i + di, jj = j + dj;
        if (ii >= 0 && jj >= 0 && ii < cells && jj < cells && near[jj * cells + ii] === 0) near[jj * cells + ii] = 1;
      }
    }
  };
  const markHot = (x: number, y: number) => {
    const i = Math.floor((x - x0) / h);
    const j = Math.floor((y - y0) / h);
    for (let dj = -1; dj <= 1; dj++) {
      for (let di = -1; di <= 1; di++) {
        const ii = i + di, jj = j + dj;
        if (ii >= 0 && jj >= 0 && ii < cells && jj < cells) near[jj * cells + ii] = 2;
      }
    }
  };
  const markPolygon = (p: Float64Array) => {
    const n = p.length / 2;
    for (let k = 0; k < n; k++) {
      const k1 = (k + 1) % n;
      const len = Math.hypot(p[2 * k1] - p[2 * k], p[2 * k1 + 1] - p[2 * k + 1]);
      const steps = Math.max(1, Math.ceil((4 * len) / h));
      for (let s = 0; s < steps; s++) {
        const t = s / steps;
        mark(p[2 * k] + t * (p[2 * k1] - p[2 * k]), p[2 * k + 1] + t * (p[2 * k1 + 1] - p[2 * k + 1]));
      }
    }
  };
  model.bodyPolygons.forEach(markPolygon);
  // Corners and clip points (graded piece ends): the flow is singular there, split those cells finer.
  for (const sp of model.spans) {
    for (const p of sp.span.pieces) {
      if (p.gradeStart) markHot(p.x0, p.y0);
      if (p.gradeEnd) markHot(p.x1, p.y1);
    }
  }
  if (model.enclosurePolygon) markPolygon(model.enclosurePolygon);
  for (const l of model.lines) {
    const tx = -l.ny, ty = l.nx;
    const s0 = (cx - l.px) * tx + (cy - l.py) * ty;
    const steps = Math.ceil((4 * 2 * Math.SQRT2 * half) / h);
    for (let s = 0; s <= steps; s++) {
      const u = s0 - Math.SQRT2 * half + (2 * Math.SQRT2 * half * s) / steps;
      mark(l.px + u * tx, l.py + u * ty);
    }
  }

  const ctx = fieldContext(model.group, fine, columns, zeroLines(model));
  const M = columns.length;
  const out = new Float64Array(3 * M);
  const sum = new Float64Array(M);
  const add = (x: number, y: number, w: number) => {
    if (!inLiquid(model, x, y)) return;
    evaluatePointInto(ctx, x, y, out);
    for (let k = 0; k < M; k++) sum[k] += w * (out[3 * k + 1] * out[3 * k + 1] + out[3 * k + 2] * out[3 * k + 2]);
  };
  for (let j = 0; j < cells; j++) {
    for (let i = 0; i < cells; i++) {
      const flag = near[j * cells + i];
      if (flag === 0) {
        add(x0 + (i + 0.5) * h, y0 + (j + 0.5) * h, h * h);
        continue;
      }
      const split = flag === 2 ? HOT_SPLIT : SPLIT;
      const hs = h / split;
      for (let b = 0; b < split; b++) {
        for (let a = 0; a < split; a++) add(x0 + i * h + (a + 0.5) * hs, y0 + j * h + (b + 0.5) * hs, hs * hs);
      }
    }
  }

  const checks: EnergyCheck[] = [];
  columns.forEach((c, k) => {
    let tail = 0;
    if (!model.enclosurePolygon) {
      const body = Math.floor(c / 3);
      const d = c % 3;
      let mux = 0, muy = 0;
      for (let j = 0; j < P.count; j++) {
        const phi = P.bc[j] === 0 ? fine.x[c * P.count + j] : 0;
        const q = P.bc[j] === 0 ? (P.owner[j] === body ? fine.q[3 * j + d] : 0) : fine.x[c * P.count + j];
        mux += (phi * P.nx[j] - q * (P.mx[j] - cx)) * P.len[j];
        muy += (phi * P.ny[j] - q * (P.my[j] - cy)) * P.len[j];
      }
      let tx = 0, ty = 0;
      for (const g of model.group) {
        tx += g.sign * (g.m00 * mux + g.m10 * muy);
        ty += g.sign * (g.m01 * mux + g.m11 * muy);
      }
      tail = (rho * (tx * tx + ty * ty) * (1 + Math.PI / 2)) / (4 * Math.PI * Math.PI * half * half) / model.group.length;
    }
    const fieldIntegral = rho * sum[k] + tail;
    const boundaryIntegral = m[c * m3 + c];
    checks.push({
      dof: c,
      body: Math.floor(c / 3),
      motion: DOFS[c % 3],
      boundaryIntegral,
      fieldIntegral,
      tail,
      relativeDifference: (fieldIntegral - boundaryIntegral) / boundaryIntegral,
    });
  });
  return checks;
}
