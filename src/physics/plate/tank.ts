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
import { hypot2 } from '../linalg/hypot';

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
 * cos((2n + 1)θ) for n = 0 … count − 1 into `out`, by the recurrence c_(n+1) = 2 cos 2θ · c_n − c_(n−1)
 * (c_(−1) = cos θ; classical, Chebyshev's three-term recurrence). A perturbation grows at most linearly
 * along it, so after the 144 terms used here the error stays near 144² ε ≈ 1e-12, and it replaces 144 calls
 * of Math.cos per quadrature point.
 */
function oddCosines(theta: number, count: number, out: Float64Array): void {
  const c1 = Math.cos(theta);
  const twoC2 = 2 * Math.cos(2 * theta);
  let prev = c1;
  let cur = c1;
  out[0] = c1;
  for (let n = 1; n < count; n++) {
    const next = twoC2 * cur - prev;
    prev = cur;
    cur = next;
    out[n] = cur;
  }
}

/**
 * Scratch for the largest per-solve arrays (the projections P, the depth cosines, the gap projections), kept
 * between calls so a first solve does not hand the garbage collector about a megabyte each time. The core
 * runs on one thread and this function does not re-enter; nothing returned aliases these arrays.
 */
const scratch = { p: new Float64Array(0), cosZ: new Float64Array(0), g: new Float64Array(0) };

/** The first `length` entries of scratch array `key`, zeroed (grown when too short). */
function zeroedScratch(key: keyof typeof scratch, length: number): Float64Array {
  if (scratch[key].length < length) scratch[key] = new Float64Array(length);
  const a = scratch[key].subarray(0, length);
  a.fill(0);
  return a;
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
  // Equal edge factors at both ends make X_k of parity (−1)^k about the mid-width, and cos(mπs/a) has parity (−1)^m:
  // their integral vanishes when k + m is odd. Written as exact zeros, a mode of one parity (the dry solve gives
  // those exactly) then has whole blocks m of P equal to zero, skipped below.
  if (bx.p0 === bx.p1) for (let k = 0; k < nx; k++) for (let m = (k + 1) & 1; m < M; m += 2) px[k * M + m] = 0;
  const gamma = new Float64Array(N);
  for (let n = 0; n < N; n++) gamma[n] = ((2 * n + 1) * Math.PI) / (2 * d);
  const qy = composite(0, wet, Math.max(2, Math.ceil((ny + N) / 6)));
  const nqy = qy.x.length;
  const cosZ = zeroedScratch('cosZ', N * nqy);
  const cz = new Float64Array(N);
  for (let q = 0; q < nqy; q++) {
    oddCosines(gamma[0] * qy.x[q], N, cz);
    for (let n = 0; n < N; n++) cosZ[n * nqy + q] = cz[n];
  }
  const py = integralMatrix(sampleBasis(by, qy.x).v, ny, cosZ, N, qy.w);
  // Compliance of the wetted compartments z̄_mn = Σ_sides 1/(N_mn k_mn tanh(k_mn L)), kept as √z̄ (z̄ > 0) so the
  // quadratic forms below are plain dot products of weighted projections.
  const root = new Float64Array(M * N);
  for (let m = 0; m < M; m++) for (let n = 0; n < N; n++) {
    const k = hypot2((m * Math.PI) / a, gamma[n]);
    const norm = (m === 0 ? 1 : 0.5) * a * (d / 2);
    let s = 0;
    for (const L of tank.reachesM) s += 1 / (norm * k * (Number.isFinite(L) ? Math.tanh(k * L) : 1));
    root[m * N + n] = Math.sqrt(s);
  }
  // Weighted modal projections P[i][m·N + n] = √z̄_mn Σ_kl c_kl Px[k, m] Py[l, n], contracted over k first
  // (T[m, l] = Σ_k c_kl Px[k, m]: nx·ny·M products, then M·ny·N).
  const MN = M * N;
  const P = zeroedScratch('p', count * MN);
  const T = new Float64Array(M * ny);
  for (let i = 0; i < count; i++) {
    const c = vectors.subarray(i * nx * ny, (i + 1) * nx * ny);
    T.fill(0);
    for (let k = 0; k < nx; k++) for (let l = 0; l < ny; l++) {
      const ckl = c[k * ny + l];
      if (ckl === 0) continue;
      for (let m = 0; m < M; m++) T[m * ny + l] += ckl * px[k * M + m];
    }
    const row = i * MN;
    for (let m = 0; m < M; m++) {
      for (let l = 0; l < ny; l++) {
        const t = T[m * ny + l];
        if (t === 0) continue;
        const pyRow = l * N;
        const at = row + m * N;
        for (let n = 0; n < N; n++) P[at + n] += t * py[pyRow + n];
      }
    }
    for (let r = 0; r < MN; r++) P[row + r] *= root[r];
  }
  // live[i·M + m]: block m of mode i's projections is not all zero.
  const live = new Uint8Array(count * M);
  for (let i = 0; i < count; i++) for (let m = 0; m < M; m++) {
    const at = i * MN + m * N;
    for (let n = 0; n < N; n++) if (P[at + n] !== 0) { live[i * M + m] = 1; break; }
  }
  const out = new Float64Array(count * count);
  for (let i = 0; i < count; i++) for (let j = 0; j <= i; j++) {
    let s = 0;
    for (let m = 0; m < M; m++) {
      if (!live[i * M + m] || !live[j * M + m]) continue;
      const ri = i * MN + m * N;
      const rj = j * MN + m * N;
      for (let n = 0; n < N; n++) s += P[ri + n] * P[rj + n];
    }
    out[i * count + j] = s;
  }
  if (d > b) {
    const Q = res.gapTerms;
    // Gap projections G[q, n] = ∫_b^d u_q cos(γ_n z) dz = 2(d − b) ∫_0^1 P_q(2t − 1) cos(γ_n (b + (d − b) t²)) dt.
    const qt = composite(0, 1, Math.max(4, Math.ceil(N / 3)));
    const pl = new Float64Array(Q);
    const dpl = new Float64Array(Q);
    const d2pl = new Float64Array(Q);
    const G = zeroedScratch('g', Q * N);
    for (let q = 0; q < qt.x.length; q++) {
      const t = qt.x[q];
      legendreInto(2 * t - 1, Q, pl, dpl, d2pl);
      const z = b + (d - b) * t * t;
      oddCosines(gamma[0] * z, N, cz);
      const wq = 2 * (d - b) * qt.w[q];
      for (let p = 0; p < Q; p++) {
        const f = wq * pl[p];
        const gRow = p * N;
        for (let n = 0; n < N; n++) G[gRow + n] += f * cz[n];
      }
    }
    const S = new Float64Array(Q * Q);
    const R = new Float64Array(Q * count);
    const X = new Float64Array(Q * count);
    const Gm = new Float64Array(Q * N);
    for (let m = 0; m < M; m++) {
      const am = (m === 0 ? 1 : 0.5) * a; // ∫ cos² (mπs/a) ds
      // Gm[p, n] = am √z̄_mn G[p, n], so S = Gm Gmᵀ and R = Gm Pᵀ over this m's block of P.
      for (let p = 0; p < Q; p++) for (let n = 0; n < N; n++) Gm[p * N + n] = am * root[m * N + n] * G[p * N + n];
      for (let p = 0; p < Q; p++) {
        const gp = p * N;
        for (let p2 = 0; p2 <= p; p2++) {
          let s = 0;
          const gq = p2 * N;
          for (let n = 0; n < N; n++) s += Gm[gp + n] * Gm[gq + n];
          S[p * Q + p2] = s;
          S[p2 * Q + p] = s;
        }
        for (let i = 0; i < count; i++) {
          let s = 0;
          const at = i * MN + m * N;
          if (!live[i * M + m]) {
            R[p * count + i] = 0;
            continue;
          }
          for (let n = 0; n < N; n++) s += Gm[gp + n] * P[at + n];
          R[p * count + i] = s;
        }
      }
      X.set(R);
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
