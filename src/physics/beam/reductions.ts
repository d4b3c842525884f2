/**
 * Reductions of the two-dimensional (strip-theory) added mass: perforated plates and three-dimensional
 * end effects of short submerged lengths, from DNV-RP-H103 (Modelling and Analysis of Marine Operations).
 * The tables and the formula below were recalled, not re-read against the document: docs/sources.md §S4 keeps
 * that note; the results cite the standard, its section and table.
 */

export const PERFORATION_SOURCE = 'DNV-RP-H103, Modelling and Analysis of Marine Operations, §4.6.4.3';
export const END_EFFECT_SOURCE = 'DNV-RP-H103, Modelling and Analysis of Marine Operations, Table A-2';

/**
 * Factor on the added-mass coefficient of a perforated plate, perforation ratio p (open area / total):
 * none for p ≤ 0.05; 0.7 + 0.3·cos(π(p − 0.05)/0.34) for 0.05 < p ≤ 0.34; exp((0.1 − p)/0.28) for 0.34 < p ≤ 0.5.
 */
export function perforationFactor(p: number): number {
  if (p <= 0.05) return 1;
  if (p <= 0.34) return 0.7 + 0.3 * Math.cos((Math.PI * (p - 0.05)) / 0.34);
  return Math.exp((0.1 - p) / 0.28);
}

/** Piecewise-linear interpolation in x over ascending xs (clamped at both ends). */
function interpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  if (x <= xs[0]) return ys[0];
  for (let i = 1; i < xs.length; i++) {
    if (x <= xs[i]) return ys[i - 1] + ((ys[i] - ys[i - 1]) * (x - xs[i - 1])) / (xs[i] - xs[i - 1]);
  }
  return ys[ys.length - 1];
}

/**
 * Finite circular cylinder moving sideways, length/diameter = 1.2, 2.5, 5.0, 9.0, ∞ → Ca = 0.62, 0.78, 0.90,
 * 0.96, 1.00 (Table A-2; docs/sources.md §S4.1). Interpolated linearly in D/L so that L/D → ∞ reaches 1;
 * below L/D = 1.2 the first value is kept (no extrapolation).
 */
const CYL_D_OVER_L = [0, 1 / 9, 1 / 5, 1 / 2.5, 1 / 1.2];
const CYL_CA = [1.0, 0.96, 0.9, 0.78, 0.62];

export function cylinderEndEffectFactor(lengthOverDiameter: number): number {
  return interpolate(CYL_D_OVER_L, CYL_CA, 1 / lengthOverDiameter);
}

/**
 * Rectangular flat plate normal to itself, sides a ≤ b, b/a = 1, 2, 3, 5, 10, ∞ → Ca = 0.579, 0.757, 0.830,
 * 0.897, 0.947, 1.000 on V_R = (π/4) a² b (Table A-2; docs/sources.md §S4.1); interpolated linearly in a/b.
 */
const PLATE_A_OVER_B = [0, 1 / 10, 1 / 5, 1 / 3, 1 / 2, 1];
const PLATE_CA = [1.0, 0.947, 0.897, 0.83, 0.757, 0.579];

export function plateTableCa(aOverB: number): number {
  return interpolate(PLATE_A_OVER_B, PLATE_CA, aOverB);
}

/**
 * Factor on the strip-theory added mass ρ π (w/2)² × L of a plate strip of width w submerged over L.
 * If L ≥ w the table's a = w and the factor is Ca itself; if L < w, a = L, b = w and
 * the 3D added mass Ca ρ (π/4) L² w divided by the strip value ρ (π/4) w² L gives Ca · L / w.
 */
export function plateEndEffectFactor(submergedLengthM: number, widthM: number): number {
  const a = Math.min(submergedLengthM, widthM);
  const b = Math.max(submergedLengthM, widthM);
  const ca = plateTableCa(a / b);
  return submergedLengthM >= widthM ? ca : (ca * submergedLengthM) / widthM;
}
