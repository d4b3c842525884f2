/**
 * Finite-element mesh along the member axis. Nodes sit at every point where a property may jump
 * (segment ends, supports, lumped masses, liquid and soil range ends), so each element lies inside
 * one segment, is wholly in or out of the liquid and of each soil range, and properties vary smoothly
 * inside it (Gauss quadrature then integrates them exactly for polynomials of moderate degree).
 * Refinement halves every element, so meshes are nested and Rayleigh–Ritz frequencies fall monotonically.
 */
import type { MemberModel } from './model';

export interface Mesh {
  /** Node positions along z, ascending, m. Node i carries DOFs 2i (lateral displacement) and 2i+1 (rotation). */
  z: Float64Array;
  /** Segment index of each element (element e spans nodes e and e + 1). */
  segmentOf: Int32Array;
  /** 1 where the element lies in the liquid range, else 0. */
  submerged: Uint8Array;
  /** Soil subgrade modulus acting on each element, N/m² (sum of overlapping ranges). */
  soilModulus: Float64Array;
  /** Elements per interval between breakpoints (refinement doubles these). */
  counts: Int32Array;
  /** The breakpoints, ascending, m. */
  breaks: Float64Array;
}

/**
 * Mesh points closer than this fraction of the member length are merged (the later point moves onto the
 * earlier one, so a mass or support moves by less than L / 5000). A lone element of length h adds a
 * relative rounding error of about ε (L/h)³ to the frequencies (see `roundingErrorEstimate`), so an
 * element shorter than L/5000 would cost more than 1e-5 on its own.
 */
export const MIN_INTERVAL_FRACTION = 2e-4;

/** Sorted mesh points that must be nodes, with points closer than L·MIN_INTERVAL_FRACTION merged. */
export function meshBreakpoints(model: MemberModel): Float64Array {
  return breakpointsWithMerges(model).breaks;
}

/** The mesh points and how many distinct points were merged into a neighbour (and the largest move, m). */
export function breakpointsWithMerges(model: MemberModel): { breaks: Float64Array; merged: number; largestMoveM: number } {
  const len = model.lengthM;
  const pts: number[] = [0, len];
  for (const s of model.segments) pts.push(s.fromM, s.toM);
  for (const s of model.supports) pts.push(s.atM);
  for (const m of model.masses ?? []) pts.push(m.atM);
  for (const s of model.soilSprings ?? []) pts.push(s.fromM, s.toM);
  if (model.liquid) pts.push(model.liquid.fromM, model.liquid.toM);
  const inside = pts.filter((p) => p >= 0 && p <= len).sort((a, b) => a - b);
  const out: number[] = [];
  const exact = 1e-9 * len;
  let merged = 0;
  let largestMoveM = 0;
  for (const p of inside) {
    const gap = out.length === 0 ? Infinity : p - out[out.length - 1];
    if (gap > MIN_INTERVAL_FRACTION * len) out.push(p);
    else if (gap > exact) {
      merged++;
      largestMoveM = Math.max(largestMoveM, gap);
    }
  }
  // The end of the member is always a node: a point just below it has taken its place, so move it there.
  out[out.length - 1] = len;
  return { breaks: Float64Array.from(out), merged, largestMoveM };
}

/** Unit roundoff of double precision, 2⁻⁵². */
const EPSILON = 2.220446049250313e-16;

/**
 * Estimated relative rounding error of the frequencies on a mesh. The assembled stiffness has entries of
 * order EI/h³ while a smooth mode's strain energy is of order EI/L³ per unit displacement², so rounding
 * of the entries (and of the factorisation of K − σM) perturbs λ = ω² by about ε Σₑ (L/hₑ)³ relative —
 * ε (L/h)⁴ on a uniform mesh of L/h elements; the condition number of K against M grows the same way,
 * (L/h)⁴. The frequency, √λ, carries half of it. Measured on a clamped rod, a pinned tube and a flooded
 * pile on soil springs (uniform meshes of 200 to 10,000 elements; one short element among long ones),
 * the observed error of the lowest frequency stayed below this estimate on uniform meshes (cross-check
 * against the 200-element answer).
 */
export function roundingErrorEstimate(breaks: Float64Array, counts: Int32Array): number {
  const len = breaks[breaks.length - 1] - breaks[0];
  let sum = 0;
  for (let i = 0; i < counts.length; i++) {
    const r = (len * counts[i]) / (breaks[i + 1] - breaks[i]);
    sum += counts[i] * r * r * r;
  }
  return 0.5 * EPSILON * sum;
}

/**
 * The next mesh of the refinement: every interval whose elements are at least as long as the average
 * element of the doubled mesh is halved; shorter ones (a short interval between two nearby mesh points)
 * keep their elements, which are already finer than the rest and would only add rounding error.
 * Each mesh contains the previous one, so frequencies still fall monotonically.
 */
export function refineCounts(breaks: Float64Array, counts: Int32Array): Int32Array {
  const len = breaks[breaks.length - 1] - breaks[0];
  let total = 0;
  for (const c of counts) total += c;
  const target = len / (2 * total);
  return Int32Array.from(counts, (c, i) => ((breaks[i + 1] - breaks[i]) / c >= target ? 2 * c : c));
}

/** Spreads about `elements` elements over the intervals in proportion to length, at least one each. */
export function initialCounts(breaks: Float64Array, elements: number): Int32Array {
  const len = breaks[breaks.length - 1] - breaks[0];
  const counts = new Int32Array(breaks.length - 1);
  for (let i = 0; i < counts.length; i++) counts[i] = Math.max(1, Math.round((elements * (breaks[i + 1] - breaks[i])) / len));
  return counts;
}

/** Index of the node nearest to z (nodes include every breakpoint, so the match is exact up to rounding). */
export function nodeAt(mesh: Mesh, z: number): number {
  const zs = mesh.z;
  let lo = 0;
  let hi = zs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (zs[mid] <= z) lo = mid;
    else hi = mid;
  }
  return Math.abs(zs[lo] - z) <= Math.abs(zs[hi] - z) ? lo : hi;
}

export function buildMesh(model: MemberModel, breaks: Float64Array, counts: Int32Array): Mesh {
  let elements = 0;
  for (const c of counts) elements += c;
  const z = new Float64Array(elements + 1);
  let e = 0;
  for (let i = 0; i < counts.length; i++) {
    const a = breaks[i];
    const h = (breaks[i + 1] - a) / counts[i];
    for (let j = 0; j < counts[i]; j++) z[e++] = a + j * h;
  }
  z[elements] = breaks[breaks.length - 1];
  const segmentOf = new Int32Array(elements);
  const submerged = new Uint8Array(elements);
  const soilModulus = new Float64Array(elements);
  const segs = model.segments;
  const liq = model.liquid;
  let s = 0;
  for (let k = 0; k < elements; k++) {
    const mid = 0.5 * (z[k] + z[k + 1]);
    while (s < segs.length - 1 && mid > segs[s].toM) s++;
    segmentOf[k] = s;
    if (liq && mid > liq.fromM && mid < liq.toM) submerged[k] = 1;
    for (const soil of model.soilSprings ?? []) if (mid > soil.fromM && mid < soil.toM) soilModulus[k] += soil.modulusNPerM2;
  }
  return { z, segmentOf, submerged, soilModulus, counts, breaks };
}
