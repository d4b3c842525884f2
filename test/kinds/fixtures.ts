/** Invented members shared by the member-builder tests; material values are the common inputs of docs/sources.md §S7. */
import type { MemberInputs } from '../../src/kinds/registry';

type PileInput = MemberInputs['pile'];
type RiserInput = MemberInputs['riser'];
type BaffleInput = MemberInputs['baffle'];
type StemInput = MemberInputs['stem'];

// Invented pile; material values are the common inputs of docs/sources.md §S7 (E = 210 GPa, ρ = 7850 kg/m³),
// marine growth 1325 kg/m³ (NORSOK N-003, from memory), seawater 1025 kg/m³.
export const PILE: PileInput = {
  outerDiameterM: 0.61,
  wallThicknessM: 0.012,
  youngsModulusPa: 210e9,
  materialDensityKgPerM3: 7850,
  waterDepthM: 8,
  topAboveStillWaterM: 3,
  waterLevelOffsetM: 1,
  topMassKg: 20000,
  topRotaryInertiaKgM2: 5000,
  flooded: true,
  liquidDensityKgPerM3: 1025,
  marineGrowth: { thicknessM: 0.05, densityKgPerM3: 1325, topAboveStillWaterM: 2, bottomBelowStillWaterM: 40 },
};

// Invented riser: 12.75 in (323.9 mm) × 12.7 mm steel (docs/sources.md §S7 material), oil 850 kg/m³, 3 mm coating.
export const RISER: RiserInput = {
  outerDiameterM: 0.3239,
  wallThicknessM: 0.0127,
  youngsModulusPa: 210e9,
  materialDensityKgPerM3: 7850,
  lengthM: 30,
  contentsDensityKgPerM3: 850,
  coating: { thicknessM: 0.003, densityKgPerM3: 1300 },
  guideElevationsM: [25, 5, 15],
  bottom: 'pinned',
  top: 'free',
  liquidDensityKgPerM3: 1025,
  liquidToM: 22,
  caisson: { innerDiameterM: 0.6, offsetM: 0.05, offsetAngleDeg: 90 },
};

// Invented members; material values are the common inputs of docs/sources.md §S7.
export const BAFFLE: BaffleInput = {
  spanM: 1.5,
  widthM: 0.3,
  thicknessM: 0.01,
  youngsModulusPa: 210e9,
  materialDensityKgPerM3: 7850,
  poissonRatio: 0.3,
  lowerEnd: 'welded',
  upperEnd: 'bolted',
  lowerEndAboveFloorM: 0.5,
  liquidLevelAboveFloorM: 1.4,
  liquidDensityKgPerM3: 1000,
  wallGapM: 0.04,
  perforationRatio: 0.2,
};

export const STEM: StemInput = {
  insertionLengthM: 0.25,
  rootDiameterM: 0.028,
  tipDiameterM: 0.022,
  boreDiameterM: 0.007,
  youngsModulusPa: 193e9,
  materialDensityKgPerM3: 8000,
  tipMassKg: 0.1,
  liquidDensityKgPerM3: 1000,
  surroundingInnerDiameterM: 0.05,
  rootSupport: { kind: 'rotational-spring', stiffnessNmPerRad: 5e4 },
};
