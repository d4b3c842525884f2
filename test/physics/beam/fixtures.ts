/** Shared member fixtures for the beam tests (invented members; properties are common steel values). */
import type { MemberModel, MemberSegment, MemberSupport } from '../../../src/physics/beam';
import { sectionAt } from '../../../src/physics/beam';

/** Steel pipe 0.5 m × 20 mm, E = 210 GPa, ρ = 7850 kg/m³ (common inputs, docs/sources.md §S7). */
export const PIPE: MemberSegment = {
  fromM: 0,
  toM: 10,
  section: { shape: 'tube', outerDiameterM: 0.5, wallThicknessM: 0.02 },
  youngsModulusPa: 210e9,
  densityKgPerM3: 7850,
};

export function uniformMember(lengthM: number, supports: MemberSupport[], extra: Partial<MemberModel> = {}, seg: Partial<MemberSegment> = {}): MemberModel {
  return { lengthM, segments: [{ ...PIPE, ...seg, fromM: 0, toM: lengthM }], supports, ...extra };
}

/** EI and mass per metre of the fixture segment (plus contents/coating if given). */
export function uniformProps(seg: Partial<MemberSegment> = {}): { ei: number; m: number } {
  const p = sectionAt({ ...PIPE, ...seg }, 0);
  return { ei: p.eiNm2, m: p.structureKgPerM + p.contentsKgPerM + p.coatingKgPerM };
}

/** f = λ² / (2π L²) √(EI/m) (Euler–Bernoulli, Thomson Table 9.5-1 / Blevins Table 8-1). */
export function beamFrequency(lambda: number, lengthM: number, ei: number, m: number): number {
  return ((lambda * lambda) / (2 * Math.PI * lengthM * lengthM)) * Math.sqrt(ei / m);
}
