/**
 * Potential and velocity in the liquid from a solved section (used by the flow-speed map and the
 * kinetic-energy cross-check).
 *
 * Green's representation at a point x of the liquid (c = 1), with the panel integrals of assemble.ts
 * (images included through G(g x, y)):  φ(x) = ∫ φ ∂G/∂n_y ds − ∫ q G ds.
 * The solved φ is constant per panel; a constant double layer is a pair of point vortices at the panel
 * ends, whose velocity 1/r spoils the field within a panel length of the outline. For the field the
 * potential is therefore taken linear along each panel, continuous at the nodes (node values
 * interpolated between the neighbouring midpoints), which leaves only weak logarithmic terms. With
 * local coordinates u1 = (a − x)·t, h = (a − x)·n, θ the angle the panel subtends, Δ = φ_b − φ_a:
 *   ∫ φ ∂G/∂n_y ds = −(1/2π) [ θ (φ_a − u1 Δ/L) + (Δ/L) h (ln r_b − ln r_a) ],
 *   ∫ G ds = −(1/2π) [ u2 ln r_b − u1 ln r_a − L + h θ ],
 * and their gradients follow from ∇u1 = −t, ∇h = −n, ∇ln r = −v/|v|², ∇θ = perp(v_b)/|v_b|² − perp(v_a)/|v_a|²
 * (v = node − x, perp(v) = (v_y, −v_x)). Gradients at an image point map back with the reflection.
 */
import type { PanelSet } from './panels';
import type { ImageMap } from './lines';
import { lineDistance } from './lines';
import type { SectionModel } from './model';
import type { LevelSolution } from './solve-level';
import { pointInPolygon } from './polygon';

const INV_2PI = 1 / (2 * Math.PI);

/**
 * Densities of selected motions, ready for field evaluation. Layout: motion m's node potential at
 * `phiNode[m·nodeCount + k]`, its panel flux at `q[m·n + j]`.
 */
export interface FieldContext {
  P: PanelSet;
  group: readonly ImageMap[];
  motions: number;
  phiNode: Float64Array;
  q: Float64Array;
  rx: Float64Array;
  ry: Float64Array;
  lnr: Float64Array;
  ir2: Float64Array;
  acc: Float64Array;
}

/**
 * Prepares node potentials and panel fluxes of the given matrix columns (motion c = 3·body + dof).
 * `zeroLines` are lines with φ = 0 (free surfaces represented by images): nodes on them get φ = 0.
 */
export function fieldContext(
  group: readonly ImageMap[],
  level: LevelSolution,
  columns: readonly number[],
  zeroLines: readonly { px: number; py: number; nx: number; ny: number }[] = [],
): FieldContext {
  const P = level.panels;
  const n = P.count;
  const M = columns.length;
  const phi = new Float64Array(M * n);
  const q = new Float64Array(M * n);
  columns.forEach((c, m) => {
    const body = Math.floor(c / 3);
    const d = c % 3;
    for (let j = 0; j < n; j++) {
      if (P.bc[j] === 0) {
        phi[m * n + j] = level.x[c * n + j];
        q[m * n + j] = P.owner[j] === body ? level.q[3 * j + d] : 0;
      } else {
        q[m * n + j] = level.x[c * n + j];
      }
    }
  });
  // Node values: linear interpolation between the midpoints of the two panels sharing the node
  // (weights by the other panel's length); a node at the end of an open chain takes its panel's value,
  // or 0 on a φ = 0 line.
  const nn = P.nodeCount;
  const phiNode = new Float64Array(M * nn);
  const wsum = new Float64Array(nn);
  const firstPanel = new Int32Array(nn).fill(-1);
  const secondPanel = new Int32Array(nn).fill(-1);
  for (let j = 0; j < n; j++) {
    for (const k of [P.pa[j], P.pb[j]]) {
      if (firstPanel[k] < 0) firstPanel[k] = j;
      else secondPanel[k] = j;
    }
  }
  let scale = 0;
  for (let j = 0; j < n; j++) scale += P.len[j];
  for (let k = 0; k < nn; k++) {
    const j1 = firstPanel[k];
    const j2 = secondPanel[k];
    const onZero = j2 < 0 && zeroLines.some((l) => Math.abs((P.nodeX[k] - l.px) * l.nx + (P.nodeY[k] - l.py) * l.ny) <= 1e-9 * scale);
    for (let m = 0; m < M; m++) {
      if (j1 < 0) continue;
      if (onZero) phiNode[m * nn + k] = 0;
      else if (j2 < 0) phiNode[m * nn + k] = phi[m * n + j1];
      else phiNode[m * nn + k] = (phi[m * n + j1] * P.len[j2] + phi[m * n + j2] * P.len[j1]) / (P.len[j1] + P.len[j2]);
    }
    wsum[k] = 1;
  }
  return {
    P, group, motions: M, phiNode, q,
    rx: new Float64Array(nn), ry: new Float64Array(nn), lnr: new Float64Array(nn), ir2: new Float64Array(nn),
    acc: new Float64Array(3 * M),
  };
}

/**
 * φ and ∇φ of every prepared motion at (px, py): writes out[3m] = φ, out[3m+1] = ∂φ/∂x, out[3m+2] = ∂φ/∂y.
 */
export function evaluatePointInto(ctx: FieldContext, px: number, py: number, out: Float64Array): void {
  const { P, group, motions: M, phiNode, q, rx, ry, lnr, ir2, acc } = ctx;
  const n = P.count;
  const nn = P.nodeCount;
  const { nodeX, nodeY, pa, pb, tx, ty, nx, ny, len } = P;
  out.fill(0, 0, 3 * M);
  for (let g = 0; g < group.length; g++) {
    const G = group[g];
    const x = G.m00 * px + G.m01 * py + G.c0;
    const y = G.m10 * px + G.m11 * py + G.c1;
    for (let k = 0; k < P.nodeCount; k++) {
      const dx = nodeX[k] - x;
      const dy = nodeY[k] - y;
      const r2 = dx * dx + dy * dy;
      rx[k] = dx;
      ry[k] = dy;
      lnr[k] = r2 > 0 ? 0.5 * Math.log(r2) : 0;
      ir2[k] = r2 > 0 ? 1 / r2 : 0;
    }
    acc.fill(0);
    for (let j = 0; j < n; j++) {
      const ia = pa[j];
      const ib = pb[j];
      const L = len[j];
      const u1 = rx[ia] * tx[j] + ry[ia] * ty[j];
      const h = rx[ia] * nx[j] + ry[ia] * ny[j];
      const u2 = u1 + L;
      const theta = Math.atan2(h * L, u1 * u2 + h * h);
      const S = -INV_2PI * (u2 * lnr[ib] - u1 * lnr[ia] - L + h * theta);
      const dl = lnr[ia] - lnr[ib];
      const Sx = -INV_2PI * (dl * tx[j] - theta * nx[j]);
      const Sy = -INV_2PI * (dl * ty[j] - theta * ny[j]);
      // ∇θ and ∇(ln r_b − ln r_a).
      const thx = ry[ib] * ir2[ib] - ry[ia] * ir2[ia];
      const thy = -rx[ib] * ir2[ib] + rx[ia] * ir2[ia];
      const glx = -rx[ib] * ir2[ib] + rx[ia] * ir2[ia];
      const gly = -ry[ib] * ir2[ib] + ry[ia] * ir2[ia];
      const lba = -dl;
      const iL = 1 / L;
      for (let m = 0; m < M; m++) {
        const fa = phiNode[m * nn + ia];
        const dPhi = (phiNode[m * nn + ib] - fa) * iL;
        const s = q[m * n + j];
        const c0 = fa - u1 * dPhi;
        // D = −(1/2π)[θ c0 + dPhi h (ln r_b − ln r_a)], ∇c0 = dPhi t, ∇h = −n.
        const D = -INV_2PI * (theta * c0 + dPhi * h * lba);
        const Dx = -INV_2PI * (thx * c0 + theta * dPhi * tx[j] + dPhi * (-nx[j] * lba + h * glx));
        const Dy = -INV_2PI * (thy * c0 + theta * dPhi * ty[j] + dPhi * (-ny[j] * lba + h * gly));
        acc[3 * m] += D - s * S;
        acc[3 * m + 1] += Dx - s * Sx;
        acc[3 * m + 2] += Dy - s * Sy;
      }
    }
    // ∇_p [f(g p)] = Mᵀ (∇f)(g p), weighted by the image sign.
    for (let m = 0; m < M; m++) {
      const gx = acc[3 * m + 1];
      const gy = acc[3 * m + 2];
      out[3 * m] += G.sign * acc[3 * m];
      out[3 * m + 1] += G.sign * (G.m00 * gx + G.m10 * gy);
      out[3 * m + 2] += G.sign * (G.m01 * gx + G.m11 * gy);
    }
  }
}

/** True when (x, y) lies in the liquid: inside the enclosure, on the liquid side of lines, outside bodies. */
export function inLiquid(model: SectionModel, x: number, y: number): boolean {
  for (const l of model.lines) if (!(lineDistance(l, x, y) > 0)) return false;
  if (model.enclosurePolygon && !pointInPolygon(model.enclosurePolygon, x, y)) return false;
  for (const b of model.bodyPolygons) if (pointInPolygon(b, x, y)) return false;
  return true;
}


/** Free surfaces represented by images (φ = 0 on them), for `fieldContext`. */
export function zeroLines(model: SectionModel): SectionModel['lines'] {
  return model.group.length > 1 ? model.lines.filter((l) => l.kind === 'free-surface') : [];
}
