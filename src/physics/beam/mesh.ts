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

/** Relative distance under which two mesh points are merged. */
const MERGE = 1e-9;

/** Sorted, de-duplicated mesh points that must be nodes. */
export function meshBreakpoints(model: MemberModel): Float64Array {
  const len = model.lengthM;
  const pts: number[] = [0, len];
  for (const s of model.segments) pts.push(s.fromM, s.toM);
  for (const s of model.supports) pts.push(s.atM);
  for (const m of model.masses ?? []) pts.push(m.atM);
  for (const s of model.soilSprings ?? []) pts.push(s.fromM, s.toM);
  if (model.liquid) pts.push(model.liquid.fromM, model.liquid.toM);
  const inside = pts.filter((p) => p >= 0 && p <= len).sort((a, b) => a - b);
  const out: number[] = [];
  for (const p of inside) if (out.length === 0 || p - out[out.length - 1] > MERGE * len) out.push(p);
  out[out.length - 1] = len;
  return Float64Array.from(out);
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
