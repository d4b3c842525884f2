/**
 * The resonance inputs of a case ("what can drive it"): current or flow, waves, machinery, damping and the
 * separation margin, as typed, read into the screening's CaseExcitation for a built member.
 * Which fields a kind offers and how its flow is read is the kind's `ResonanceSpec` (src/kinds/<kind>/);
 * the field groups it picks from are in resonance-fields.ts.
 */
import type { CaseExcitation } from '../physics/excitation/from-member';
import { DEFAULT_DAMPING, DEFAULT_LIMITS, FRESH_WATER, SEAWATER } from '../physics/excitation';
import type { LimitOverrides } from '../physics/excitation/types';
import type { FlowPoint, Machine } from '../physics/excitation/types';
import type { MemberBuild } from '../kinds/common/types';
import type { UnitSystem } from '../units';
import { convertFieldValues } from './define';
import { makeReader, readFields } from './read';
import type { FieldDef, FieldErrors, FieldValues } from './types';

/** What a member kind offers as resonance inputs and how they are read. */
export interface ResonanceSpec {
  /** The fields, in display order (picked from resonance-fields.ts). */
  fields: readonly FieldDef[];
  /**
   * 'current-profile': a current at the surface, mid-depth and bed over the liquid range (fields
   * currentSurface, currentMid, currentBed); 'flow-speed': one optional speed (field flowSpeed), 0 when empty.
   */
  flow: 'current-profile' | 'flow-speed';
  /** Reads the wave-period pair (fields wavePeriodMin, wavePeriodMax). */
  waves: boolean;
  /** Screens the shedding-to-natural frequency ratio f_s/f_n (field stemRatioMax). */
  frequencyRatioScreen: boolean;
}

export function excitationDefaults(spec: ResonanceSpec, system: UnitSystem): FieldValues {
  const fields = spec.fields;
  return convertFieldValues(fields, Object.fromEntries(fields.map((f) => [f.key, f.default])), 'si', system);
}

export function convertExcitationValues(spec: ResonanceSpec, values: FieldValues, from: UnitSystem, to: UnitSystem): FieldValues {
  return convertFieldValues(spec.fields, values, from, to);
}

/** Current profile points along the member axis: bed at the bottom of the liquid, surface at its top. */
function currentProfile(build: MemberBuild, surface: number, mid: number | undefined, bed: number | undefined): number | FlowPoint[] {
  const liquid = build.model.liquid;
  const m = mid ?? surface;
  const b = bed ?? surface;
  if (!liquid || (m === surface && b === surface)) return surface;
  const zBed = liquid.fromM;
  const zTop = liquid.toM;
  return [
    { zM: zBed, speedMPerS: b },
    { zM: 0.5 * (zBed + zTop), speedMPerS: m },
    { zM: zTop, speedMPerS: surface },
  ];
}

/** Limits that differ from the published defaults (those keep their own source; edited ones say "entered by user"). */
function readLimits(spec: ResonanceSpec, r: ReturnType<typeof makeReader>, errs: FieldErrors): LimitOverrides | undefined {
  const out: LimitOverrides = {};
  const d = DEFAULT_LIMITS;
  const inMin = r.num('inLineVrMin');
  const inMax = r.num('inLineVrMax');
  const cfMin = r.num('crossFlowVrMin');
  const cfMax = r.num('crossFlowVrMax');
  if (!(inMax > inMin)) errs.inLineVrMax = `the in-line range must end above where it starts (${inMin})`;
  if (!(cfMax > cfMin)) errs.crossFlowVrMax = `the cross-flow range must end above where it starts (${cfMin})`;
  if (inMin !== d.inLineReducedVelocity.min || inMax !== d.inLineReducedVelocity.max) out.inLineReducedVelocity = { min: inMin, max: inMax };
  if (cfMin !== d.crossFlowReducedVelocity.min || cfMax !== d.crossFlowReducedVelocity.max) out.crossFlowReducedVelocity = { min: cfMin, max: cfMax };
  const ks = r.num('inLineKsMax');
  if (ks !== d.inLineStabilityMax.value) out.inLineStabilityMax = { value: ks };
  if (spec.frequencyRatioScreen) {
    const ratio = r.num('stemRatioMax');
    if (ratio !== d.stemFrequencyRatioMax.value) out.stemFrequencyRatioMax = { value: ratio };
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

/**
 * The machine of the MACHINE fields (resonance-fields.ts) as the screening takes it: shaft speed in Hz, blade
 * count, highest speed and the orders; none when the shaft speed is empty. Messages go into `errs` by field key.
 */
export function readMachinery(r: ReturnType<typeof makeReader>, errs: FieldErrors): Machine[] {
  const machinery: Machine[] = [];
  // The frequency dimension reads "1780 rpm" into Hz, the core's unit for shaft speed.
  const hz = r.opt('machineSpeed');
  const blades = r.opt('bladeCount');
  const hzMax = r.opt('machineSpeedMax');
  if (blades !== undefined && !Number.isInteger(blades)) errs.bladeCount = `blades or vanes must be a whole number, got ${blades}`;
  if (hz === undefined && (blades !== undefined || hzMax !== undefined)) errs.machineSpeed = 'enter the shaft speed, or clear the blade count and highest speed';
  if (hz !== undefined && hzMax !== undefined && !(hzMax >= hz)) errs.machineSpeedMax = `highest shaft speed must be at least the shaft speed (${r.fmt('machineSpeed', hz)})`;
  if (hz !== undefined) {
    machinery.push({
      label: 'machine',
      shaftSpeedHz: hz,
      shaftSpeedMaxHz: hzMax,
      bladeCount: blades,
      shaftOrders: r.list('shaftOrders'),
      bladePassOrders: blades !== undefined ? r.list('bladePassOrders') : undefined,
    });
  }
  return machinery;
}

/**
 * One flow speed: as entered, or from a volume flow rate and the pipe bore, U = Q / (π d²/4) (the mean speed,
 * classical), when the kind offers those fields (flowRate, pipeBore) and the speed is left empty; 0 when neither.
 */
function flowSpeedOrRate(spec: ResonanceSpec, r: ReturnType<typeof makeReader>, errs: FieldErrors): number {
  const u = r.opt('flowSpeed');
  if (!spec.fields.some((f) => f.key === 'flowRate')) return u ?? 0;
  const q = r.opt('flowRate');
  if (q === undefined) return u ?? 0;
  if (u !== undefined) {
    errs.flowRate = 'enter either the flow speed or the flow rate: clear one of them';
    return 0;
  }
  const bore = r.opt('pipeBore');
  if (bore === undefined) {
    errs.pipeBore = 'give the pipe bore to turn the flow rate into a flow speed';
    return 0;
  }
  return q / ((Math.PI / 4) * bore * bore);
}

/** `warnings`: accepted values outside their soft range (a 3 m/s current), by field key. */
export type ExcitationReadResult = { ok: true; excitation: CaseExcitation; warnings?: FieldErrors } | { ok: false; errors: FieldErrors };

/** Reads the resonance inputs for a built member; messages by field key, in the user's units. */
export function readExcitation(spec: ResonanceSpec, values: FieldValues, system: UnitSystem, build: MemberBuild): ExcitationReadResult {
  const fields = spec.fields;
  const { read, errors, warnings } = readFields(fields, values, system);
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const r = makeReader(fields, read, system);
  const errs: FieldErrors = {};

  const flowSpeedMPerS =
    spec.flow === 'current-profile'
      ? currentProfile(build, r.num('currentSurface'), r.opt('currentMid'), r.opt('currentBed'))
      : flowSpeedOrRate(spec, r, errs);

  let waves: CaseExcitation['waves'];
  if (spec.waves) {
    const tMin = r.opt('wavePeriodMin');
    const tMax = r.opt('wavePeriodMax');
    if ((tMin === undefined) !== (tMax === undefined)) {
      errs[tMin === undefined ? 'wavePeriodMin' : 'wavePeriodMax'] = 'give both wave periods, or neither for no wave check';
    } else if (tMin !== undefined && tMax !== undefined) {
      if (!(tMax >= tMin)) errs.wavePeriodMax = `longest wave period must be at least the shortest (${r.fmt('wavePeriodMin', tMin)})`;
      else waves = { periodMinS: tMin, periodMaxS: tMax };
    }
  }

  const machinery = readMachinery(r, errs);
  const limits = readLimits(spec, r, errs);
  if (Object.keys(errs).length > 0) return { ok: false, errors: errs };

  const rho = build.model.liquid?.densityKgPerM3 ?? SEAWATER.densityKgPerM3;
  // Viscosity only sets the Reynolds number (hence St): seawater's for salt water, fresh water's otherwise.
  const base = rho >= 1010 ? SEAWATER : FRESH_WATER;
  const margin = r.num('separationMargin');
  return {
    ok: true,
    warnings,
    excitation: {
      flowSpeedMPerS,
      liquid: { densityKgPerM3: rho, kinematicViscosityM2PerS: base.kinematicViscosityM2PerS, source: `density as entered; viscosity of ${base === SEAWATER ? 'seawater' : 'fresh water'} (${base.source})` },
      // Left out when it is the default, so the screening shows the default's source rather than "entered by user".
      dampingRatio: r.num('dampingRatio') === DEFAULT_DAMPING.ratio ? undefined : r.num('dampingRatio'),
      stemFrequencyRatioScreen: spec.frequencyRatioScreen,
      waves,
      machinery: machinery.length > 0 ? machinery : undefined,
      machineryAgainst: r.choice('machineryAgainst') === 'wet-and-dry' ? 'wet-and-dry' : 'wet',
      limits: margin !== DEFAULT_LIMITS.separationMargin.value ? { ...limits, separationMargin: { value: margin } } : limits,
    },
  };
}
