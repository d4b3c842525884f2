/**
 * Section properties at every Gauss point of a mesh, built once per mesh into flat arrays, so assembly
 * reads numbers instead of building a property object per point. A prismatic segment's properties are
 * computed once; only tapered segments are evaluated point by point.
 */
import { type AddedMassPlan, addedMassPerM } from './added-mass';
import { GAUSS_N, GAUSS_XI } from './element';
import type { Mesh } from './mesh';
import type { MemberModel, MemberSegment } from './model';
import { dryMassPerM, type SectionAt, sectionAt } from './section-props';

/** Properties of each segment when it is prismatic (null when tapered). */
export type PrismaticCache = (SectionAt | null)[];

export function prismaticCache(model: MemberModel): PrismaticCache {
  return model.segments.map((s) => (s.endSection ? null : sectionAt(s, 0)));
}

/** Properties of segment `si` at fraction t of its length, from the cache when the segment is prismatic. */
export function sectionAtCached(cache: PrismaticCache, seg: MemberSegment, si: number, t: number): SectionAt {
  return cache[si] ?? sectionAt(seg, t);
}

/**
 * Layout: value at Gauss point g of element e at `[e·GAUSS_N + g]`. EI (N·m²), dry mass (kg/m), κGA (N),
 * rotary inertia (kg·m²/m), added mass (kg/m; 0 on dry elements or without a plan).
 */
export interface GaussProps {
  ei: Float64Array;
  mass: Float64Array;
  kga: Float64Array;
  rotary: Float64Array;
  added: Float64Array;
}

export function gaussProps(model: MemberModel, mesh: Mesh, plan: AddedMassPlan | null, cache: PrismaticCache = prismaticCache(model)): GaussProps {
  const ne = mesh.z.length - 1;
  const size = ne * GAUSS_N;
  const out: GaussProps = {
    ei: new Float64Array(size),
    mass: new Float64Array(size),
    kga: new Float64Array(size),
    rotary: new Float64Array(size),
    added: new Float64Array(size),
  };
  for (let e = 0; e < ne; e++) {
    const za = mesh.z[e];
    const h = mesh.z[e + 1] - za;
    const si = mesh.segmentOf[e];
    const seg = model.segments[si];
    const segLen = seg.toM - seg.fromM;
    const wet = plan !== null && mesh.submerged[e] === 1;
    for (let g = 0; g < GAUSS_N; g++) {
      const t = (za + GAUSS_XI[g] * h - seg.fromM) / segLen;
      const p = sectionAtCached(cache, seg, si, t);
      const k = e * GAUSS_N + g;
      out.ei[k] = p.eiNm2;
      out.mass[k] = dryMassPerM(p);
      out.kga[k] = p.shearStiffnessN;
      out.rotary[k] = p.rotaryInertiaKgM;
      if (wet) out.added[k] = addedMassPerM(plan, seg, si, t, p.referenceAreaM2);
    }
  }
  return out;
}
