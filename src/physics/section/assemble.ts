/**
 * Collocation matrix of the direct boundary-element method with constant panels.
 *
 * Green's third identity for the liquid region Ω (G = −ln r / 2π, ∇²G = −δ), at a panel midpoint x:
 *   ½ φ(x) − ∫ φ ∂G/∂n_y ds = −∫ G ∂φ/∂n ds,
 * with n the normal into the liquid. The kernel G includes the images of straight boundaries
 * (lines.ts). With φ and q = ∂φ/∂n constant on each flat panel, both integrals over a panel are exact
 * closed forms (panel in local coordinates: y − x = u t + h n, u ∈ [u1, u2], r² = u² + h²):
 *   ∫ ln r du = u2 ln r2 − u1 ln r1 − L + h θ,   ∫ h / r² du = θ,   θ = atan2(h L, u1 u2 + h²)
 * (θ is the angle the panel subtends at x). So S_ij = −(1/2π) ∫ ln r and D_ij = ∫ ∂G/∂n_y = −θ/2π.
 * On Neumann panels φ is unknown (q given: the rigid-body normal velocity on bodies, 0 on walls);
 * on Dirichlet panels (free surface inside an enclosure) φ = 0 and q is unknown.
 *
 * Matrix layout: row-major n×n `a` (row i = equation at panel i's midpoint, column j = unknown of
 * panel j). Right-hand sides column-wise: motion c occupies `rhs[c·n … (c+1)·n)`.
 */
import type { PanelSet } from './panels';
import type { ImageMap } from './lines';

const INV_2PI = 1 / (2 * Math.PI);

/**
 * atan2(y, x) with a fast path for the far panels that make up most of the matrix: when x > 0 and
 * |y| ≤ x/8, atan(t), t = y/x, by its Taylor series to t¹⁵ (Abramowitz & Stegun, Handbook of Mathematical
 * Functions, 4.4.42); the first omitted term, t¹⁷/17, is below 2.3e-16·|t| for |t| ≤ 1/8, i.e. round-off.
 * Elsewhere Math.atan2.
 */
export function panelAngle(y: number, x: number): number {
  if (x > 0 && 8 * Math.abs(y) <= x) {
    const t = y / x;
    const t2 = t * t;
    return (
      t *
      (1 + t2 * (-1 / 3 + t2 * (1 / 5 + t2 * (-1 / 7 + t2 * (1 / 9 + t2 * (-1 / 11 + t2 * (1 / 13 + t2 * (-1 / 15))))))))
    );
  }
  return Math.atan2(y, x);
}

/**
 * Normal velocities of the rigid motions, per panel: `q[3j + d]` for d = 0 (x), 1 (y), 2 (rotation about
 * the owner body's reference point, counter-clockwise): q = n_x, n_y, (x − x_ref) n_y − (y − y_ref) n_x.
 * Zero for panels that are not on a body.
 */
export function rigidNormalVelocities(P: PanelSet, refX: readonly number[], refY: readonly number[]): Float64Array {
  const q = new Float64Array(3 * P.count);
  for (let j = 0; j < P.count; j++) {
    const k = P.owner[j];
    if (k < 0) continue;
    q[3 * j] = P.nx[j];
    q[3 * j + 1] = P.ny[j];
    q[3 * j + 2] = (P.mx[j] - refX[k]) * P.ny[j] - (P.my[j] - refY[k]) * P.nx[j];
  }
  return q;
}

/** Scratch arrays for one row of the assembly; allocate once per panel set size. */
export interface AssemblyWork {
  rx: Float64Array;
  ry: Float64Array;
  lnr: Float64Array;
}

export function createAssemblyWork(nodeCount: number): AssemblyWork {
  return { rx: new Float64Array(nodeCount), ry: new Float64Array(nodeCount), lnr: new Float64Array(nodeCount) };
}

/**
 * Fills `a` (n×n) and `rhs` (bodies·3 columns of length n). `pin` adds wᵀφ (w = panel length over the
 * total) to every equation, which fixes the free constant of a closed, all-Neumann region.
 */
export function assembleInto(
  P: PanelSet,
  group: readonly ImageMap[],
  q: Float64Array,
  bodyCount: number,
  pin: boolean,
  a: Float64Array,
  rhs: Float64Array,
  work: AssemblyWork,
): void {
  const n = P.count;
  const { nodeX, nodeY, pa, pb, tx, ty, nx, ny, len, bc, owner } = P;
  const { rx, ry, lnr } = work;
  const nodeCount = P.nodeCount;
  a.fill(0);
  rhs.fill(0, 0, 3 * bodyCount * n);
  let totalLen = 0;
  for (let j = 0; j < n; j++) totalLen += len[j];
  for (let i = 0; i < n; i++) {
    const row = i * n;
    for (let g = 0; g < group.length; g++) {
      const G = group[g];
      const x = G.m00 * P.mx[i] + G.m01 * P.my[i] + G.c0;
      const y = G.m10 * P.mx[i] + G.m11 * P.my[i] + G.c1;
      const sg = G.sign * INV_2PI;
      for (let k = 0; k < nodeCount; k++) {
        const dx = nodeX[k] - x;
        const dy = nodeY[k] - y;
        const r2 = dx * dx + dy * dy;
        rx[k] = dx;
        ry[k] = dy;
        lnr[k] = r2 > 0 ? 0.5 * Math.log(r2) : 0;
      }
      for (let j = 0; j < n; j++) {
        const ia = pa[j];
        const L = len[j];
        const u1 = rx[ia] * tx[j] + ry[ia] * ty[j];
        const h = rx[ia] * nx[j] + ry[ia] * ny[j];
        const u2 = u1 + L;
        // Principal value on the panel itself: θ = 0 (the flat panel does not see itself).
        const theta = g === 0 && j === i ? 0 : panelAngle(h * L, u1 * u2 + h * h);
        if (bc[j] === 0) {
          a[row + j] += sg * theta; // −D_ij = +θ/2π
          const k = owner[j];
          if (k >= 0) {
            const s = -sg * (u2 * lnr[pb[j]] - u1 * lnr[ia] - L + h * theta); // S_ij
            const c0 = 3 * k * n + i;
            rhs[c0] -= s * q[3 * j];
            rhs[c0 + n] -= s * q[3 * j + 1];
            rhs[c0 + 2 * n] -= s * q[3 * j + 2];
          }
        } else {
          a[row + j] += -sg * (u2 * lnr[pb[j]] - u1 * lnr[ia] - L + h * theta); // +S_ij
        }
      }
    }
    if (bc[i] === 0) a[row + i] += 0.5;
    if (pin) for (let j = 0; j < n; j++) a[row + j] += len[j] / totalLen;
  }
}
