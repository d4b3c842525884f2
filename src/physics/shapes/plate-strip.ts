/**
 * Plate strip: a flat plate of width w and thickness t bending about its thin axis (motion normal to the
 * plate), with the plate rigidity D = E t³ / (12 (1 − ν²)) per unit width (classical plate theory).
 */
import { cowperRectangle, lerp } from './shear';
import type { ShapeDescription } from './types';

export interface PlateStripSection {
  shape: 'plate-strip';
  widthM: number;
  thicknessM: number;
}

export function plateStripSection(widthM: number, thicknessM: number): PlateStripSection {
  return { shape: 'plate-strip', widthM, thicknessM };
}

export const PLATE_STRIP: ShapeDescription<PlateStripSection> = {
  id: 'plate-strip',
  dimensions: ['widthM', 'thicknessM'],
  choices: {},
  check: () => null,
  holdsContents: false,
  props(sec, m) {
    const { widthM: w, thicknessM: th } = sec;
    const { youngsModulusPa: e, densityKgPerM3: rho, poissonRatio: nu, coatingM: c, coatingDensityKgPerM3: rhoC } = m;
    // Plate strip bending about its thin axis: flexural rigidity D = E t³ / (12 (1 − ν²)) per unit width (classical plate theory).
    const ei = ((e * th * th * th) / (12 * (1 - nu * nu))) * w;
    const wo = w + 2 * c;
    const to = th + 2 * c;
    return {
      eiNm2: ei,
      structureKgPerM: rho * w * th,
      contentsKgPerM: 0,
      coatingKgPerM: rhoC * (wo * to - w * th),
      outerWidthM: wo,
      referenceAreaM2: Math.PI * (wo / 2) ** 2,
      displacedAreaM2: wo * to,
      depthM: th,
      shearStiffnessN: cowperRectangle(nu) * m.shearModulusPa * w * th,
      // Second moments about the bending axis: plate w t³/12, coating (w_o t_o³ − w t³)/12.
      rotaryInertiaKgM: (rho * w * th ** 3) / 12 + (rhoC * (wo * to ** 3 - w * th ** 3)) / 12,
    };
  },
  lerp: (a, b, t) => plateStripSection(lerp(a.widthM, b.widthM, t), lerp(a.thicknessM, b.thicknessM, t)),
  depthM: (s) => s.thicknessM,
  // The plate stands with its width along y, moving along x (normal to itself).
  solverBody: (s, c) => ({ shape: 'plate', widthM: s.widthM + 2 * c, thicknessM: s.thicknessM + 2 * c, angleDeg: 90 }),
  // A rectangle facing the flow, width across, thickness along (our choice for baffles: the flow in a stirred
  // tank meets a baffle face-on, which sheds from its edges).
  flowSection: (p) => ({ kind: 'rectangle', widthAcrossFlowM: p.outerWidthM, depthAlongFlowM: p.depthM }),
  closedForm: 'flat plate closed form (Lamb)',
  perforable: true,
  endEffectBasis: 'rectangular plate',
  caReferenceArea: 'π (w/2)², w = plate width including coating',
  wetWarning: (s) =>
    s.widthM / s.thicknessM < 20
      ? `Plate width / thickness is ${(s.widthM / s.thicknessM).toPrecision(3)}: the thin-plate added mass ρπ(w/2)² ` +
        'neglects thickness (a rectangle of aspect 10 has Ca ≈ 1.14 in DNV-RP-H103, Modelling and Analysis of Marine Operations, Table A-1).'
      : null,
};
