/**
 * Independent check for the across-tank added mass, written for the tests: a cell-centred finite-volume
 * Laplace solve of the whole tank (both compartments, the plate a zero-thickness moving wall on the plane
 * x = 0 below its top edge, free surface φ = 0 by a mirrored ghost cell, all other walls rigid), solved by
 * Jacobi-preconditioned conjugate gradients. Added mass on a shape w: m = ρ Σ φ·(v·n)·A over the plate
 * faces (kinetic energy ½ρ ∮ φ ∂φ/∂n dS with unit amplitude; H. Lamb, Hydrodynamics, §44).
 * Second order in the cell size away from the plate's top edge; use two grids for an estimate.
 */
export interface FvTank {
  widthM: number;
  heightM: number;
  depthM: number;
  reachM: number;
  /** Cells per metre (same in every direction). */
  cellsPerM: number;
}

/** Added mass (kg per unit density) of the velocity shape w(s, z) on the plate, liquid on both sides. */
export function finiteVolumeAddedMass(t: FvTank, w: (s: number, z: number) => number): number {
  const h = 1 / t.cellsPerM;
  const nx = Math.round((2 * t.reachM) / h);
  const ns = Math.round(t.widthM / h);
  const nz = Math.round(t.depthM / h);
  const plateCells = Math.round(t.heightM / h); // cells in z covered by the plate
  const n = nx * ns * nz;
  const id = (i: number, j: number, k: number) => (i * ns + j) * nz + k;
  const mid = nx / 2; // plate between cell mid−1 and mid
  const diag = new Float64Array(n);
  const b = new Float64Array(n);
  for (let i = 0; i < nx; i++) for (let j = 0; j < ns; j++) for (let k = 0; k < nz; k++) {
    const c = id(i, j, k);
    let d = 0;
    if (i > 0 && !(i === mid && k < plateCells)) d += 1;
    if (i < nx - 1 && !(i === mid - 1 && k < plateCells)) d += 1;
    if (j > 0) d += 1;
    if (j < ns - 1) d += 1;
    if (k > 0) d += 1;
    d += k < nz - 1 ? 1 : 2; // free surface: φ = 0 half a cell above the top cell centre
    diag[c] = d;
    if (k < plateCells && (i === mid - 1 || i === mid)) {
      const v = w((j + 0.5) * h, (k + 0.5) * h);
      // Σ (φ_c − φ_nb)/h · A = A · (∂φ/∂n on the plate face, outward from the liquid): +v left, −v right.
      b[c] = (i === mid - 1 ? v : -v) * h;
    }
  }
  const apply = (x: Float64Array, y: Float64Array) => {
    for (let i = 0; i < nx; i++) for (let j = 0; j < ns; j++) for (let k = 0; k < nz; k++) {
      const c = id(i, j, k);
      let s = diag[c] * x[c];
      if (i > 0 && !(i === mid && k < plateCells)) s -= x[id(i - 1, j, k)];
      if (i < nx - 1 && !(i === mid - 1 && k < plateCells)) s -= x[id(i + 1, j, k)];
      if (j > 0) s -= x[id(i, j - 1, k)];
      if (j < ns - 1) s -= x[id(i, j + 1, k)];
      if (k > 0) s -= x[id(i, j, k - 1)];
      if (k < nz - 1) s -= x[id(i, j, k + 1)];
      y[c] = s;
    }
  };
  const x = new Float64Array(n);
  const r = Float64Array.from(b);
  const z = new Float64Array(n);
  const p = new Float64Array(n);
  const q = new Float64Array(n);
  for (let c = 0; c < n; c++) z[c] = r[c] / diag[c];
  p.set(z);
  let rz = 0;
  for (let c = 0; c < n; c++) rz += r[c] * z[c];
  const b2 = rz;
  for (let it = 0; it < 5000 && rz > 1e-24 * b2; it++) {
    apply(p, q);
    let pq = 0;
    for (let c = 0; c < n; c++) pq += p[c] * q[c];
    const alpha = rz / pq;
    for (let c = 0; c < n; c++) {
      x[c] += alpha * p[c];
      r[c] -= alpha * q[c];
      z[c] = r[c] / diag[c];
    }
    let rz2 = 0;
    for (let c = 0; c < n; c++) rz2 += r[c] * z[c];
    const beta = rz2 / rz;
    rz = rz2;
    for (let c = 0; c < n; c++) p[c] = z[c] + beta * p[c];
  }
  // Per cell the flux balance Σ_faces h² ∂φ/∂n = 0 reads Σ (φ_c − φ_nb) = h (v·n) after dividing by h: x is φ.
  let m = 0;
  for (let j = 0; j < ns; j++) for (let k = 0; k < plateCells; k++) {
    const v = w((j + 0.5) * h, (k + 0.5) * h);
    m += (x[id(mid - 1, j, k)] * v - x[id(mid, j, k)] * v) * h * h;
  }
  return m;
}
