/**
 * How severe a vortex-shedding resonance would be: the stability parameter and an indicative cross-flow
 * amplitude. For screening only: the amplitude is "indicative", not a response prediction.
 *
 * Stability parameter (DNV-RP-C205 §9): K_S = 4π m_e ζ / (ρ D²), m_e the effective mass per length (structure,
 * contents and added mass, mode-weighted), ζ the total damping ratio. The Scruton number
 * Sc = 2 m_e δ / (ρ D²) with δ = 2π ζ the logarithmic decrement equals K_S.
 *
 * Cross-flow amplitude at lock-in: R.D. Blevins, Flow-Induced Vibration, 2nd ed. (Van Nostrand Reinhold, 1990),
 * §3.4 (docs/sources.md §S6.6), fit to measured peak amplitudes of elastically mounted and flexible cylinders:
 *   A/D = 0.07 γ / ((δ_r + 1.9) St²) · [0.3 + 0.72 / ((δ_r + 1.9) St)]^½,   δ_r = 2 m (2π ζ) / (ρ D²)
 * with the mode factor γ (1 for a rigid cylinder on springs, 1.155 for a pinned–pinned sine mode, 1.305 for a
 * cantilever's first mode).
 *
 * Damping, common screening values: structural damping of a welded steel member 0.5 % of critical (DNV-RP-F105
 * §6.2 gives 0.005 for a steel pipe alone); hydrodynamic damping is small at lock-in and is taken as zero for
 * the cross-flow amplitude (conservative), as DNV-RP-F105 does inside the lock-in range.
 */

export const STEEL_STRUCTURAL_DAMPING_RATIO = 0.005;

/** Mode factors γ for the amplitude fit, as tabulated with it in Blevins, Flow-Induced Vibration (1990) §3.4. */
export const MODE_FACTOR = { rigid: 1, 'pinned-pinned': 1.155, cantilever: 1.305 } as const;
export type ModeShapeKind = keyof typeof MODE_FACTOR;

/** K_S = 4π m_e ζ / (ρ D²) (DNV-RP-C205 §9); equal to the Scruton number 2 m_e δ / (ρ D²). */
export function stabilityParameter(effectiveMassKgPerM: number, dampingRatio: number, liquidDensityKgPerM3: number, diameterM: number): number {
  return (4 * Math.PI * effectiveMassKgPerM * dampingRatio) / (liquidDensityKgPerM3 * diameterM * diameterM);
}

/** Indicative peak cross-flow amplitude A/D at lock-in (Blevins 1990 §3.4 fit). */
export function crossFlowAmplitudeRatio(stability: number, strouhal: number, modeFactor: number): number {
  const d = stability + 1.9;
  return ((0.07 * modeFactor) / (d * strouhal * strouhal)) * Math.sqrt(0.3 + 0.72 / (d * strouhal));
}
