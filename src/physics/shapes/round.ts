/**
 * Shared by the round shapes (tube and rod): properties of an annulus of outer diameter d and inner
 * diameter di (di = 0 for a solid rod), classical: A = π (d² − di²)/4, I = π (d⁴ − di⁴)/64.
 */
import { cowperCircle } from './shear';
import type { FlowSection, SectionAt, SectionMaterial } from './types';

export function roundProps(d: number, di: number, m: SectionMaterial): SectionAt {
  const { youngsModulusPa: e, densityKgPerM3: rho, coatingM: c, coatingDensityKgPerM3: rhoC, contentsDensityKgPerM3: rhoIn } = m;
  const d2 = d * d;
  const di2 = di * di;
  const dOut = d + 2 * c;
  const areaOut = (Math.PI / 4) * dOut * dOut;
  // x⁴ as (x²)² rather than x ** 4: this runs at every Gauss point of a tapered member, and the general power
  // costs several times more (the two agree to an ulp or so).
  const i64 = (x: number) => {
    const x2 = x * x;
    return (Math.PI / 64) * (x2 * x2);
  };
  return {
    eiNm2: e * (Math.PI / 64) * (d2 * d2 - di2 * di2),
    structureKgPerM: rho * (Math.PI / 4) * (d2 - di2),
    contentsKgPerM: rhoIn * (Math.PI / 4) * di2,
    coatingKgPerM: rhoC * (areaOut - (Math.PI / 4) * d2),
    outerWidthM: dOut,
    referenceAreaM2: areaOut,
    displacedAreaM2: areaOut,
    depthM: d,
    shearStiffnessN: cowperCircle(m.poissonRatio, di / d) * m.shearModulusPa * (Math.PI / 4) * (d2 - di2),
    rotaryInertiaKgM: rho * (i64(d) - i64(di)) + rhoIn * i64(di) + rhoC * (i64(dOut) - i64(d)),
  };
}

/**
 * A round section sheds as a circle of its outer diameter including coating and growth (DNV-RP-C205 §9 uses
 * the outer diameter; NORSOK N-003 §6.2.4.2 counts growth in it).
 */
export function roundFlowSection(p: SectionAt): FlowSection {
  return { kind: 'circle', outerDiameterM: p.outerWidthM };
}

/** What tube and rod describe alike: a circle to the flow, Lamb's closed form in open liquid (Ca = 1). */
export const ROUND_TRAITS = {
  flowSection: roundFlowSection,
  closedForm: 'circle closed form (Lamb)',
  perforable: false,
  endEffectBasis: 'circular cylinder',
  caReferenceArea: 'π D²/4, D = outer diameter including coating',
  wetWarning: () => null,
} as const;
