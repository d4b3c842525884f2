/**
 * Effective tension of a pipe or riser under internal and external pressure:
 *   T_eff = T_wall − p_i·A_i + p_e·A_e
 * R. Sparks, "The influence of tension, pressure and weight on pipe and riser deformations and stresses",
 * ASME J. Energy Resources Technology 106 (1984) 46 (docs/sources.md §S10). Bending frequencies (geometric stiffness) use T_eff;
 * a load cell on the wall reads T_wall. A_i = π D_i²/4 and A_e = π D_o²/4 are the bore and the outside areas.
 */

export interface EffectiveTensionInput {
  /** True wall tension, N (what a load cell in the wall reads); negative = compression. */
  wallTensionN: number;
  /** Internal pressure, Pa (gauge pressures are fine when both are gauge). */
  internalPressurePa: number;
  /** External (hydrostatic) pressure at the same level, Pa. */
  externalPressurePa: number;
  outerDiameterM: number;
  innerDiameterM: number;
}

export interface EffectiveTension {
  effectiveTensionN: number;
  /** p_i·A_i, N: what internal pressure takes off the tension that governs bending. */
  internalPressureTermN: number;
  /** p_e·A_e, N. */
  externalPressureTermN: number;
}

function check(name: string, v: number, ok: (x: number) => boolean, expected: string): void {
  if (!ok(v)) throw new RangeError(`${name} must be ${expected}, got ${v}`);
}

/** Sparks' effective tension; throws RangeError for input that is not finite or not geometric. */
export function effectiveTension(input: EffectiveTensionInput): EffectiveTension {
  const { wallTensionN, internalPressurePa, externalPressurePa, outerDiameterM, innerDiameterM } = input;
  check('wallTensionN', wallTensionN, Number.isFinite, 'a finite number');
  check('internalPressurePa', internalPressurePa, Number.isFinite, 'a finite number');
  check('externalPressurePa', externalPressurePa, Number.isFinite, 'a finite number');
  check('outerDiameterM', outerDiameterM, (x) => x > 0 && Number.isFinite(x), 'a finite number > 0');
  check('innerDiameterM', innerDiameterM, (x) => x >= 0 && x < outerDiameterM, `≥ 0 and below the outer diameter (${outerDiameterM} m)`);
  const internalPressureTermN = internalPressurePa * (Math.PI / 4) * innerDiameterM * innerDiameterM;
  const externalPressureTermN = externalPressurePa * (Math.PI / 4) * outerDiameterM * outerDiameterM;
  return { effectiveTensionN: wallTensionN - internalPressureTermN + externalPressureTermN, internalPressureTermN, externalPressureTermN };
}

/** Hydrostatic pressure ρ g h at a depth below a free surface, Pa (g = 9.80665 m/s², standard gravity). */
export function hydrostaticPressurePa(densityKgPerM3: number, depthM: number): number {
  return densityKgPerM3 * 9.80665 * Math.max(0, depthM);
}
