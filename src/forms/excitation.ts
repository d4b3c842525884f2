/**
 * The resonance inputs of a case ("what can drive it"): current or flow, waves, machinery, damping and the
 * separation margin, as typed, read into the screening's CaseExcitation for a built member.
 * Fields differ by member kind: piles and risers get a current profile and waves, stems a pipe flow speed
 * (and the f_s/f_n screen), baffles an optional liquid speed.
 */
import type { CaseExcitation } from '../physics/excitation/from-member';
import { DEFAULT_DAMPING, DEFAULT_LIMITS, FRESH_WATER, SEAWATER } from '../physics/excitation';
import type { LimitOverrides } from '../physics/excitation/types';
import type { FlowPoint, Machine } from '../physics/excitation/types';
import type { MemberBuild, MemberKind } from '../physics/members';
import type { UnitSystem } from '../units';
import { convertFieldValues } from './define';
import { POSITIVE, NON_NEGATIVE } from './presets';
import { makeReader, readFields } from './read';
import type { FieldDef, FieldErrors, FieldValues, QuantityField } from './types';

function speed(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'ft/s' }, default: def, min: NON_NEGATIVE, ...extra };
}

const CURRENT: readonly FieldDef[] = [
  speed('currentSurface', 'Current at the surface', '0.5', { help: 'Largest expected current at the water surface (for a tidal stream, the peak of spring tides).' }),
  speed('currentMid', 'Current at mid-depth', '', { optional: true, emptyMeans: 'same as at the surface' }),
  speed('currentBed', 'Current near the bed', '', { optional: true, emptyMeans: 'same as at the surface' }),
];

const WAVES: readonly FieldDef[] = [
  { key: 'wavePeriodMin', label: 'Shortest wave period', type: 'quantity', dimension: 'time', units: { si: 's', us: 's' }, default: '', optional: true, emptyMeans: 'no wave check', min: POSITIVE },
  { key: 'wavePeriodMax', label: 'Longest wave period', type: 'quantity', dimension: 'time', units: { si: 's', us: 's' }, default: '', optional: true, emptyMeans: 'no wave check', min: POSITIVE },
];

const MACHINE: readonly FieldDef[] = [
  {
    key: 'machineSpeed',
    label: 'Nearby machine shaft speed',
    type: 'quantity',
    dimension: 'frequency',
    units: { si: 'rpm', us: 'rpm' },
    default: '',
    optional: true,
    emptyMeans: 'no machine',
    min: POSITIVE,
    help: 'A pump, fan, agitator or propeller near the member; checked at 1× and 2× shaft speed and at blade pass.',
  },
  { key: 'bladeCount', label: 'Blades or vanes', type: 'quantity', dimension: 'ratio', units: { si: '', us: '' }, default: '', optional: true, emptyMeans: 'no blade-pass check', min: { valueSI: 1, inclusive: true } },
  {
    key: 'machineSpeedMax',
    label: 'Highest shaft speed (variable drive)',
    type: 'quantity',
    dimension: 'frequency',
    units: { si: 'rpm', us: 'rpm' },
    default: '',
    optional: true,
    emptyMeans: 'fixed speed',
    min: POSITIVE,
    advanced: true,
  },
  {
    key: 'shaftOrders',
    label: 'Shaft orders to check',
    type: 'quantity-list',
    dimension: 'ratio',
    units: { si: '', us: '' },
    default: '1, 2',
    min: POSITIVE,
    advanced: true,
    help: 'Multiples of the shaft speed: 1 for imbalance, 2 for misalignment (common practice).',
  },
  {
    key: 'bladePassOrders',
    label: 'Blade-pass orders to check',
    type: 'quantity-list',
    dimension: 'ratio',
    units: { si: '', us: '' },
    default: '1',
    min: POSITIVE,
    advanced: true,
    help: 'Multiples of blade-pass frequency (blades × shaft speed); used when the blade count is given.',
  },
];

function limit(key: string, label: string, def: number, source: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'ratio', units: { si: '', us: '' }, default: String(def), min: POSITIVE, advanced: true, help: `Default ${def}: ${source}.`, ...extra };
}

/** The published screening limits, editable; each default shows its source. */
const VIV_LIMITS: readonly FieldDef[] = [
  limit('inLineVrMin', 'In-line lock-in from V_R', DEFAULT_LIMITS.inLineReducedVelocity.min, DEFAULT_LIMITS.inLineReducedVelocity.source),
  limit('inLineVrMax', 'In-line lock-in up to V_R', DEFAULT_LIMITS.inLineReducedVelocity.max, DEFAULT_LIMITS.inLineReducedVelocity.source),
  limit('inLineKsMax', 'In-line only when K_S at most', DEFAULT_LIMITS.inLineStabilityMax.value, DEFAULT_LIMITS.inLineStabilityMax.source),
  limit('crossFlowVrMin', 'Cross-flow lock-in from V_R', DEFAULT_LIMITS.crossFlowReducedVelocity.min, DEFAULT_LIMITS.crossFlowReducedVelocity.source),
  limit('crossFlowVrMax', 'Cross-flow lock-in up to V_R', DEFAULT_LIMITS.crossFlowReducedVelocity.max, DEFAULT_LIMITS.crossFlowReducedVelocity.source),
];

const STEM_LIMIT: readonly FieldDef[] = [
  limit('stemRatioMax', 'Largest f_s / f_n for a stem', DEFAULT_LIMITS.stemFrequencyRatioMax.value, DEFAULT_LIMITS.stemFrequencyRatioMax.source),
];

const COMMON: readonly FieldDef[] = [
  {
    key: 'machineryAgainst',
    label: 'Check machinery against',
    type: 'choice',
    choices: [
      { value: 'wet', label: 'Wet frequencies' },
      { value: 'wet-and-dry', label: 'Wet and dry frequencies', help: 'Also when the liquid is gone but the machine still runs (a drained tank, a low tide).' },
    ],
    default: 'wet',
    advanced: true,
    help: 'Add the dry frequencies when the member can be out of the liquid while the machine runs (a drained tank or sump).',
  },
  {
    key: 'dampingRatio',
    label: 'Structural damping ratio',
    type: 'quantity',
    dimension: 'ratio',
    units: { si: '%', us: '%' },
    default: String(DEFAULT_DAMPING.ratio * 100),
    min: POSITIVE,
    max: { valueSI: 0.2, inclusive: true },
    advanced: true,
    help: `Default ${DEFAULT_DAMPING.ratio * 100} % of critical: ${DEFAULT_DAMPING.source}.`,
  },
  {
    key: 'separationMargin',
    label: 'Frequency separation margin',
    type: 'quantity',
    dimension: 'ratio',
    units: { si: '%', us: '%' },
    default: '20',
    min: POSITIVE,
    max: { valueSI: 1, inclusive: false },
    advanced: true,
    help: 'Keep natural frequencies this far from machinery and wave frequencies: ±20 % is common practice.',
  },
];

const FIELDS: Readonly<Record<MemberKind, readonly FieldDef[]>> = {
  pile: [...CURRENT, ...WAVES, ...MACHINE, ...COMMON, ...VIV_LIMITS],
  riser: [...CURRENT, ...WAVES, ...MACHINE, ...COMMON, ...VIV_LIMITS],
  baffle: [speed('flowSpeed', 'Liquid speed past the baffle', '', { optional: true, emptyMeans: 'no flow' }), ...MACHINE, ...COMMON, ...VIV_LIMITS],
  stem: [speed('flowSpeed', 'Flow speed in the pipe', '2', { help: 'Largest expected flow speed past the stem (design flow rate ÷ pipe bore area).' }), ...MACHINE, ...COMMON, ...VIV_LIMITS, ...STEM_LIMIT],
};

export function excitationFields(kind: MemberKind): readonly FieldDef[] {
  return FIELDS[kind];
}

export function excitationDefaults(kind: MemberKind, system: UnitSystem): FieldValues {
  const fields = FIELDS[kind];
  return convertFieldValues(fields, Object.fromEntries(fields.map((f) => [f.key, f.default])), 'si', system);
}

export function convertExcitationValues(kind: MemberKind, values: FieldValues, from: UnitSystem, to: UnitSystem): FieldValues {
  return convertFieldValues(FIELDS[kind], values, from, to);
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
function readLimits(kind: MemberKind, r: ReturnType<typeof makeReader>, errs: FieldErrors): LimitOverrides | undefined {
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
  if (kind === 'stem') {
    const ratio = r.num('stemRatioMax');
    if (ratio !== d.stemFrequencyRatioMax.value) out.stemFrequencyRatioMax = { value: ratio };
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

export type ExcitationReadResult = { ok: true; excitation: CaseExcitation } | { ok: false; errors: FieldErrors };

/** Reads the resonance inputs for a built member; messages by field key, in the user's units. */
export function readExcitation(kind: MemberKind, values: FieldValues, system: UnitSystem, build: MemberBuild): ExcitationReadResult {
  const fields = FIELDS[kind];
  const { read, errors } = readFields(fields, values, system);
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const r = makeReader(fields, read, system);
  const errs: FieldErrors = {};

  const flowSpeedMPerS =
    kind === 'pile' || kind === 'riser'
      ? currentProfile(build, r.num('currentSurface'), r.opt('currentMid'), r.opt('currentBed'))
      : (r.opt('flowSpeed') ?? 0);

  let waves: CaseExcitation['waves'];
  if (kind === 'pile' || kind === 'riser') {
    const tMin = r.opt('wavePeriodMin');
    const tMax = r.opt('wavePeriodMax');
    if ((tMin === undefined) !== (tMax === undefined)) {
      errs[tMin === undefined ? 'wavePeriodMin' : 'wavePeriodMax'] = 'give both wave periods, or neither for no wave check';
    } else if (tMin !== undefined && tMax !== undefined) {
      if (!(tMax >= tMin)) errs.wavePeriodMax = `longest wave period must be at least the shortest (${r.fmt('wavePeriodMin', tMin)})`;
      else waves = { periodMinS: tMin, periodMaxS: tMax };
    }
  }

  const machinery: Machine[] = [];
  const rpm = r.opt('machineSpeed');
  const blades = r.opt('bladeCount');
  const rpmMax = r.opt('machineSpeedMax');
  if (blades !== undefined && !Number.isInteger(blades)) errs.bladeCount = `blades or vanes must be a whole number, got ${blades}`;
  if (rpm === undefined && (blades !== undefined || rpmMax !== undefined)) errs.machineSpeed = 'enter the shaft speed, or clear the blade count and highest speed';
  if (rpm !== undefined && rpmMax !== undefined && !(rpmMax >= rpm)) errs.machineSpeedMax = `highest shaft speed must be at least the shaft speed (${r.fmt('machineSpeed', rpm)})`;
  if (rpm !== undefined) {
    // The frequency dimension reads rpm into Hz; the screening wants rpm.
    machinery.push({
      label: 'machine',
      shaftSpeedRpm: rpm * 60,
      shaftSpeedMaxRpm: rpmMax !== undefined ? rpmMax * 60 : undefined,
      bladeCount: blades,
      shaftOrders: r.list('shaftOrders'),
      bladePassOrders: blades !== undefined ? r.list('bladePassOrders') : undefined,
    });
  }
  const limits = readLimits(kind, r, errs);
  if (Object.keys(errs).length > 0) return { ok: false, errors: errs };

  const rho = build.model.liquid?.densityKgPerM3 ?? SEAWATER.densityKgPerM3;
  // Viscosity only sets the Reynolds number (hence St): seawater's for salt water, fresh water's otherwise.
  const base = rho >= 1010 ? SEAWATER : FRESH_WATER;
  const margin = r.num('separationMargin');
  return {
    ok: true,
    excitation: {
      flowSpeedMPerS,
      liquid: { densityKgPerM3: rho, kinematicViscosityM2PerS: base.kinematicViscosityM2PerS, source: `density as entered; viscosity of ${base === SEAWATER ? 'seawater' : 'fresh water'} (${base.source})` },
      // Left out when it is the default, so the screening shows the default's source rather than "entered by user".
      dampingRatio: r.num('dampingRatio') === DEFAULT_DAMPING.ratio ? undefined : r.num('dampingRatio'),
      stemFrequencyRatioScreen: kind === 'stem',
      waves,
      machinery: machinery.length > 0 ? machinery : undefined,
      machineryAgainst: r.choice('machineryAgainst') === 'wet-and-dry' ? 'wet-and-dry' : 'wet',
      limits: margin !== DEFAULT_LIMITS.separationMargin.value ? { ...limits, separationMargin: { value: margin } } : limits,
    },
  };
}
