/**
 * How severe a shedding resonance would be, for the mode that drives the verdict: the stability parameter
 * (Scruton number) and an indicative cross-flow amplitude A/D at lock-in from the published response fit in
 * physics/practice/severity.ts (R.D. Blevins, Flow-Induced Vibration, 2nd ed., 1990, §3.4). Indicative only:
 * a screening figure beside the verdict, not a response prediction.
 *
 * Mode factor γ = |φ|max (∫φ² dz / ∫φ⁴ dz)^½ over the mode (Blevins 1990 §3.4, the definition behind the
 * tabulated 1, 1.155 and 1.305), by the trapezoid rule on the mode's nodes.
 * Damping: the case's structural damping ratio with its source; hydrodynamic damping is taken as zero at
 * lock-in (conservative, as DNV-RP-F105 does inside the lock-in range).
 */
import { crossFlowAmplitudeRatio } from '../practice/severity';
import type { SheddingPoint } from './results';
import type { ScreeningMode } from './types';

export const SEVERITY_SOURCE =
  'indicative: A/D from the fit to measured peak amplitudes in R.D. Blevins, Flow-Induced Vibration, 2nd ed. (1990) §3.4; K_S = 4π m_e ζ/(ρ D²) (DNV-RP-C205 §9), equal to the Scruton number; hydrodynamic damping taken as zero at lock-in';

export interface Severity {
  modeIndex: number;
  /** K_S = Sc = 4π m_e ζ/(ρ D²) at the mode's evaluation point. */
  stabilityParameter: number;
  /** ζ used (structural only), and where it comes from. */
  dampingRatio: number;
  dampingSource: string;
  /** γ of the mode shape. */
  modeFactor: number;
  /** St used (the one at the evaluation point). */
  strouhal: number;
  /** Indicative peak cross-flow amplitude over diameter at lock-in. */
  amplitudeRatio: number;
  source: string;
}

/** γ = |φ|max (∫φ² / ∫φ⁴)^½ by the trapezoid rule on the nodes. */
export function modeFactorOf(mode: Pick<ScreeningMode, 'zM' | 'displacement'>): number {
  let max = 0;
  let i2 = 0;
  let i4 = 0;
  const n = mode.zM.length;
  for (let i = 0; i < n; i++) max = Math.max(max, Math.abs(mode.displacement[i]));
  if (max === 0) return 1;
  for (let i = 0; i + 1 < n; i++) {
    const dz = mode.zM[i + 1] - mode.zM[i];
    const a = mode.displacement[i] / max;
    const b = mode.displacement[i + 1] / max;
    i2 += 0.5 * dz * (a * a + b * b);
    i4 += 0.5 * dz * (a ** 4 + b ** 4);
  }
  return i4 > 0 ? Math.sqrt(i2 / i4) : 1;
}

export function severityOf(modeIndex: number, mode: ScreeningMode, point: SheddingPoint, damping: { ratio: number; source: string }): Severity {
  const gamma = modeFactorOf(mode);
  const st = point.strouhal.value;
  return {
    modeIndex,
    stabilityParameter: point.stabilityParameter,
    dampingRatio: damping.ratio,
    dampingSource: damping.source,
    modeFactor: gamma,
    strouhal: st,
    amplitudeRatio: crossFlowAmplitudeRatio(point.stabilityParameter, st, gamma),
    source: SEVERITY_SOURCE,
  };
}
