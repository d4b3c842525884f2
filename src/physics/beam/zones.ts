/**
 * Mass per metre by zone: the member split at segment ends and liquid range ends, each zone reporting
 * structure, contents, coating/growth and added mass per metre (averaged over the zone when tapered)
 * and the ratios engineers compare: Ca, added / displaced liquid, added / structural.
 */
import { type AddedMassPlan, addedMassPerM } from './added-mass';
import { GAUSS_N, GAUSS_W, GAUSS_XI } from './element';
import type { MemberModel } from './model';
import type { ZoneResult } from './result';
import { sectionAt } from './section-props';
import { shapeOf } from '../shapes/registry';

export function massZones(model: MemberModel, plan: AddedMassPlan | null): ZoneResult[] {
  const len = model.lengthM;
  const pts = new Set<number>([0, len]);
  for (const s of model.segments) pts.add(s.fromM).add(s.toM);
  const liq = model.liquid;
  if (liq) {
    if (liq.fromM > 0 && liq.fromM < len) pts.add(liq.fromM);
    if (liq.toM > 0 && liq.toM < len) pts.add(liq.toM);
  }
  const zs = [...pts].sort((a, b) => a - b).filter((z, i, a) => i === 0 || z - a[i - 1] > 1e-9 * len);
  const zones: ZoneResult[] = [];
  for (let i = 0; i + 1 < zs.length; i++) {
    const a = zs[i];
    const b = zs[i + 1];
    const mid = 0.5 * (a + b);
    const si = model.segments.findIndex((s) => mid >= s.fromM && mid <= s.toM);
    const seg = model.segments[si];
    const submerged = !!liq && mid > liq.fromM && mid < liq.toM;
    const wet = submerged && plan !== null;
    let structure = 0;
    let contents = 0;
    let coating = 0;
    let added = 0;
    let reference = 0;
    let displaced = 0;
    for (let g = 0; g < GAUSS_N; g++) {
      const t = (a + GAUSS_XI[g] * (b - a) - seg.fromM) / (seg.toM - seg.fromM);
      const p = sectionAt(seg, t);
      const w = GAUSS_W[g];
      structure += w * p.structureKgPerM;
      contents += w * p.contentsKgPerM;
      coating += w * p.coatingKgPerM;
      if (wet) {
        added += w * addedMassPerM(plan, seg, si, t);
        reference += w * liq.densityKgPerM3 * p.referenceAreaM2;
        displaced += w * liq.densityKgPerM3 * p.displacedAreaM2;
      }
    }
    zones.push({
      fromM: a,
      toM: b,
      submerged,
      tapered: seg.endSection !== undefined,
      structureKgPerM: structure,
      contentsKgPerM: contents,
      coatingKgPerM: coating,
      addedKgPerM: added,
      addedMassCoefficientCa: wet ? added / reference : null,
      caReferenceArea: shapeOf(seg.section).caReferenceArea,
      addedToDisplacedLiquidMass: wet ? added / displaced : null,
      addedToStructuralMass: wet ? added / structure : null,
      addedMassMethod: wet ? (plan.segments[si]?.method ?? null) : null,
    });
  }
  return zones;
}
