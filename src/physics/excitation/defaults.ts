/**
 * Default liquids, damping and screening limits, each with the source printed beside it.
 * Confidence words and sources: docs/sources.md §S6 (limits, damping) and §S7 (liquids).
 */
import type { LimitOverrides, LiquidProperties, ScreeningLimits } from './types';

/**
 * Seawater at about 15 °C, 35 ‰ salinity. Density 1025 kg/m³ (common design value);
 * ν = 1.19e-6 m²/s (ITTC Recommended Procedure 7.5-02-01-03, fresh water and seawater properties: 1.1883e-6; docs/sources.md §S7).
 */
export const SEAWATER: Required<LiquidProperties> = {
  densityKgPerM3: 1025,
  kinematicViscosityM2PerS: 1.19e-6,
  source: 'seawater ~15 °C: ρ = 1025 kg/m³ (common design value); ν = 1.19e-6 m²/s (ITTC Recommended Procedure 7.5-02-01-03, Fresh water and seawater properties)',
};

/**
 * Fresh water at about 20 °C. Density 1000 kg/m³ (common design value; 998.2 at 20 °C);
 * ν = 1.00e-6 m²/s (ITTC 7.5-02-01-03: 1.0034e-6 at 20 °C; docs/sources.md §S7).
 */
export const FRESH_WATER: Required<LiquidProperties> = {
  densityKgPerM3: 1000,
  kinematicViscosityM2PerS: 1.0e-6,
  source: 'fresh water ~20 °C: ρ = 1000 kg/m³ (common design value); ν = 1.00e-6 m²/s (ITTC Recommended Procedure 7.5-02-01-03, Fresh water and seawater properties)',
};

/**
 * Structural damping ratio when none is given. 0.5 % of critical for steel members, structural damping
 * only (no hydrodynamic damping): the "no information available" value of DNV-RP-F105, Free spanning pipelines (docs/sources.md §S6.5);
 * low damping keeps K_S small, so the in-line check stays on the conservative side.
 */
export const DEFAULT_DAMPING = {
  ratio: 0.005,
  source: 'ζ = 0.005 structural damping, no hydrodynamic damping (DNV-RP-F105, Free Spanning Pipelines, value when no information is available; common practice)',
} as const;

const DNV_C205_9 = 'DNV-RP-C205 §9 (vortex-induced vibration of circular cylinders)';

export const DEFAULT_LIMITS: ScreeningLimits = {
  inLineReducedVelocity: { min: 1.0, max: 4.5, source: `${DNV_C205_9}: in-line VIV for 1.0 ≤ V_R ≤ 4.5` },
  inLineStabilityMax: { value: 1.8, source: `${DNV_C205_9}: in-line VIV only when K_S ≤ 1.8` },
  crossFlowReducedVelocity: { min: 3.0, max: 16, source: `${DNV_C205_9}: cross-flow VIV for 3.0 ≤ V_R ≤ 16` },
  stemFrequencyRatioMax: {
    value: 0.8,
    source: 'f_s / f_n ≤ 0.8 for stems in flow: common practice (as in ASME PTC 19.3 TW-2010, Thermowells)',
  },
  separationMargin: { value: 0.2, source: '±20 % frequency separation from forcing: common practice, no single source' },
};

const USER_SOURCE = 'entered by user';

/** Defaults with overrides laid over them; an override without a source is marked "entered by user". */
export function mergeLimits(overrides: LimitOverrides | undefined): ScreeningLimits {
  const o = overrides ?? {};
  const pick = <K extends keyof ScreeningLimits>(key: K): ScreeningLimits[K] => {
    const v = o[key];
    return v ? ({ ...v, source: v.source ?? USER_SOURCE } as ScreeningLimits[K]) : DEFAULT_LIMITS[key];
  };
  return {
    inLineReducedVelocity: pick('inLineReducedVelocity'),
    inLineStabilityMax: pick('inLineStabilityMax'),
    crossFlowReducedVelocity: pick('crossFlowReducedVelocity'),
    stemFrequencyRatioMax: pick('stemFrequencyRatioMax'),
    separationMargin: pick('separationMargin'),
  };
}
