/**
 * Euler–Bernoulli beam element with Hermite cubic shape functions (2 nodes × [w, θ = dw/dz]).
 * Element integrals are evaluated by 5-point Gauss–Legendre quadrature, exact for polynomials up to
 * degree 9: a linear taper of diameter makes EI quartic and mass per metre quadratic in z, so the
 * stiffness (degree 6), consistent mass (degree 8) and geometric stiffness with tension varying by
 * weight (degree 7) are integrated exactly. (Standard FE texts, e.g. R.D. Cook et al.,
 * Concepts and Applications of Finite Element Analysis, ch. 2 and 18.)
 */

/** 5-point Gauss–Legendre abscissae mapped to ξ ∈ [0, 1], and weights summing to 1. */
export const GAUSS_XI = Float64Array.from([-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664], (x) => 0.5 * (1 + x));
export const GAUSS_W = Float64Array.from([0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891], (w) => 0.5 * w);
export const GAUSS_N = 5;

/**
 * Which derivative pair an element integral uses:
 * VALUE ∫ f N Nᵀ dz (consistent mass, added mass, distributed springs);
 * SLOPE ∫ f N′ N′ᵀ dz (geometric stiffness from axial tension);
 * CURVATURE ∫ f N″ N″ᵀ dz (bending stiffness).
 */
export const VALUE = 0;
export const SLOPE = 1;
export const CURVATURE = 2;
export type Integrand = typeof VALUE | typeof SLOPE | typeof CURVATURE;

const basis = new Float64Array(4);

/** Shape functions (or their z-derivatives) at ξ for element length h, into `basis`. */
function basisAt(kind: Integrand, xi: number, h: number): Float64Array {
  const x2 = xi * xi;
  const x3 = x2 * xi;
  if (kind === VALUE) {
    basis[0] = 1 - 3 * x2 + 2 * x3;
    basis[1] = h * (xi - 2 * x2 + x3);
    basis[2] = 3 * x2 - 2 * x3;
    basis[3] = h * (x3 - x2);
  } else if (kind === SLOPE) {
    basis[0] = (6 * x2 - 6 * xi) / h;
    basis[1] = 1 - 4 * xi + 3 * x2;
    basis[2] = (6 * xi - 6 * x2) / h;
    basis[3] = 3 * x2 - 2 * xi;
  } else {
    basis[0] = (12 * xi - 6) / (h * h);
    basis[1] = (6 * xi - 4) / h;
    basis[2] = (6 - 12 * xi) / (h * h);
    basis[3] = (6 * xi - 2) / h;
  }
  return basis;
}

/**
 * Adds ∫₀ʰ f(z) Bᵀ B dz to `out` (4×4 row-major, local DOFs [w1, θ1, w2, θ2]), with f given at the
 * 5 Gauss points of the element (`f[offset … offset+4]`) and B the basis selected by `kind`.
 */
export function addElementIntegral(kind: Integrand, h: number, f: Float64Array, offset: number, out: Float64Array): Float64Array {
  for (let g = 0; g < GAUSS_N; g++) {
    const fw = f[offset + g] * GAUSS_W[g] * h;
    if (fw === 0) continue;
    const b = basisAt(kind, GAUSS_XI[g], h);
    for (let i = 0; i < 4; i++) {
      const bi = b[i] * fw;
      for (let j = i; j < 4; j++) out[i * 4 + j] += bi * b[j];
    }
  }
  // Symmetric: the upper triangle summed, the lower one copied from it.
  for (let i = 1; i < 4; i++) for (let j = 0; j < i; j++) out[i * 4 + j] = out[j * 4 + i];
  return out;
}
