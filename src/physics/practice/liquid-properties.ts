/**
 * Density and kinematic viscosity of fresh water against temperature, for Reynolds numbers and added mass when a
 * surveyor knows the liquid's temperature. Table values at 10, 20, 40 and 60 °C from standard tables (CRC
 * Handbook of Chemistry and Physics, "Properties of water"; docs/sources.md §S7.1); linear interpolation between them, the ends held
 * outside 10–60 °C would be extrapolation, which is refused.
 */

export interface LiquidProperties {
  densityKgPerM3: number;
  kinematicViscosityM2PerS: number;
}

/** [°C, kg/m³, mm²/s] */
const WATER: readonly (readonly [number, number, number])[] = [
  [10, 999.7, 1.307],
  [20, 998.2, 1.004],
  [40, 992.2, 0.658],
  [60, 983.2, 0.475],
];

export const WATER_TEMPERATURE_RANGE_C: readonly [number, number] = [WATER[0][0], WATER[WATER.length - 1][0]];

/** Water at a temperature in °C (10–60); throws RangeError outside the table. */
export function waterProperties(temperatureC: number): LiquidProperties {
  const [lo, hi] = WATER_TEMPERATURE_RANGE_C;
  if (!(temperatureC >= lo && temperatureC <= hi)) throw new RangeError(`temperatureC must be within ${lo}–${hi} °C (the table's range), got ${temperatureC}`);
  let i = 0;
  while (i < WATER.length - 2 && temperatureC > WATER[i + 1][0]) i++;
  const [t0, r0, n0] = WATER[i];
  const [t1, r1, n1] = WATER[i + 1];
  const s = (temperatureC - t0) / (t1 - t0);
  return { densityKgPerM3: r0 + s * (r1 - r0), kinematicViscosityM2PerS: (n0 + s * (n1 - n0)) * 1e-6 };
}
