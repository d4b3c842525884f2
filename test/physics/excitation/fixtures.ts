/**
 * Invented test cases for the screening (fictional members, no real site).
 * The standard member: 20 m long along z, submerged from 0 to 15 m (waterline at z = 15 m),
 * circular D = 1 m, first-mode-like shape φ = z / 20, so the mode moves most under water at the waterline.
 */
import type { ScreeningInput, ScreeningMode } from '../../../src/physics/excitation/types';

/** Linear mode shape on 21 nodes from 0 to lengthM: φ = z / lengthM. */
export function linearMode(wetFrequencyHz: number, lengthM = 20, nodes = 21): ScreeningMode {
  const zM: number[] = [];
  const displacement: number[] = [];
  for (let i = 0; i < nodes; i++) {
    const z = (lengthM * i) / (nodes - 1);
    zM.push(z);
    displacement.push(z / lengthM);
  }
  return { wetFrequencyHz, zM, displacement };
}

/** Standard pile-like case with uniform flow U and one mode at f; everything else default. */
export function pileCase(wetFrequencyHz: number, flowSpeedMPerS: ScreeningInput['flowSpeedMPerS'], overrides: Partial<ScreeningInput> = {}): ScreeningInput {
  return {
    modes: [linearMode(wetFrequencyHz)],
    zones: [{ fromM: 0, toM: 15, section: { kind: 'circle', outerDiameterM: 1 } }],
    flowSpeedMPerS,
    // 2000 kg/m with the default ζ = 0.005 gives K_S ≈ 0.12, well below 1.8: in-line is governed by V_R alone.
    effectiveMassKgPerM: 2000,
    ...overrides,
  };
}

/** A sensor stem: 0.2 m insertion, D = 20 mm, fully in the pipe flow, fresh water. */
export function stemCase(wetFrequencyHz: number, flowSpeedMPerS: number, overrides: Partial<ScreeningInput> = {}): ScreeningInput {
  return {
    modes: [linearMode(wetFrequencyHz, 0.2)],
    zones: [{ fromM: 0, toM: 0.2, section: { kind: 'circle', outerDiameterM: 0.02 } }],
    flowSpeedMPerS,
    liquid: { densityKgPerM3: 1000, kinematicViscosityM2PerS: 1e-6, source: 'fresh water' },
    effectiveMassKgPerM: 3,
    stemFrequencyRatioScreen: true,
    ...overrides,
  };
}
