/** Readings shared by several forms: material, model options and the tube-wall check. */
import type { BeamTheoryChoice } from '../kinds/common/theory';
import type { Reader } from './read';

/** Core field paths of the inputs every kind shares -> form field keys (for `FormSpec.coreFields`). */
export const COMMON_CORE_FIELDS: Readonly<Record<string, string>> = {
  youngsModulusPa: 'youngsModulus',
  materialDensityKgPerM3: 'materialDensity',
  liquidDensityKgPerM3: 'liquidDensity',
};

/** The same for a tube's outer diameter and wall. */
export const TUBE_CORE_FIELDS: Readonly<Record<string, string>> = { outerDiameterM: 'outerDiameter', wallThicknessM: 'wallThickness' };

/** Material and model options common to every kind's SI input. */
export function commonInput(r: Reader): { youngsModulusPa: number; materialDensityKgPerM3: number; endEffect3d: boolean; beamTheory: BeamTheoryChoice } {
  return {
    youngsModulusPa: r.num('youngsModulus'),
    materialDensityKgPerM3: r.num('materialDensity'),
    endEffect3d: r.choice('endEffect3d') === 'yes',
    beamTheory: r.choice('beamTheory') as BeamTheoryChoice,
  };
}

/** Outer diameter and wall of a tube, with "wall thickness must be less than half the outer diameter (305 mm)". */
export function tubeInput(r: Reader, err: (key: string, message: string) => void): { outerDiameterM: number; wallThicknessM: number } {
  const d = r.num('outerDiameter');
  const t = r.num('wallThickness');
  if (!(t < d / 2)) err('wallThickness', `wall thickness must be less than half the outer diameter (${r.fmt('wallThickness', d / 2)})`);
  return { outerDiameterM: d, wallThicknessM: t };
}
