/**
 * Vortex-induced vibration screens on reduced velocity, DNV-RP-C205 §9:
 * in-line VIV for V_in,min ≤ V_R ≤ V_in,max (1.0 … 4.5) when K_S ≤ 1.8; cross-flow VIV for 3.0 ≤ V_R ≤ 16.
 * The ranges are closed: V_R exactly on a limit is inside. The critical speed is the flow speed at the mode's
 * evaluation point where V_R reaches the range's lower limit: U_crit = V_R,min · f_n · D.
 */
import { sig } from './format';
import { speedForReducedVelocity } from './formulas';
import { unreachedCheck, type CheckResult, type SheddingPoint } from './results';
import type { ReducedVelocityRange, ScreeningLimits } from './types';
import { classifyFrequency, EDGE_RTOL } from './verdict';

export interface VivContext {
  frequencyHz: number;
  /** null when the mode has no submerged length; then `notSubmergedReason` is given. */
  point: SheddingPoint | null;
  notSubmergedReason?: string;
  limits: ScreeningLimits;
  /** True for a non-circular section: DNV-RP-C205 §9 ranges are for circular cylinders. */
  nonCircular: boolean;
}

function rangeCheck(
  kind: 'in-line-viv' | 'cross-flow-viv',
  label: string,
  range: ReducedVelocityRange,
  ctx: VivContext,
  extraSource: string,
): CheckResult {
  const base = { kind, label, frequencyBasis: 'wet' as const, frequencyHz: ctx.frequencyHz, source: range.source + extraSource };
  const p = ctx.point;
  if (p === null) return unreachedCheck(base, null, ctx.notSubmergedReason ?? 'not submerged');
  const d = p.characteristicSizeM;
  const uCrit = speedForReducedVelocity(range.min, ctx.frequencyHz, d);
  const caveat = ctx.nonCircular ? ' (range for circular cylinders, applied here as an indication)' : '';
  if (p.flowSpeedMPerS === 0) {
    return unreachedCheck(
      base,
      uCrit,
      `not excited by shedding: zero flow speed at z = ${sig(p.atZM)} m where the mode moves most; ${label} would begin at U = ${sig(uCrit)} m/s${caveat}`,
    );
  }
  const u = p.flowSpeedMPerS;
  const bandHz = { lowHz: u / (range.max * d), highHz: u / (range.min * d) };
  const { verdict, marginPercent } = classifyFrequency(ctx.frequencyHz, bandHz, ctx.limits.separationMargin.value);
  const where = verdict === 'inside-band' ? 'within' : p.reducedVelocity < range.min ? 'below' : 'above';
  return {
    ...base,
    verdict,
    marginPercent,
    bandHz,
    criticalSpeedMPerS: uCrit,
    reason:
      `V_R = ${sig(p.reducedVelocity)} ${where} ${sig(range.min)}–${sig(range.max)} at z = ${sig(p.atZM)} m ` +
      `(U = ${sig(u)} m/s, D = ${sig(d)} m); begins at U = ${sig(uCrit)} m/s${caveat}`,
  };
}

export function inLineCheck(ctx: VivContext): CheckResult {
  const { limits } = ctx;
  const ksMax = limits.inLineStabilityMax.value;
  const p = ctx.point;
  const extra = `; ${limits.inLineStabilityMax.source}`;
  // K_S above the limit: the in-line range is damped out at every speed (DNV-RP-C205 §9), so no critical speed.
  if (p !== null && p.stabilityParameter > ksMax * (1 + EDGE_RTOL)) {
    return unreachedCheck(
      { kind: 'in-line-viv', label: 'in-line VIV', frequencyBasis: 'wet', frequencyHz: ctx.frequencyHz, source: limits.inLineReducedVelocity.source + extra },
      null,
      `in-line VIV not expected: K_S = ${sig(p.stabilityParameter)} > ${sig(ksMax)} (damping and mass suppress it at any speed)`,
    );
  }
  const r = rangeCheck('in-line-viv', 'in-line VIV', limits.inLineReducedVelocity, ctx, extra);
  if (p !== null && r.bandHz !== null) r.reason += `; K_S = ${sig(p.stabilityParameter)} ≤ ${sig(ksMax)}`;
  return r;
}

export function crossFlowCheck(ctx: VivContext): CheckResult {
  return rangeCheck('cross-flow-viv', 'cross-flow VIV', ctx.limits.crossFlowReducedVelocity, ctx, '');
}
