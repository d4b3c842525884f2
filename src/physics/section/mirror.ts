/**
 * Mirror symmetry of a discretised section: a line such that reflecting the liquid region's panels in it
 * gives the same panels (reversed in direction, same boundary condition, body panels onto body panels),
 * and such that the image group of the straight boundaries is unchanged by the reflection.
 *
 * Why: with such a reflection σ the collocation matrix commutes with the panel permutation Π (A_{σi,σj} =
 * A_ij, the kernel and every panel integral being invariant under an isometry), so the system splits into
 * its symmetric and antisymmetric halves (classical: reduction of a linear system by a symmetry group).
 * Each half has about n/2 unknowns and needs only the rows of one half of the panels: half the assembly and
 * a quarter of the factorisation work of the whole system, for the same answer to round-off.
 *
 * Finding it: a symmetry line passes through the length-weighted centroid of the panel midpoints and, for
 * a non-isotropic boundary, along a principal axis of its second moments. Lines along x, y and the two
 * diagonals (a wall corner's bisector), along the walls' normals and tangents, and along the principal axes
 * are tried in turn. A candidate is accepted only if every panel has a mirror panel whose midpoint and ends
 * match the reflected ones within TOLERANCE of the section's extent (a symmetric input's coordinates agree
 * to round-off, ~1e-16), so a section that is symmetric only approximately is solved whole.
 */
import type { ImageMap } from './lines';
import type { PanelSet } from './panels';

/** Matching tolerance relative to the section's extent (coordinates of a symmetric input agree to ~1e-16). */
const TOLERANCE = 1e-11;

/** A symmetry line through (cx, cy) along the unit (dx, dy), and the panel permutation it induces. */
export interface Mirror {
  /** Panel j's mirror image σ(j), with σ(σ(j)) = j; σ(j) = j for a panel the line crosses at its midpoint. */
  panel: Int32Array;
  cx: number;
  cy: number;
  dx: number;
  dy: number;
  /** Matching tolerance used, m. */
  tol: number;
}

/**
 * The mirror symmetry of the panels, or null when no symmetry line is found. `nearby`, the mirror of a
 * nested level with half or twice the panels (panel c of the coarser level is panels 2c and 2c + 1 of the
 * finer, in the same order), proposes the permutation directly; it is checked panel by panel like any
 * candidate, and the search runs only if it fails.
 */
export function findMirror(P: PanelSet, group: readonly ImageMap[], nearby: Mirror | null = null): Mirror | null {
  const n = P.count;
  if (n < 2) return null;
  if (nearby) {
    const m = nearby.panel.length;
    let proposed: Int32Array | null = null;
    if (n === 2 * m) {
      proposed = new Int32Array(n);
      for (let c = 0; c < m; c++) {
        // The mirror of a coarse panel runs the other way: its first child mirrors our second.
        proposed[2 * c] = 2 * nearby.panel[c] + 1;
        proposed[2 * c + 1] = 2 * nearby.panel[c];
      }
    } else if (2 * n === m) {
      proposed = new Int32Array(n);
      for (let c = 0; c < n; c++) proposed[c] = nearby.panel[2 * c] >> 1;
    }
    const { cx, cy, dx, dy, tol } = nearby;
    if (proposed && checkPanels(P, proposed, cx, cy, -dy, dx, tol)) return { panel: proposed, cx, cy, dx, dy, tol };
  }
  const { mx, my, len } = P;
  let total = 0;
  let cx = 0;
  let cy = 0;
  for (let j = 0; j < n; j++) {
    total += len[j];
    cx += len[j] * mx[j];
    cy += len[j] * my[j];
  }
  cx /= total;
  cy /= total;
  let ixx = 0;
  let iyy = 0;
  let ixy = 0;
  let extent = 0;
  let far = 0;
  for (let k = 0; k < P.nodeCount; k++) {
    extent = Math.max(extent, Math.abs(P.nodeX[k] - cx), Math.abs(P.nodeY[k] - cy));
    far = Math.max(far, Math.abs(P.nodeX[k]), Math.abs(P.nodeY[k]));
  }
  for (let j = 0; j < n; j++) {
    const dx = mx[j] - cx;
    const dy = my[j] - cy;
    ixx += len[j] * dx * dx;
    iyy += len[j] * dy * dy;
    ixy += len[j] * dx * dy;
  }
  // Round-off of the coordinates themselves (far from the origin) on top of the relative tolerance.
  const tol = TOLERANCE * extent + 1e-15 * far;
  const h = Math.SQRT1_2;
  const directions: [number, number][] = [
    [1, 0],
    [0, 1],
    [h, h],
    [-h, h],
  ];
  for (const g of group) {
    // A reflection's linear part is I − 2ννᵀ: the larger column of I − M is a multiple of its normal ν.
    const a = 1 - g.m00;
    const b = -g.m10;
    const c = -g.m01;
    const d = 1 - g.m11;
    const [vx, vy] = a * a + b * b >= c * c + d * d ? [a, b] : [c, d];
    const l = Math.hypot(vx, vy);
    if (l > 1e-9 && g.m00 * g.m11 - g.m01 * g.m10 < 0) directions.push([vx / l, vy / l], [-vy / l, vx / l]);
  }
  if (Math.abs(ixx - iyy) + Math.abs(ixy) > 1e-9 * (ixx + iyy)) {
    const t = 0.5 * Math.atan2(2 * ixy, ixx - iyy);
    directions.push([Math.cos(t), Math.sin(t)], [-Math.sin(t), Math.cos(t)]);
  }
  const tried: [number, number][] = [];
  for (const [dx, dy] of directions) {
    if (tried.some(([ex, ey]) => Math.abs(ex * dy - ey * dx) < 1e-12)) continue;
    tried.push([dx, dy]);
    // Normal of the symmetry line, and the reflection x' = x − 2((x − c)·ν)ν.
    const nx = -dy;
    const ny = dx;
    if (!groupInvariant(group, cx, cy, nx, ny, tol)) continue;
    const map = matchPanels(P, cx, cy, dx, dy, tol);
    if (map) return { panel: map, cx, cy, dx, dy, tol };
  }
  return null;
}

/** σ g σ is again in the group with the same sign, for every image map g (σ: reflection in the line). */
function groupInvariant(group: readonly ImageMap[], cx: number, cy: number, nx: number, ny: number, tol: number): boolean {
  const r00 = 1 - 2 * nx * nx;
  const r01 = -2 * nx * ny;
  const r11 = 1 - 2 * ny * ny;
  const s = 2 * (cx * nx + cy * ny);
  const t0 = s * nx;
  const t1 = s * ny;
  return group.every((g) => {
    // σ g σ (x) = R M R x + R (M t + c_g) + t.
    const a00 = r00 * g.m00 + r01 * g.m10;
    const a01 = r00 * g.m01 + r01 * g.m11;
    const a10 = r01 * g.m00 + r11 * g.m10;
    const a11 = r01 * g.m01 + r11 * g.m11;
    const m00 = a00 * r00 + a01 * r01;
    const m01 = a00 * r01 + a01 * r11;
    const m10 = a10 * r00 + a11 * r01;
    const m11 = a10 * r01 + a11 * r11;
    const u0 = g.m00 * t0 + g.m01 * t1 + g.c0;
    const u1 = g.m10 * t0 + g.m11 * t1 + g.c1;
    const c0 = r00 * u0 + r01 * u1 + t0;
    const c1 = r01 * u0 + r11 * u1 + t1;
    return group.some(
      (h) =>
        h.sign === g.sign &&
        Math.abs(h.m00 - m00) + Math.abs(h.m01 - m01) + Math.abs(h.m10 - m10) + Math.abs(h.m11 - m11) < 1e-12 &&
        Math.abs(h.c0 - c0) <= tol &&
        Math.abs(h.c1 - c1) <= tol,
    );
  });
}

/**
 * Pairs each panel with the panel whose midpoint is its reflected midpoint (panels sorted along the line,
 * each searched by bisection), then checks the pairing (`checkPanels`).
 */
function matchPanels(P: PanelSet, cx: number, cy: number, dx: number, dy: number, tol: number): Int32Array | null {
  const n = P.count;
  const { mx, my } = P;
  const nx = -dy;
  const ny = dx;
  const u = new Float64Array(n);
  const order = new Int32Array(n);
  for (let j = 0; j < n; j++) {
    u[j] = (mx[j] - cx) * dx + (my[j] - cy) * dy;
    order[j] = j;
  }
  order.sort((a, b) => u[a] - u[b]);
  const sorted = new Float64Array(n);
  for (let q = 0; q < n; q++) sorted[q] = u[order[q]];
  const map = new Int32Array(n);
  for (let j = 0; j < n; j++) {
    const w = 2 * ((mx[j] - cx) * nx + (my[j] - cy) * ny);
    const x = mx[j] - w * nx;
    const y = my[j] - w * ny;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (sorted[mid] < u[j] - tol) lo = mid + 1;
      else hi = mid;
    }
    let found = -1;
    for (let q = lo; q < n && sorted[q] <= u[j] + tol; q++) {
      const k = order[q];
      if (!(Math.abs(mx[k] - x) <= tol && Math.abs(my[k] - y) <= tol)) continue;
      if (found >= 0) return null; // two panels at one point: not a clean mirror image
      found = k;
    }
    if (found < 0) return null;
    map[j] = found;
  }
  return checkPanels(P, map, cx, cy, nx, ny, tol) ? map : null;
}

/**
 * True when `map` is an involution pairing each panel with one whose midpoint is the reflected midpoint
 * and which runs the other way (its start is the reflected end, its end the reflected start), with the same
 * boundary condition and owner kind (body or not). Reflection in the line through (cx, cy) with unit
 * normal (nx, ny): x' = x − 2((x − c)·ν)ν.
 */
function checkPanels(P: PanelSet, map: Int32Array, cx: number, cy: number, nx: number, ny: number, tol: number): boolean {
  const n = P.count;
  const { mx, my, pa, pb, nodeX, nodeY, bc, owner } = P;
  const near = (ax: number, ay: number, bx: number, by: number) => Math.abs(ax - bx) <= tol && Math.abs(ay - by) <= tol;
  for (let j = 0; j < n; j++) {
    const k = map[j];
    if (!(k >= 0 && k < n) || map[k] !== j) return false;
    if (bc[k] !== bc[j] || (owner[k] >= 0) !== (owner[j] >= 0)) return false;
    const w = 2 * ((mx[j] - cx) * nx + (my[j] - cy) * ny);
    if (!near(mx[k], my[k], mx[j] - w * nx, my[j] - w * ny)) return false;
    const a = pa[j];
    const b = pb[j];
    const wa = 2 * ((nodeX[a] - cx) * nx + (nodeY[a] - cy) * ny);
    const wb = 2 * ((nodeX[b] - cx) * nx + (nodeY[b] - cy) * ny);
    if (!near(nodeX[pa[k]], nodeY[pa[k]], nodeX[b] - wb * nx, nodeY[b] - wb * ny)) return false;
    if (!near(nodeX[pb[k]], nodeY[pb[k]], nodeX[a] - wa * nx, nodeY[a] - wa * ny)) return false;
  }
  return true;
}
