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

/**
 * Scratch arrays for one row of the assembly, image by image: for image g and node k, at g·nodeCount + k,
 * the offset from the image of the collocation point to the node and ln of its length. Allocate once per
 * panel set size and image count.
 */
export interface AssemblyWork {
  rx: Float64Array;
  ry: Float64Array;
  lnr: Float64Array;
}

export function createAssemblyWork(nodeCount: number, imageCount = 1): AssemblyWork {
  const size = nodeCount * imageCount;
  return { rx: new Float64Array(size), ry: new Float64Array(size), lnr: new Float64Array(size) };
}

/**
 * Everything one row of the assembly needs, prepared once per panel set: the panels, the image group
 * (weights sign/2π), the rigid normal velocities and the scratch of `AssemblyWork`.
 */
export interface RowAssembly {
  P: PanelSet;
  group: readonly ImageMap[];
  q: Float64Array;
  bodyCount: number;
  /** Pin weight per column (panel length over the total), or null without the pin. */
  pinWeights: Float64Array | null;
  signs: Float64Array;
  work: AssemblyWork;
}

/** Prepares the rows of the assembly (see `assembleInto` for `pin`). */
export function rowAssembly(
  P: PanelSet,
  group: readonly ImageMap[],
  q: Float64Array,
  bodyCount: number,
  pin: boolean,
  work: AssemblyWork,
): RowAssembly {
  const n = P.count;
  const images = group.length;
  if (work.rx.length < images * P.nodeCount) Object.assign(work, createAssemblyWork(P.nodeCount, images));
  const signs = new Float64Array(images);
  for (let g = 0; g < images; g++) signs[g] = group[g].sign * INV_2PI;
  let pinWeights: Float64Array | null = null;
  if (pin) {
    let totalLen = 0;
    for (let j = 0; j < n; j++) totalLen += P.len[j];
    pinWeights = new Float64Array(n);
    for (let j = 0; j < n; j++) pinWeights[j] = P.len[j] / totalLen;
  }
  return { P, group, q, bodyCount, pinWeights, signs, work };
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
  const m3 = 3 * bodyCount;
  const ra = rowAssembly(P, group, q, bodyCount, pin, work);
  const acc = new Float64Array(m3);
  for (let i = 0; i < n; i++) {
    assembleRow(ra, i, a, i * n, acc, null, null);
    for (let c = 0; c < m3; c++) rhs[c * n + i] = acc[c];
  }
}

/**
 * Row i of the matrix into `out[offset … offset + n)` and its right-hand sides into `acc` (one per motion).
 * With a panel permutation `mirror` (σ, mirror.ts), `accMirror` receives the right-hand sides of row σ(i),
 * −Σ_j S_ij q_σ(j), from the same panel integrals (S_{σi,j} = S_{i,σj}).
 *
 * Speed: a panel's data (ends, tangent, normal, length, kind, owner, rigid normal velocities) is loaded
 * once per row for all images together (a wall image of panel j is panel j seen from the reflected
 * point), the row is written once per entry, and the right-hand sides are summed in the small `acc`.
 * The matrix entries are the same sums in the same order as image by image; the right-hand sides add the
 * images' S_ij before multiplying by q_j, a round-off-level change.
 */
export function assembleRow(
  ra: RowAssembly,
  i: number,
  out: Float64Array,
  offset: number,
  acc: Float64Array,
  mirror: Int32Array | null,
  accMirror: Float64Array | null,
): void {
  const { P, group, q, pinWeights, signs: sgs, work } = ra;
  const n = P.count;
  const { nodeX, nodeY, pa, pb, tx, ty, nx, ny, len, bc, owner, mx, my } = P;
  const nodeCount = P.nodeCount;
  const images = group.length;
  const { rx, ry, lnr } = work;
  acc.fill(0);
  if (accMirror) accMirror.fill(0);
  for (let g = 0; g < images; g++) {
    const G = group[g];
    const x = G.m00 * mx[i] + G.m01 * my[i] + G.c0;
    const y = G.m10 * mx[i] + G.m11 * my[i] + G.c1;
    const off = g * nodeCount;
    for (let k = 0; k < nodeCount; k++) {
      const dx = nodeX[k] - x;
      const dy = nodeY[k] - y;
      const r2 = dx * dx + dy * dy;
      rx[off + k] = dx;
      ry[off + k] = dy;
      lnr[off + k] = r2 > 0 ? 0.5 * Math.log(r2) : 0;
    }
  }
  for (let j = 0; j < n; j++) {
    const ia = pa[j];
    const ib = pb[j];
    const L = len[j];
    const tjx = tx[j];
    const tjy = ty[j];
    const njx = nx[j];
    const njy = ny[j];
    const neumann = bc[j] === 0;
    const k = owner[j];
    // S_ij is needed on Dirichlet panels (matrix) and on body panels (right-hand sides), not on Neumann walls.
    const needS = !neumann || k >= 0;
    let v = 0;
    let sSum = 0;
    for (let g = 0, off = 0; g < images; g++, off += nodeCount) {
      const sg = sgs[g];
      const ax = rx[off + ia];
      const ay = ry[off + ia];
      const u1 = ax * tjx + ay * tjy;
      const h = ax * njx + ay * njy;
      const u2 = u1 + L;
      // Principal value on the panel itself: θ = 0 (the flat panel does not see itself).
      const theta = g === 0 && j === i ? 0 : panelAngle(h * L, u1 * u2 + h * h);
      const s = needS ? -sg * (u2 * lnr[off + ib] - u1 * lnr[off + ia] - L + h * theta) : 0; // S_ij
      if (neumann) {
        v += sg * theta; // −D_ij = +θ/2π
        sSum += s;
      } else {
        v += s; // +S_ij
      }
    }
    out[offset + j] = v;
    if (neumann && k >= 0) {
      const c = 3 * k;
      const qj = 3 * j;
      acc[c] -= sSum * q[qj];
      acc[c + 1] -= sSum * q[qj + 1];
      acc[c + 2] -= sSum * q[qj + 2];
      if (mirror && accMirror) {
        const js = mirror[j];
        const cs = 3 * owner[js];
        const qs = 3 * js;
        accMirror[cs] -= sSum * q[qs];
        accMirror[cs + 1] -= sSum * q[qs + 1];
        accMirror[cs + 2] -= sSum * q[qs + 2];
      }
    }
  }
  if (bc[i] === 0) out[offset + i] += 0.5;
  if (pinWeights) for (let j = 0; j < n; j++) out[offset + j] += pinWeights[j];
}
