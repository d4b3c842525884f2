/**
 * Axial tension along the member, sampled at the Gauss points of every element.
 * Constant by default. With `tensionVariesWithWeight` the given tension acts at the top (z = L) and
 * falls downwards by the weight of what hangs below the top down to each point: the effective weight
 * per metre (structure + contents + coating, less buoyancy ρ_l·g·A_outer where submerged — the usual
 * effective-tension view of a riser) plus the weight in air of lumped masses above the point.
 */
import { GAUSS_N, GAUSS_W, GAUSS_XI } from './element';
import type { Mesh } from './mesh';
import type { MemberModel } from './model';
import { type PrismaticCache, prismaticCache, sectionAtCached } from './gauss-props';
import { dryMassPerM } from './section-props';

/** Standard gravity, m/s². */
export const GRAVITY = 9.80665;

export interface TensionField {
  /** Tension at Gauss point g of element e at `[e·5 + g]`, N (negative = compression). */
  atGauss: Float64Array;
  /** Tension at the top (z = L) and bottom (z = 0), N. */
  topN: number;
  bottomN: number;
  /** Extremes over the member, N. */
  minN: number;
  maxN: number;
  varies: boolean;
  /** ∫ T dz over the member, N·m: positive means tension resists rigid rotation. */
  integralNm: number;
}

/** Effective weight per metre at fraction t of element e's segment, N/m. */
function weightPerM(model: MemberModel, mesh: Mesh, cache: PrismaticCache, e: number, z: number): number {
  const si = mesh.segmentOf[e];
  const seg = model.segments[si];
  const p = sectionAtCached(cache, seg, si, (z - seg.fromM) / (seg.toM - seg.fromM));
  const buoyancy = mesh.submerged[e] ? model.liquid!.densityKgPerM3 * p.displacedAreaM2 : 0;
  return GRAVITY * (dryMassPerM(p) - buoyancy);
}

/** Three-point Gauss rule on [0, 1], exact for the quadratic weight of a tapered element. */
const G3X = [0.5 - 0.5 * Math.sqrt(0.6), 0.5, 0.5 + 0.5 * Math.sqrt(0.6)];
const G3W = [5 / 18, 8 / 18, 5 / 18];

function weightBetween(model: MemberModel, mesh: Mesh, cache: PrismaticCache, e: number, a: number, b: number): number {
  let s = 0;
  for (let i = 0; i < 3; i++) s += G3W[i] * weightPerM(model, mesh, cache, e, a + (b - a) * G3X[i]);
  return s * (b - a);
}

export function tensionField(model: MemberModel, mesh: Mesh, cache: PrismaticCache = prismaticCache(model)): TensionField {
  const ne = mesh.z.length - 1;
  const at = new Float64Array(ne * GAUSS_N);
  const top = model.tensionN ?? 0;
  const z = mesh.z;
  if (!model.tensionVariesWithWeight) {
    at.fill(top);
    return { atGauss: at, topN: top, bottomN: top, minN: top, maxN: top, varies: false, integralNm: top * model.lengthM };
  }
  const masses = model.masses ?? [];
  // Walk down from the top, accumulating the weight above each element's upper node.
  let above = 0;
  const massIdx = masses.map((_, i) => i).sort((i, j) => masses[j].atM - masses[i].atM);
  let next = 0;
  let min = top;
  let max = top;
  let integral = 0;
  const tol = 1e-9 * model.lengthM;
  for (let e = ne - 1; e >= 0; e--) {
    const zTop = z[e + 1];
    while (next < massIdx.length && masses[massIdx[next]].atM >= zTop - tol) {
      above += GRAVITY * masses[massIdx[next]].massKg;
      next++;
    }
    const h = zTop - z[e];
    for (let g = 0; g < GAUSS_N; g++) {
      const zg = z[e] + GAUSS_XI[g] * h;
      const t = top - above - weightBetween(model, mesh, cache, e, zg, zTop);
      at[e * GAUSS_N + g] = t;
    }
    const wElem = weightBetween(model, mesh, cache, e, z[e], zTop);
    // Tension at both ends of the element, for the extremes.
    const tTop = top - above;
    const tBottom = tTop - wElem;
    min = Math.min(min, tTop, tBottom);
    max = Math.max(max, tTop, tBottom);
    for (let g = 0; g < GAUSS_N; g++) integral += at[e * GAUSS_N + g] * h * GAUSS_W[g];
    above += wElem;
  }
  // Tension just above z = 0: a mass at z = 0 is carried by the member, so it is included here.
  const bottom = top - above;
  return { atGauss: at, topN: top, bottomN: bottom, minN: Math.min(min, bottom), maxN: max, varies: true, integralNm: integral };
}
