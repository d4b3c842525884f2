/**
 * Cross-check for the dry plate solver, written for the tests: the conforming rectangular plate element of
 * F.K. Bogner, R.L. Fox & L.A. Schmit ("The generation of interelement-compatible stiffness and mass matrices
 * by the use of interpolation formulas", Proc. Conf. Matrix Methods in Structural Mechanics, 1965): products
 * of 1D Hermite cubics (w, w_x, w_y, w_xy at each node). On a uniform mesh the global matrices are Kronecker
 * products of assembled 1D beam-element matrices, so they are built that way here. Edge conditions remove
 * 1D degrees of freedom: clamped w and w′, simply supported w, free none. Eigenvalue error O(h⁴).
 */
import { denseGeneralizedEigen } from '../../../src/physics/linalg/eigen-dense';
import type { EdgeCondition, PlateEdges } from '../../../src/physics/plate/types';

/** Hermite cubics on [0, h] and derivatives at s ∈ [0, 1]: [N1 (w0), N2 (w0′), N3 (w1), N4 (w1′)]. */
function hermite(s: number, h: number, d: number): number[] {
  if (d === 0) return [1 - 3 * s * s + 2 * s ** 3, h * (s - 2 * s * s + s ** 3), 3 * s * s - 2 * s ** 3, h * (-s * s + s ** 3)];
  if (d === 1) return [(-6 * s + 6 * s * s) / h, 1 - 4 * s + 3 * s * s, (6 * s - 6 * s * s) / h, -2 * s + 3 * s * s];
  return [(-6 + 12 * s) / (h * h), (-4 + 6 * s) / h, (6 - 12 * s) / (h * h), (-2 + 6 * s) / h];
}

// 4-point Gauss–Legendre on [0, 1] (exact to degree 7; the products here are degree ≤ 6).
const GX = [0.0694318442029737, 0.3300094782075719, 0.6699905217924281, 0.9305681557970263];
const GW = [0.1739274225687269, 0.3260725774312731, 0.3260725774312731, 0.1739274225687269];

/** Assembled 1D matrix ∫ N^(p) N^(q) dx on `elements` equal elements over [0, L], with free ends. */
function assemble1d(lengthM: number, elements: number, p: number, q: number): Float64Array {
  const h = lengthM / elements;
  const n = 2 * (elements + 1);
  const out = new Float64Array(n * n);
  for (let e = 0; e < elements; e++) {
    for (let g = 0; g < 4; g++) {
      const a = hermite(GX[g], h, p);
      const b = hermite(GX[g], h, q);
      for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) out[(2 * e + i) * n + 2 * e + j] += GW[g] * h * a[i] * b[j];
    }
  }
  return out;
}

function kept(elements: number, start: EdgeCondition, end: EdgeCondition): number[] {
  const n = 2 * (elements + 1);
  const drop = new Set<number>();
  if (start !== 'free') drop.add(0);
  if (start === 'clamped') drop.add(1);
  if (end !== 'free') drop.add(n - 2);
  if (end === 'clamped') drop.add(n - 1);
  return [...Array(n).keys()].filter((i) => !drop.has(i));
}

function restrict(m: Float64Array, n: number, keep: number[]): Float64Array {
  const k = keep.length;
  const out = new Float64Array(k * k);
  for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) out[i * k + j] = m[keep[i] * n + keep[j]];
  return out;
}

export interface BfsPlate {
  widthM: number;
  heightM: number;
  poissonRatio: number;
  /** Ideal edges only; give rotational springs through `springs` on edges marked simply supported. */
  edges: PlateEdges;
  /** Rotational edge springs in units of the plate rigidity D per metre (k_r / D, 1/m), on edges given as simply supported. */
  springs?: { left?: number; right?: number; bottom?: number; top?: number };
}

/** Lowest `count` non-dimensional λ = ω a² √(ρh/D) (a = width) on an elements × elements mesh. */
export function bfsLambdas(p: BfsPlate, elements: number, count: number): number[] {
  const n1 = 2 * (elements + 1);
  const dir = (L: number, s: EdgeCondition, e: EdgeCondition, k0 = 0, k1 = 0) => {
    const keep = kept(elements, s, e);
    // A rotational spring acts on the end slope w′ (the second degree of freedom of an end node).
    const spring = new Float64Array(n1 * n1);
    spring[1 * n1 + 1] = k0;
    spring[(n1 - 1) * n1 + n1 - 1] = k1;
    return {
      k: keep.length,
      spring: restrict(spring, n1, keep),
      m00: restrict(assemble1d(L, elements, 0, 0), n1, keep),
      m22: restrict(assemble1d(L, elements, 2, 2), n1, keep),
      m20: restrict(assemble1d(L, elements, 2, 0), n1, keep),
      m11: restrict(assemble1d(L, elements, 1, 1), n1, keep),
    };
  };
  const sp = p.springs ?? {};
  const ideal = (e: PlateEdges[keyof PlateEdges]): EdgeCondition => {
    if (typeof e !== 'string') throw new Error('bfsLambdas: give edge springs through `springs`, in units of D');
    return e;
  };
  const edges = { left: ideal(p.edges.left), right: ideal(p.edges.right), bottom: ideal(p.edges.bottom), top: ideal(p.edges.top) };
  const X = dir(p.widthM, edges.left, edges.right, sp.left, sp.right);
  const Y = dir(p.heightM, edges.bottom, edges.top, sp.bottom, sp.top);
  const n = X.k * Y.k;
  const K = new Float64Array(n * n);
  const M = new Float64Array(n * n);
  const nu = p.poissonRatio;
  for (let i = 0; i < X.k; i++) for (let j = 0; j < Y.k; j++) for (let a = 0; a < X.k; a++) for (let b = 0; b < Y.k; b++) {
    const ia = i * X.k + a;
    const ai = a * X.k + i;
    const jb = j * Y.k + b;
    const bj = b * Y.k + j;
    // Unit D and ρh: λ² = ω² a⁴ (ρh/D).
    K[(i * Y.k + j) * n + a * Y.k + b] =
      X.m22[ia] * Y.m00[jb] + X.m00[ia] * Y.m22[jb] + X.spring[ia] * Y.m00[jb] + X.m00[ia] * Y.spring[jb] + nu * (X.m20[ia] * Y.m20[bj] + X.m20[ai] * Y.m20[jb]) + 2 * (1 - nu) * X.m11[ia] * Y.m11[jb];
    M[(i * Y.k + j) * n + a * Y.k + b] = X.m00[ia] * Y.m00[jb];
  }
  const eig = denseGeneralizedEigen(K, M, n);
  if (!eig.ok) throw new Error(eig.message);
  return Array.from(eig.values.subarray(0, count), (w2) => Math.sqrt(w2) * p.widthM ** 2);
}

/** Richardson extrapolation of two BFS meshes (e and 2e elements), eigenvalue error ∝ h⁴. */
export function bfsExtrapolated(p: BfsPlate, elements: number, count: number): number[] {
  const coarse = bfsLambdas(p, elements, count);
  const fine = bfsLambdas(p, 2 * elements, count);
  return fine.map((f, i) => f + (f - coarse[i]) / 15);
}
