/**
 * The public entry of resonance screening: every mode against vortex shedding (DNV-RP-C205 §9 in-line and
 * cross-flow ranges, optional stem f_s/f_n screen), machinery orders and the wave band, each with a verdict,
 * a margin, a critical speed where one exists, and the source of the rule. The case verdict is the worst.
 */
import { DEFAULT_DAMPING, mergeLimits, SEAWATER } from './defaults';
import { sig } from './format';
import { severityOf } from './severity';
import { machineryCheck, machineryLines } from './machinery';
import { fastestSheddingLocation, locateModeInFlow } from './mode-location';
import type { CaseDriver, CheckResult, ModeScreening, ScreeningResult } from './results';
import type { SheddingConditions } from './shedding-point';
import { sheddingPoint } from './shedding-point';
import { stemCheck } from './stem';
import type { LiquidProperties, ScreeningInput } from './types';
import { validateScreeningInput } from './validate';
import { compareSeverity, EDGE_RTOL, worstIndex } from './verdict';
import { crossFlowCheck, inLineCheck } from './viv';
import { waveCheck } from './waves';
import { zoneShedding } from './zone-shedding';

/**
 * Screen a case. Throws ScreeningInputError (a RangeError naming field, expectation and value) on invalid
 * input; otherwise always returns finite numbers or null, never NaN.
 */
export function screenResonance(input: ScreeningInput): ScreeningResult {
  const inp = validateScreeningInput(input);
  const limits = mergeLimits(inp.limits);
  const liquid: Required<LiquidProperties> = inp.liquid
    ? { ...inp.liquid, source: inp.liquid.source ?? 'entered by user' }
    : SEAWATER;
  const damping =
    inp.dampingRatio !== undefined ? { ratio: inp.dampingRatio, source: 'entered by user' } : { ...DEFAULT_DAMPING };
  const cond: SheddingConditions = { liquid, dampingRatio: damping.ratio, strouhal: inp.strouhal };
  const margin = limits.separationMargin;
  const lines = (inp.machinery ?? []).flatMap((m, i) => machineryLines(m, i));
  const alsoDry = inp.machineryAgainst === 'wet-and-dry';

  const modes: ModeScreening[] = inp.modes.map((mode, modeIndex) => {
    const f = mode.wetFrequencyHz;
    const loc = locateModeInFlow(mode, inp.zones, inp.flowSpeedMPerS);
    const me = mode.effectiveMassKgPerM ?? inp.effectiveMassKgPerM;
    const point = loc.ok ? sheddingPoint(loc.location, f, me, cond) : null;
    const notSubmergedReason = loc.ok ? undefined : loc.message;
    const nonCircular = loc.ok && loc.location.section.kind !== 'circle';
    const viv = { frequencyHz: f, point, notSubmergedReason, limits, nonCircular };
    const checks: CheckResult[] = [inLineCheck(viv), crossFlowCheck(viv)];
    if (inp.stemFrequencyRatioScreen) {
      // The stem screen is taken where shedding is fastest, if that is not where the mode moves most
      // (a slimmer root, a shielded tip): the higher f_s governs.
      const fast = loc.ok ? fastestSheddingLocation(mode, inp.zones, inp.flowSpeedMPerS) : null;
      const governs = fast !== null && point !== null && fast.flowSpeedMPerS / fast.sizeM > (point.flowSpeedMPerS / point.characteristicSizeM) * (1 + EDGE_RTOL);
      const stemPoint = governs ? sheddingPoint(fast, f, me, cond) : point;
      checks.push(
        stemCheck({
          frequencyHz: f,
          point: stemPoint,
          elsewhere: governs,
          notSubmergedReason,
          section: governs ? fast.section : loc.ok ? loc.location.section : null,
          kinematicViscosityM2PerS: liquid.kinematicViscosityM2PerS,
          strouhalOverrideValue: inp.strouhal?.value,
          limits,
        }),
      );
    }
    for (const line of lines) {
      checks.push(machineryCheck(line, f, 'wet', margin));
      if (alsoDry && mode.dryFrequencyHz !== undefined) checks.push(machineryCheck(line, mode.dryFrequencyHz, 'dry', margin));
    }
    if (inp.waves) checks.push(waveCheck(inp.waves, f, margin));
    const driverCheckIndex = worstIndex(checks);
    const result: ModeScreening = {
      modeIndex,
      wetFrequencyHz: f,
      shedding: point,
      checks,
      verdict: driverCheckIndex >= 0 ? checks[driverCheckIndex].verdict : 'clear',
      driverCheckIndex,
    };
    if (mode.dryFrequencyHz !== undefined) result.dryFrequencyHz = mode.dryFrequencyHz;
    if (notSubmergedReason !== undefined) result.notSubmergedReason = notSubmergedReason;
    return result;
  });

  // Worst over modes: compare each mode's driving check; the first of equals (lowest mode) wins.
  let driver: CaseDriver | null = null;
  let driverCheck: CheckResult | null = null;
  for (const m of modes) {
    if (m.driverCheckIndex < 0) continue;
    const c = m.checks[m.driverCheckIndex];
    if (driverCheck === null || compareSeverity(c, driverCheck) < 0) {
      driverCheck = c;
      driver = { modeIndex: m.modeIndex, checkIndex: m.driverCheckIndex, kind: c.kind, label: c.label, marginPercent: c.marginPercent };
    }
  }

  const notes: string[] = [
    'Critical speeds are flow speeds at each mode’s evaluation point (where it moves most under water); ' +
      'with a current profile, the whole profile must scale by U_crit / U there.',
  ];
  if (inp.zones.some((z) => z.section.kind !== 'circle')) {
    notes.push('DNV-RP-C205 §9 V_R ranges are for circular cylinders; for rectangles they are applied as an indication (D = width across flow).');
  }
  for (const label of new Set(inp.zones.filter((z) => z.shieldedBy !== undefined).map((z) => z.shieldedBy!))) {
    const z = inp.zones.filter((x) => x.shieldedBy === label);
    const u = z[0].flowSpeedMPerS!;
    notes.push(
      `Shielded ${label} (z = ${sig(z[0].fromM)}–${sig(z[z.length - 1].toM)} m): shedding there is checked with the flow inside, ` +
        `U = ${sig(u)} m/s${u === 0 ? ' (still water)' : ''}, not the open current.`,
    );
  }
  if (inp.dampingRatio === undefined) notes.push(`Damping not given: ${DEFAULT_DAMPING.source}.`);
  if (inp.waves) notes.push('The wave check compares natural frequencies with wave frequencies only; it does not assess wave loads.');

  const shedding = driver !== null && (driver.kind === 'in-line-viv' || driver.kind === 'cross-flow-viv' || driver.kind === 'stem-frequency-ratio');
  const drivingPoint = driver !== null ? modes[driver.modeIndex].shedding : null;
  const severity = shedding && drivingPoint ? severityOf(driver!.modeIndex, inp.modes[driver!.modeIndex], drivingPoint, damping) : null;

  return {
    verdict: driverCheck ? driverCheck.verdict : 'clear',
    driver,
    severity,
    modes,
    zones: inp.zones.map((z, i) => zoneShedding(z, i, inp.flowSpeedMPerS, cond)),
    limits,
    liquid,
    damping,
    notes,
  };
}
