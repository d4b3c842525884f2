/**
 * Sensor-stem screen: the shedding frequency should stay at or below a fraction of the natural frequency,
 * f_s / f_n ≤ r_max (0.8, common practice; docs/sources.md §S6.3).
 * Equality passes, so the excitation band in mode frequency is f_n < f_s / r_max (upper edge excluded).
 * The critical speed is the flow speed at which f_s = r_max · f_n.
 */
import { sig } from './format';
import { sheddingFrequencyHz } from './formulas';
import { unreachedCheck, type CheckResult, type SheddingPoint } from './results';
import { strouhalRegimes } from './strouhal';
import type { ScreeningLimits, ZoneSection } from './types';
import { classifyFrequency } from './verdict';

/**
 * Flow speed U at which St(Re(U)) · U / D = target, m/s. St depends on Re in steps and never falls as Re rises
 * (strouhal.ts uses the upper end of each band), so f_s(U) increases with U and the answer is unique:
 * try each Re regime in turn; if the target falls in the jump between two regimes, the answer is the regime
 * boundary (just above it f_s exceeds the target).
 */
export function speedForSheddingFrequency(
  targetHz: number,
  sizeM: number,
  section: ZoneSection,
  kinematicViscosityM2PerS: number,
  strouhalOverrideValue?: number,
): number {
  if (strouhalOverrideValue !== undefined) return (targetHz * sizeM) / strouhalOverrideValue;
  for (const { reFrom, reTo, st } of strouhalRegimes(section)) {
    const u = (targetHz * sizeM) / st.value;
    const re = (u * sizeM) / kinematicViscosityM2PerS;
    if (re < reFrom) return (reFrom * kinematicViscosityM2PerS) / sizeM;
    if (re <= reTo) return u;
  }
  // Unreachable: the last regime runs to infinity.
  return Infinity;
}

export interface StemContext {
  frequencyHz: number;
  point: SheddingPoint | null;
  /** True when the point is where shedding is fastest rather than where the mode moves most (it governs there). */
  elsewhere?: boolean;
  notSubmergedReason?: string;
  section: ZoneSection | null;
  kinematicViscosityM2PerS: number;
  strouhalOverrideValue?: number;
  limits: ScreeningLimits;
}

export function stemCheck(ctx: StemContext): CheckResult {
  const rMax = ctx.limits.stemFrequencyRatioMax.value;
  const base = {
    kind: 'stem-frequency-ratio' as const,
    label: `stem f_s/f_n ≤ ${sig(rMax)}`,
    frequencyBasis: 'wet' as const,
    frequencyHz: ctx.frequencyHz,
    source: ctx.limits.stemFrequencyRatioMax.source,
  };
  const p = ctx.point;
  if (p === null || ctx.section === null) return unreachedCheck(base, null, ctx.notSubmergedReason ?? 'not submerged');
  const uCrit = speedForSheddingFrequency(
    rMax * ctx.frequencyHz,
    p.characteristicSizeM,
    ctx.section,
    ctx.kinematicViscosityM2PerS,
    ctx.strouhalOverrideValue,
  );
  if (p.flowSpeedMPerS === 0) {
    return unreachedCheck(base, uCrit, `not excited by shedding: zero flow speed at z = ${sig(p.atZM)} m; f_s would reach ${sig(rMax)} f_n at U = ${sig(uCrit)} m/s`);
  }
  const fs = sheddingFrequencyHz(p.strouhal.value, p.flowSpeedMPerS, p.characteristicSizeM);
  const bandHz = { lowHz: 0, highHz: fs / rMax };
  const { verdict, marginPercent } = classifyFrequency(
    ctx.frequencyHz,
    { ...bandHz, highInclusive: false },
    ctx.limits.separationMargin.value,
  );
  return {
    ...base,
    verdict,
    marginPercent,
    bandHz,
    criticalSpeedMPerS: uCrit,
    reason:
      `f_s / f_n = ${sig(fs / ctx.frequencyHz)} (f_s = ${sig(fs)} Hz with St = ${sig(p.strouhal.value)}, ` +
      `U = ${sig(p.flowSpeedMPerS)} m/s, D = ${sig(p.characteristicSizeM)} m` +
      `${ctx.elsewhere ? `, at z = ${sig(p.atZM)} m where shedding is fastest, which governs` : ''}); limit ${sig(rMax)} reached at U = ${sig(uCrit)} m/s`,
    source: `${base.source}; St: ${p.strouhal.source}`,
  };
}
