/**
 * Added mass of a plate spanning a rectangular tank crosswise, by eigenfunction series in each compartment.
 * Tank coordinates: s across the width (0 … a, the plate's width; rigid side walls), z up from the floor
 * (rigid), free surface at z = d with φ = 0 (the high-frequency limit, valid well above sloshing), rigid end
 * wall at distance L from the plate. In a compartment the potential is
 *   φ = Σ A_mn cos(mπs/a) cos(γ_n z) cosh(k_mn (L − x)) / cosh(k_mn L),  γ_n = (2n − 1)π / (2d),
 *   k_mn² = (mπ/a)² + γ_n²,
 * (separation of variables, classical; e.g. H. Lamb, Hydrodynamics, 6th ed., §§ 71–72), so a normal
 * velocity v on the plate's plane x = 0 with coefficients c_mn on ψ_mn = cos(mπs/a) cos(γ_n z) gives
 * potential −Z v there and kinetic energy ½ρ v·Z v, Z = Σ ψ_mn ψ_mnᵀ / (N_mn k_mn tanh(k_mn L)),
 * N_mn = ∫∫ ψ_mn² = ε_m a d / 2 (ε_0 = 1, ε_m = ½).
 * When d ≤ b the plate covers the whole wetted section and each wetted side adds ρ Z on the plate.
 * When d > b liquid passes over the top edge: the velocity u through the gap b < z < d is unknown. Both
 * compartments see the face velocity v = w + u, the total energy is ½ρ v·(Z₁ + Z₂) v, and the true u makes it
 * stationary (continuity of potential across the gap; Kelvin's minimum-energy theorem). u is expanded in
 * cos(mπs/a) · P_q(2t − 1) / t with t = √((z − b)/(d − b)), which carries the edge singularity
 * u ~ (z − b)^(−1/2) of flow round a sharp edge, and eliminated by a Galerkin Schur complement:
 *   M_a = ρ [Z_ww − Z_wu Z_uu⁻¹ Z_uw].
 */
import { integralMatrix, sampleBasis } from './basis';
import { choleskyInPlace, choleskySolveInPlace } from '../linalg/dense-cholesky';
import type { Basis1D } from './basis';
import { gaussLegendre, legendreInto } from './gauss';

export interface TankGeometry {
  /** Plate width = tank width a, plate height b, liquid depth d (m). */
  widthM: number;
  heightM: number;
  depthM: number;
  /** Distance from the plate to the end wall of each wetted compartment (Infinity: very long). */
  reachesM: number[];
}

export interface TankResolution {
  widthTerms: number;
  depthTerms: number;
  gapTerms: number;
}

/** Composite Gauss–Legendre on [lo, hi]: `panels` panels of 12 points (for oscillating integrands). */
function composite(lo: number, hi: number, panels: number): { x: Float64Array; w: Float64Array } {
  const g = gaussLegendre(12);
  const x = new Float64Array(panels * 12);
  const w = new Float64Array(panels * 12);
  const h = (hi - lo) / panels;
  for (let p = 0; p < panels; p++) {
    for (let q = 0; q < 12; q++) {
      x[p * 12 + q] = lo + h * (p + 0.5 * (g.x[q] + 1));
      w[p * 12 + q] = 0.5 * h * g.w[q];
    }
  }
  return { x, w };
}

/**
 * Added-mass matrix (kg) on `count` plate shapes given as Ritz coefficients (`vectors`, mode k at
 * [k·bx.count·by.count …)), bases bx along the width and by up the height. null if the gap system is singular.
 */
export function tankAddedMass(bx: Basis1D, by: Basis1D, vectors: Float64Array, count: number, tank: TankGeometry, res: TankResolution, densityKgPerM3: number): Float64Array | null {
  const { widthM: a, heightM: b, depthM: d } = tank;
  const M = res.widthTerms;
  const N = res.depthTerms;
  const wet = Math.min(b, d);
  const nx = bx.count;
  const ny = by.count;
  // Width projections Px[k, m] = ∫ X_k cos(mπs/a) ds; height projections Py[l, n] = ∫_0^min(b,d) Y_l cos(γ_n z) dz.
  const qx = composite(0, a, Math.max(2, Math.ceil((nx + M) / 6)));
  const cosG = new Float64Array(M * qx.x.length);
  for (let m = 0; m < M; m++) for (let q = 0; q < qx.x.length; q++) cosG[m * qx.x.length + q] = Math.cos((m * Math.PI * qx.x[q]) / a);
  const px = integralMatrix(sampleBasis(bx, qx.x).v, nx, cosG, M, qx.w);
  const gamma = new Float64Array(N);
  for (let n = 0; n < N; n++) gamma[n] = ((2 * n + 1) * Math.PI) / (2 * d);
  const qy = composite(0, wet, Math.max(2, Math.ceil((ny + N) / 6)));
  const cosZ = new Float64Array(N * qy.x.length);
  for (let n = 0; n < N; n++) for (let q = 0; q < qy.x.length; q++) cosZ[n * qy.x.length + q] = Math.cos(gamma[n] * qy.x[q]);
  const py = integralMatrix(sampleBasis(by, qy.x).v, ny, cosZ, N, qy.w);
  // Modal projections P[i][m·N + n] = Σ_kl c_kl Px[k, m] Py[l, n].
  const P = new Float64Array(count * M * N);
  const tmp = new Float64Array(nx * N);
  for (let i = 0; i < count; i++) {
    const c = vectors.subarray(i * nx * ny, (i + 1) * nx * ny);
    tmp.fill(0);
    for (let k = 0; k < nx; k++) for (let l = 0; l < ny; l++) {
      const ckl = c[k * ny + l];
      for (let n = 0; n < N; n++) tmp[k * N + n] += ckl * py[l * N + n];
    }
    for (let m = 0; m < M; m++) for (let n = 0; n < N; n++) {
      let s = 0;
      for (let k = 0; k < nx; k++) s += px[k * M + m] * tmp[k * N + n];
      P[i * M * N + m * N + n] = s;
    }
  }
  // Compliance of the wetted compartments z̄_mn = Σ_sides 1/(N_mn k_mn tanh(k_mn L)).
  const zbar = new Float64Array(M * N);
  for (let m = 0; m < M; m++) for (let n = 0; n < N; n++) {
    const k = Math.hypot((m * Math.PI) / a, gamma[n]);
    const norm = (m === 0 ? 1 : 0.5) * a * (d / 2);
    let s = 0;
    for (const L of tank.reachesM) s += 1 / (norm * k * (Number.isFinite(L) ? Math.tanh(k * L) : 1));
    zbar[m * N + n] = s;
  }
  const out = new Float64Array(count * count);
  for (let i = 0; i < count; i++) for (let j = 0; j <= i; j++) {
    let s = 0;
    for (let r = 0; r < M * N; r++) s += P[i * M * N + r] * P[j * M * N + r] * zbar[r];
    out[i * count + j] = s;
  }
  if (d > b) {
    const Q = res.gapTerms;
    // Gap projections G[q, n] = ∫_b^d u_q cos(γ_n z) dz = 2(d − b) ∫_0^1 P_q(2t − 1) cos(γ_n (b + (d − b) t²)) dt.
    const qt = composite(0, 1, Math.max(4, Math.ceil(N / 3)));
    const pl = new Float64Array(Q);
    const dpl = new Float64Array(Q);
    const d2pl = new Float64Array(Q);
    const G = new Float64Array(Q * N);
    for (let q = 0; q < qt.x.length; q++) {
      const t = qt.x[q];
      legendreInto(2 * t - 1, Q, pl, dpl, d2pl);
      const z = b + (d - b) * t * t;
      for (let n = 0; n < N; n++) {
        const sn = 2 * (d - b) * qt.w[q] * Math.cos(gamma[n] * z);
        for (let p = 0; p < Q; p++) G[p * N + n] += pl[p] * sn;
      }
    }
    const S = new Float64Array(Q * Q);
    const R = new Float64Array(Q * count);
    for (let m = 0; m < M; m++) {
      const am = (m === 0 ? 1 : 0.5) * a; // ∫ cos² (mπs/a) ds
      S.fill(0);
      R.fill(0);
      for (let p = 0; p < Q; p++) {
        for (let p2 = 0; p2 < Q; p2++) {
          let s = 0;
          for (let n = 0; n < N; n++) s += G[p * N + n] * G[p2 * N + n] * zbar[m * N + n];
          S[p * Q + p2] = am * am * s;
        }
        for (let i = 0; i < count; i++) {
          let s = 0;
          for (let n = 0; n < N; n++) s += G[p * N + n] * P[i * M * N + m * N + n] * zbar[m * N + n];
          R[p * count + i] = am * s;
        }
      }
      const X = Float64Array.from(R);
      if (!choleskyInPlace(S, Q)) return null;
      choleskySolveInPlace(S, Q, X, count);
      for (let i = 0; i < count; i++) for (let j = 0; j <= i; j++) {
        let s = 0;
        for (let p = 0; p < Q; p++) s += R[p * count + i] * X[p * count + j];
        out[i * count + j] -= s;
      }
    }
  }
  for (let i = 0; i < count; i++) for (let j = 0; j <= i; j++) {
    out[i * count + j] *= densityKgPerM3;
    out[j * count + i] = out[i * count + j];
  }
  return out;
}
