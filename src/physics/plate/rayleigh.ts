/**
 * Added mass of a plate set in an infinite rigid plane wall (baffle), liquid on one face, by the Rayleigh
 * integral: the potential of a baffled surface moving with normal velocity v is
 *   φ(P) = (1/2π) ∫∫ v(Q) / |P − Q| dA_Q
 * (Lord Rayleigh, The Theory of Sound, vol. II, §278), so the liquid's kinetic energy gives, on shape
 * functions w_i, M_a,ij = ρ ∫∫ w_i(P) ∫∫ w_j(Q) / (2π |P − Q|) dA_Q dA_P.
 * Discretisation: shapes piecewise constant on a uniform grid of cells, the inner integral over each cell
 * taken exactly (closed form of ∫∫ dA / √(x² + y² + z²) over a rectangle) for near cells and by the
 * midpoint rule for far ones; the outer integral by the midpoint rule.
 * A parallel rigid wall at distance L closes the liquid: Neumann images at heights 2nL (n = ±1, ±2, …), each
 * pair regularised by subtracting its far-field value 2/(2nL) so the series converges (terms ~ r²/n³). The
 * layer's Neumann Green's function is defined only up to a constant, which prices the motion that displaces
 * volume along the gap: far from the source the regularised sum behaves as (1/2πL) ln(4e^(−γ)L / r) (γ Euler's
 * constant; Euler–Maclaurin on Σ 1/√(n² + x²) − 1/n), i.e. as if the layer drained at r = 2.25 L. The constant
 * (1/2πL) ln(R / 2.25 L) moves that drain to R = max(2.25 L, panel diagonal); see `IMAGE_NOTE`.
 */

export const IMAGE_NOTE =
  'Closing wall by the method of images (Neumann images at 2nL), each image pair less its far-field constant so the series converges; ' +
  'liquid pushed along the gap is taken to escape (to open liquid or a free surface) at one panel diagonal or 2.25 reaches from the panel, ' +
  'whichever is larger. Where the gap is closed further out, a motion that displaces volume meets more added mass than this.';

/** 4 e^(−γ): the regularised image sum vanishes at r = this × L (γ = Euler's constant 0.5772…). */
const DRAIN_FACTOR = 4 * Math.exp(-0.5772156649015329);

/** ∫_0^X ∫_0^Y dx dy / √(x² + y² + z²) for X, Y, z ≥ 0 (vanishes when X or Y is 0). */
function quadrantIntegral(X: number, Y: number, z: number): number {
  if (X === 0 || Y === 0) return 0;
  const R = Math.sqrt(X * X + Y * Y + z * z);
  let s = X * Math.log((Y + R) / Math.sqrt(X * X + z * z)) + Y * Math.log((X + R) / Math.sqrt(Y * Y + z * z));
  if (z > 0) s -= z * Math.atan((X * Y) / (z * R));
  return s;
}

/** ∫∫ over [x1, x2] × [y1, y2] of dA / √(x² + y² + z²), the field point at the origin, height z ≥ 0 above the plane. */
export function rectangleInverseDistance(x1: number, x2: number, y1: number, y2: number, z: number): number {
  const h = (x: number, y: number) => Math.sign(x) * Math.sign(y) * quadrantIntegral(Math.abs(x), Math.abs(y), z);
  return h(x2, y2) - h(x1, y2) - h(x2, y1) + h(x1, y1);
}

/** Cells within this many cells of the field point (in the larger offset) are integrated exactly. */
const NEAR = 4;

/** Influence of a cell at offset (di, dj) cells, image height z: ∫∫_cell dA / (2π R). */
function cellInfluence(di: number, dj: number, dx: number, dy: number, z: number): number {
  const cx = di * dx;
  const cy = dj * dy;
  // Exact cell integral where 1/R varies strongly over the cell; the midpoint rule elsewhere (error ~ (h/R)²/24).
  const near = Math.max(di, dj) <= NEAR && z < 4 * Math.hypot(dx, dy);
  if (!near) return (dx * dy) / (2 * Math.PI * Math.sqrt(cx * cx + cy * cy + z * z));
  return rectangleInverseDistance(cx - dx / 2, cx + dx / 2, cy - dy / 2, cy + dy / 2, z) / (2 * Math.PI);
}

/**
 * Influence table of a gx × gy grid of cells dx × dy, `[di·gy + dj]` for offsets 0 ≤ di < gx, 0 ≤ dj < gy:
 * the potential at a cell centre from unit normal velocity on a cell that far away (m).
 */
export function influenceTable(gx: number, gy: number, dx: number, dy: number, reachM?: number): Float64Array {
  const t = new Float64Array(gx * gy);
  const diag = Math.hypot(gx * dx, gy * dy);
  const images = reachM === undefined ? 0 : Math.min(4000, Math.ceil((30 * diag) / (2 * reachM)));
  const drain = reachM === undefined ? 0 : ((dx * dy) / (2 * Math.PI * reachM)) * Math.log(Math.max(1, diag / (DRAIN_FACTOR * reachM)));
  for (let di = 0; di < gx; di++) {
    for (let dj = 0; dj < gy; dj++) {
      let s = cellInfluence(di, dj, dx, dy, 0);
      if (reachM !== undefined) {
        const r2 = (di * dx) ** 2 + (dj * dy) ** 2;
        for (let n = 1; n <= images; n++) {
          const z = 2 * n * reachM;
          s += 2 * (cellInfluence(di, dj, dx, dy, z) - (dx * dy) / (2 * Math.PI * z));
        }
        // Tail n > N: 2[1/√(r² + z²) − 1/z] ≈ −r²/z³, summed ≈ −r² / (8 L³ · 2N²), times dA/2π.
        s -= ((dx * dy) / (2 * Math.PI)) * (r2 / (8 * reachM ** 3 * 2 * images * images));
      }
      t[di * gy + dj] = s + drain;
    }
  }
  return t;
}

/**
 * Added-mass matrix (kg, on the given shapes) for one wetted face: shapes[i] holds shape i at the cell
 * centres, layout `[iy·gx + ix]`; ρ the liquid density. Row-major count × count, symmetric.
 */
export function rayleighAddedMass(shapes: Float64Array[], gx: number, gy: number, dx: number, dy: number, densityKgPerM3: number, reachM?: number): Float64Array {
  const table = influenceTable(gx, gy, dx, dy, reachM);
  const count = shapes.length;
  // The uniform grid is symmetric about both mid-lines and so is κ, so a shape's four parity parts
  // w^(sx,sy) (even or odd in x, in y) give potentials of the same parity and no cross terms in the energy:
  // each part is convolved on one quarter of the grid with the kernel folded over its mirror images, a quarter
  // of the work of the full convolution, whatever the plate's edges.
  const hx = (gx + 1) >> 1;
  const hy = (gy + 1) >> 1;
  const quarter = hx * hy;
  const F = new Float64Array(quarter * quarter);
  const W = new Float64Array(quarter * count);
  const U = new Float64Array(quarter * count);
  const weight = new Float64Array(quarter); // how many grid cells each quarter cell stands for
  for (let py = 0; py < hy; py++) for (let px = 0; px < hx; px++) weight[py * hx + px] = (2 * px + 1 === gx ? 1 : 2) * (2 * py + 1 === gy ? 1 : 2);
  const out = new Float64Array(count * count);
  for (let part = 0; part < 4; part++) {
    const sx = part & 2 ? -1 : 1;
    const sy = part & 1 ? -1 : 1;
    // F[P·quarter + Q] = Σ over the distinct mirror images Q' of Q of (sign) κ(P, Q').
    for (let py = 0; py < hy; py++) for (let px = 0; px < hx; px++) {
      const row = (py * hx + px) * quarter;
      for (let qy = 0; qy < hy; qy++) {
        const my = gy - 1 - qy;
        const dy0 = Math.abs(py - qy);
        const dy1 = Math.abs(py - my);
        for (let qx = 0; qx < hx; qx++) {
          const mx = gx - 1 - qx;
          const c0 = Math.abs(px - qx) * gy;
          const c1 = Math.abs(px - mx) * gy;
          let v = table[c0 + dy0];
          if (mx !== qx) v += sx * table[c1 + dy0];
          if (my !== qy) {
            v += sy * table[c0 + dy1];
            if (mx !== qx) v += sx * sy * table[c1 + dy1];
          }
          F[row + qy * hx + qx] = v;
        }
      }
    }
    // The parity part of each shape on the quarter, W[Q·count + j] = ¼ Σ (sign) w_j(mirror of Q).
    for (let j = 0; j < count; j++) {
      const w = shapes[j];
      for (let qy = 0; qy < hy; qy++) for (let qx = 0; qx < hx; qx++) {
        const mx = gx - 1 - qx;
        const a = qy * gx;
        const b = (gy - 1 - qy) * gx;
        W[(qy * hx + qx) * count + j] = 0.25 * (w[a + qx] + sx * w[a + mx] + sy * (w[b + qx] + sx * w[b + mx]));
      }
    }
    // U = F W: the potential of each part at the quarter's cell centres.
    U.fill(0);
    for (let P = 0; P < quarter; P++) {
      const row = P * quarter;
      const at = P * count;
      for (let Q = 0; Q < quarter; Q++) {
        const f = F[row + Q];
        const from = Q * count;
        for (let j = 0; j < count; j++) U[at + j] += f * W[from + j];
      }
    }
    for (let P = 0; P < quarter; P++) {
      const at = P * count;
      const mu = weight[P];
      for (let i = 0; i < count; i++) {
        const wi = mu * W[at + i];
        if (wi === 0) continue;
        for (let j = 0; j <= i; j++) out[i * count + j] += wi * U[at + j];
      }
    }
  }
  const scale = densityKgPerM3 * dx * dy;
  for (let i = 0; i < count; i++) for (let j = 0; j <= i; j++) {
    out[i * count + j] *= scale;
    out[j * count + i] = out[i * count + j];
  }
  return out;
}
