/**
 * The dimensionless groups of vortex-shedding screening. Plain formulas, no checks:
 * callers validate at the public entry (`screenResonance`).
 */

/** Reynolds number Re = U·D/ν (classical). */
export function reynoldsNumber(speedMPerS: number, sizeM: number, kinematicViscosityM2PerS: number): number {
  return (speedMPerS * sizeM) / kinematicViscosityM2PerS;
}

/** Vortex-shedding frequency f_s = St·U/D, Hz (classical Strouhal relation). */
export function sheddingFrequencyHz(strouhal: number, speedMPerS: number, sizeM: number): number {
  return (strouhal * speedMPerS) / sizeM;
}

/** Reduced velocity V_R = U / (f_n·D) (DNV-RP-C205 §9). */
export function reducedVelocity(speedMPerS: number, naturalFrequencyHz: number, sizeM: number): number {
  return speedMPerS / (naturalFrequencyHz * sizeM);
}

/** Flow speed at which V_R reaches `reducedVelocity`: U = V_R·f_n·D (inverse of the above). */
export function speedForReducedVelocity(reducedVelocityValue: number, naturalFrequencyHz: number, sizeM: number): number {
  return reducedVelocityValue * naturalFrequencyHz * sizeM;
}

/**
 * Stability parameter K_S = 4π·m_e·ζ / (ρ·D²) (DNV-RP-C205 §9), with m_e the effective mass per metre
 * (structure + contents + added mass, mode-weighted), ζ the damping ratio and ρ the liquid density.
 */
export function stabilityParameter(
  effectiveMassKgPerM: number,
  dampingRatio: number,
  liquidDensityKgPerM3: number,
  sizeM: number,
): number {
  return (4 * Math.PI * effectiveMassKgPerM * dampingRatio) / (liquidDensityKgPerM3 * sizeM * sizeM);
}
