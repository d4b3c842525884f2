/**
 * Timoshenko beam element (shear deformation and rotary inertia) with interdependent interpolation:
 * w cubic and the section rotation ψ quadratic, tied together by the exact static solution of a uniform
 * Timoshenko element, whose shear force is constant (A. Tessler & S.B. Dong, Comput. Struct. 14 (1981);
 * Z. Friedman & J.B. Kosmatka, Comput. Struct. 47 (1993) 473). The element is free of shear locking and
 * reduces to the Hermite cubic as the shear flexibility s = EI/(κGA) → 0. The interpolation uses s at the
 * element midpoint; all integrals are then evaluated with the properties at the Gauss points, so a tapered
 * member is still a conforming Rayleigh–Ritz model whose frequencies converge from above. The shear strain
 * is constant within an element, so frequencies converge like h² (measured), not h⁴ as for the Hermite
 * element: the refinement loop simply doubles a little further.
 * Local DOFs [w1, ψ1, w2, ψ2]; γ = w′ − ψ is the shear strain.
 */
import { GAUSS_N, GAUSS_W, GAUSS_XI } from './element';

/** Property samples at the 5 Gauss points of one element. */
export interface TimoshenkoSamples {
  ei: Float64Array;
  kga: Float64Array;
  mass: Float64Array;
  rotary: Float64Array;
  added: Float64Array;
  soil: Float64Array;
  /** Tension samples and the offset of this element's first one. */
  tension: Float64Array;
  tensionOffset: number;
}

/** Outputs (4×4 row-major, added to): stiffness, geometric stiffness, mass, added mass. */
export interface TimoshenkoOut {
  k: Float64Array;
  kg: Float64Array;
  m: Float64Array;
  ma: Float64Array;
}

const coef = new Float64Array(16); // C: polynomial coefficients a_i (row) per unit nodal DOF j (column)
const a = new Float64Array(32); // augmented [A | I] for Gauss–Jordan
const nw = new Float64Array(4);
const dnw = new Float64Array(4);
const npsi = new Float64Array(4);
const dnpsi = new Float64Array(4);
const gam = new Float64Array(4);

/** C = A⁻¹, A mapping a = [a0..a3] of w = Σ a_i x^i, ψ = a1 + 6 s a3 + 2 a2 x + 3 a3 x² to nodal DOFs. */
function coefficients(h: number, s: number): void {
  // Rows of A, then the identity, written straight into the work array (no nested arrays per element).
  a.fill(0);
  a[0] = 1;
  a[9] = 1;
  a[11] = 6 * s;
  a[16] = 1;
  a[17] = h;
  a[18] = h * h;
  a[19] = h * h * h;
  a[25] = 1;
  a[26] = 2 * h;
  a[27] = 3 * h * h + 6 * s;
  for (let i = 0; i < 4; i++) a[i * 8 + 4 + i] = 1;
  for (let col = 0; col < 4; col++) {
    let piv = col;
    for (let r = col + 1; r < 4; r++) if (Math.abs(a[r * 8 + col]) > Math.abs(a[piv * 8 + col])) piv = r;
    if (piv !== col) for (let j = 0; j < 8; j++) [a[col * 8 + j], a[piv * 8 + j]] = [a[piv * 8 + j], a[col * 8 + j]];
    const p = a[col * 8 + col];
    for (let j = 0; j < 8; j++) a[col * 8 + j] /= p;
    for (let r = 0; r < 4; r++) {
      if (r === col) continue;
      const f = a[r * 8 + col];
      if (f !== 0) for (let j = 0; j < 8; j++) a[r * 8 + j] -= f * a[col * 8 + j];
    }
  }
  for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) coef[i * 4 + j] = a[i * 8 + 4 + j];
}

/** Upper triangle (j ≥ i) of out += f v vᵀ; `mirror` fills the lower one once all terms are in. */
function addOuter(out: Float64Array, v: Float64Array, f: number): void {
  if (f === 0) return;
  for (let i = 0; i < 4; i++) {
    const vi = v[i] * f;
    for (let j = i; j < 4; j++) out[i * 4 + j] += vi * v[j];
  }
}

function mirror(out: Float64Array): void {
  for (let i = 1; i < 4; i++) for (let j = 0; j < i; j++) out[i * 4 + j] = out[j * 4 + i];
}

export function addTimoshenkoElement(h: number, p: TimoshenkoSamples, out: TimoshenkoOut): void {
  const mid = (GAUSS_N - 1) >> 1; // ξ = 0.5
  const s = p.ei[mid] / p.kga[mid];
  coefficients(h, s);
  for (let g = 0; g < GAUSS_N; g++) {
    const x = GAUSS_XI[g] * h;
    const wh = GAUSS_W[g] * h;
    for (let j = 0; j < 4; j++) {
      const c0 = coef[j];
      const c1 = coef[4 + j];
      const c2 = coef[8 + j];
      const c3 = coef[12 + j];
      nw[j] = c0 + x * (c1 + x * (c2 + x * c3));
      dnw[j] = c1 + x * (2 * c2 + 3 * x * c3);
      npsi[j] = c1 + 2 * c2 * x + c3 * (3 * x * x + 6 * s);
      dnpsi[j] = 2 * c2 + 6 * c3 * x;
      gam[j] = -6 * s * c3;
    }
    addOuter(out.k, dnpsi, wh * p.ei[g]);
    addOuter(out.k, gam, wh * p.kga[g]);
    addOuter(out.k, nw, wh * p.soil[g]);
    addOuter(out.kg, dnw, wh * p.tension[p.tensionOffset + g]);
    addOuter(out.m, nw, wh * p.mass[g]);
    addOuter(out.m, npsi, wh * p.rotary[g]);
    addOuter(out.ma, nw, wh * p.added[g]);
  }
  // Symmetric: the lower triangles copied from the upper ones, not summed again.
  mirror(out.k);
  mirror(out.kg);
  mirror(out.m);
  mirror(out.ma);
}
