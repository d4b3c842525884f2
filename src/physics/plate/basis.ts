/**
 * One-direction Ritz basis on [0, L]: Legendre polynomials times a boundary factor that enforces the
 * geometric edge conditions, X_j(ξ) = (1 + ξ)^p0 (1 − ξ)^p1 P_j(ξ), ξ = 2x/L − 1, with p = 0 (free),
 * 1 (simply supported: w = 0) or 2 (clamped: w = w' = 0). Natural conditions (moment, shear at free
 * edges) are left to the energy functional, as in the Ritz method (A.W. Leissa, "The free vibration of
 * rectangular plates", J. Sound Vib. 31 (1973) 257; boundary-characteristic polynomials after
 * R.B. Bhat, J. Sound Vib. 102 (1985) 493). The raw functions are made orthonormal in ∫ X_i X_j dx by a
 * Cholesky factor of their Gram matrix, which keeps the plate mass matrix the identity and the
 * conditioning of high orders in hand.
 */
import { choleskyInPlace } from '../linalg/dense-cholesky';
import { gaussLegendre, legendreInto } from './gauss';
import type { EdgeCondition } from './types';

/** Boundary-factor power of an edge condition. */
export function edgePower(c: EdgeCondition): number {
  return c === 'clamped' ? 2 : c === 'simply-supported' ? 1 : 0;
}

export interface Basis1D {
  count: number;
  lengthM: number;
  p0: number;
  p1: number;
  /** Lower-triangular map to the orthonormal functions, row-major count×count: X̃_k = Σ_j t[k·count + j] X_j. */
  t: Float64Array;
}

/** Sampled functions: value, d/dx and d²/dx² of function k at point q, at `[k·points + q]`. */
export interface BasisSamples {
  points: number;
  v: Float64Array;
  d1: Float64Array;
  d2: Float64Array;
}

function powerParts(s: number, p: number): [number, number, number] {
  // s^p and its first two derivatives with respect to s, for p ∈ {0, 1, 2}.
  if (p === 0) return [1, 0, 0];
  if (p === 1) return [s, 1, 0];
  return [s * s, 2 * s, 2];
}

/** Raw (not orthonormalised) functions at physical points x, same layout as BasisSamples. */
function sampleRaw(count: number, lengthM: number, p0: number, p1: number, x: Float64Array): BasisSamples {
  const n = x.length;
  const v = new Float64Array(count * n);
  const d1 = new Float64Array(count * n);
  const d2 = new Float64Array(count * n);
  const p = new Float64Array(count);
  const dp = new Float64Array(count);
  const d2p = new Float64Array(count);
  const s = 2 / lengthM; // dξ/dx
  for (let q = 0; q < n; q++) {
    const xi = s * x[q] - 1;
    legendreInto(xi, count, p, dp, d2p);
    const [g, g1, g2] = powerParts(1 + xi, p0);
    const [h, hm1, h2] = powerParts(1 - xi, p1);
    const f = g * h;
    const f1 = g1 * h - g * hm1;
    const f2 = g2 * h - 2 * g1 * hm1 + g * h2;
    for (let j = 0; j < count; j++) {
      v[j * n + q] = f * p[j];
      d1[j * n + q] = s * (f1 * p[j] + f * dp[j]);
      d2[j * n + q] = s * s * (f2 * p[j] + 2 * f1 * dp[j] + f * d2p[j]);
    }
  }
  return { points: n, v, d1, d2 };
}

/** Quadrature on [0, L] exact for the products the energy needs (degree ≤ 2(count + 3)). */
export function basisQuadrature(count: number, lengthM: number): { x: Float64Array; w: Float64Array } {
  const rule = gaussLegendre(count + 5);
  const x = new Float64Array(rule.x.length);
  const w = new Float64Array(rule.x.length);
  for (let q = 0; q < x.length; q++) {
    x[q] = 0.5 * lengthM * (rule.x[q] + 1);
    w[q] = 0.5 * lengthM * rule.w[q];
  }
  return { x, w };
}

/** Builds the orthonormal basis; null if the Gram matrix is numerically singular (order too high). */
export function makeBasis(count: number, lengthM: number, start: EdgeCondition, end: EdgeCondition): Basis1D | null {
  const p0 = edgePower(start);
  const p1 = edgePower(end);
  const { x, w } = basisQuadrature(count, lengthM);
  const raw = sampleRaw(count, lengthM, p0, p1, x);
  const n = x.length;
  const l = new Float64Array(count * count);
  for (let i = 0; i < count; i++) {
    for (let j = 0; j <= i; j++) {
      let s = 0;
      for (let q = 0; q < n; q++) s += w[q] * raw.v[i * n + q] * raw.v[j * n + q];
      l[i * count + j] = s;
    }
  }
  // Cholesky G = L Lᵀ in place (lower triangle), then T = L⁻¹ by forward substitution.
  if (!choleskyInPlace(l, count, 1e-13)) return null;
  const t = new Float64Array(count * count);
  for (let c = 0; c < count; c++) {
    for (let i = c; i < count; i++) {
      let s = i === c ? 1 : 0;
      for (let k = c; k < i; k++) s -= l[i * count + k] * t[k * count + c];
      t[i * count + c] = s / l[i * count + i];
    }
  }
  return { count, lengthM, p0, p1, t };
}

/** The orthonormal functions at physical points x. */
export function sampleBasis(b: Basis1D, x: Float64Array): BasisSamples {
  const raw = sampleRaw(b.count, b.lengthM, b.p0, b.p1, x);
  const n = x.length;
  const out: BasisSamples = { points: n, v: new Float64Array(b.count * n), d1: new Float64Array(b.count * n), d2: new Float64Array(b.count * n) };
  for (const key of ['v', 'd1', 'd2'] as const) {
    const src = raw[key];
    const dst = out[key];
    for (let k = 0; k < b.count; k++) {
      for (let j = 0; j <= k; j++) {
        const c = b.t[k * b.count + j];
        if (c === 0) continue;
        for (let q = 0; q < n; q++) dst[k * n + q] += c * src[j * n + q];
      }
    }
  }
  return out;
}

/**
 * ∫ f_k g_m dx over a quadrature (weights w), row-major rows × cols, for sampled f (rows × points) and
 * g (cols × points), e.g. second derivatives against values, or basis functions against a Fourier series.
 */
export function integralMatrix(f: Float64Array, rows: number, g: Float64Array, cols: number, w: Float64Array): Float64Array {
  const n = w.length;
  const out = new Float64Array(rows * cols);
  // w·f once per row: (w_q f_kq) g_mq is the product as written left to right, so the sums are unchanged to the bit.
  const wf = new Float64Array(n);
  for (let k = 0; k < rows; k++) {
    for (let q = 0; q < n; q++) wf[q] = w[q] * f[k * n + q];
    for (let m = 0; m < cols; m++) {
      let s = 0;
      const gm = m * n;
      for (let q = 0; q < n; q++) s += wf[q] * g[gm + q];
      out[k * cols + m] = s;
    }
  }
  return out;
}
