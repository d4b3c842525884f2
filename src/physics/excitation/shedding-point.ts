/**
 * The numbers of vortex shedding at a mode's evaluation point (see mode-location.ts): Re, St, f_s, V_R, K_S.
 */
import { reducedVelocity, reynoldsNumber, sheddingFrequencyHz, stabilityParameter } from './formulas';
import type { ModeLocation } from './mode-location';
import type { SheddingPoint } from './results';
import type { StrouhalValue } from './strouhal';
import { strouhalNumber, strouhalOverride } from './strouhal';
import type { LiquidProperties } from './types';

export interface SheddingConditions {
  liquid: Required<LiquidProperties>;
  dampingRatio: number;
  /** A user St for every zone, or undefined for the table in strouhal.ts. */
  strouhal?: { value: number; source: string };
}

/** St for a section at Reynolds number re, honouring a user override. */
export function strouhalFor(loc: Pick<ModeLocation, 'section'>, re: number, cond: SheddingConditions): StrouhalValue {
  return cond.strouhal ? strouhalOverride(cond.strouhal.value, cond.strouhal.source) : strouhalNumber(loc.section, re);
}

export function sheddingPoint(
  loc: ModeLocation,
  naturalFrequencyHz: number,
  effectiveMassKgPerM: number,
  cond: SheddingConditions,
): SheddingPoint {
  const u = loc.flowSpeedMPerS;
  const d = loc.sizeM;
  const re = reynoldsNumber(u, d, cond.liquid.kinematicViscosityM2PerS);
  const st = strouhalFor(loc, re, cond);
  return {
    atZM: loc.atZM,
    zoneIndex: loc.zoneIndex,
    relativeAmplitude: loc.relativeAmplitude,
    flowSpeedMPerS: u,
    characteristicSizeM: d,
    reynoldsNumber: re,
    strouhal: st,
    sheddingFrequencyHz: sheddingFrequencyHz(st.value, u, d),
    reducedVelocity: reducedVelocity(u, naturalFrequencyHz, d),
    stabilityParameter: stabilityParameter(effectiveMassKgPerM, cond.dampingRatio, cond.liquid.densityKgPerM3, d),
    effectiveMassKgPerM,
  };
}
