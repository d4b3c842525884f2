/**
 * The groups of resonance fields a member kind picks from (its `ResonanceSpec.fields`): current profile, waves,
 * machinery, damping and margin, and the published screening limits with their sources as defaults.
 */
import { DEFAULT_DAMPING, DEFAULT_LIMITS } from '../physics/excitation';
import { POSITIVE, NON_NEGATIVE } from './presets';
import type { FieldDef, QuantityField } from './types';

/** A speed field (m/s, ft/s), at least 0. */
export function speed(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'ft/s' }, default: def, min: NON_NEGATIVE, ...extra };
}

/**
 * A sea or river current: warned above 2.5 m/s (about 5 knots, beyond all but the strongest tidal races,
 * common practice, no single source) and refused above 10 m/s (about 19 knots, no natural current).
 */
export const CURRENT_RANGE: Partial<QuantityField> = {
  max: { valueSI: 10, inclusive: true },
  plausible: { max: 2.5, basis: 'about 5 knots; stronger currents are rare outside tidal races, common practice' },
};

export const CURRENT: readonly FieldDef[] = [
  speed('currentSurface', 'Current at the surface', '0.5', { ...CURRENT_RANGE, help: 'Largest expected current at the water surface (for a tidal stream, the peak of spring tides).' }),
  speed('currentMid', 'Current at mid-depth', '', { ...CURRENT_RANGE, optional: true, emptyMeans: 'same as at the surface' }),
  speed('currentBed', 'Current near the bed', '', { ...CURRENT_RANGE, optional: true, emptyMeans: 'same as at the surface' }),
];

export const WAVES: readonly FieldDef[] = [
  { key: 'wavePeriodMin', label: 'Shortest wave period', type: 'quantity', dimension: 'time', units: { si: 's', us: 's' }, default: '', optional: true, emptyMeans: 'no wave check', min: POSITIVE },
  { key: 'wavePeriodMax', label: 'Longest wave period', type: 'quantity', dimension: 'time', units: { si: 's', us: 's' }, default: '', optional: true, emptyMeans: 'no wave check', min: POSITIVE },
];

export const MACHINE: readonly FieldDef[] = [
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
export const VIV_LIMITS: readonly FieldDef[] = [
  limit('inLineVrMin', 'In-line lock-in from V_R', DEFAULT_LIMITS.inLineReducedVelocity.min, DEFAULT_LIMITS.inLineReducedVelocity.source),
  limit('inLineVrMax', 'In-line lock-in up to V_R', DEFAULT_LIMITS.inLineReducedVelocity.max, DEFAULT_LIMITS.inLineReducedVelocity.source),
  limit('inLineKsMax', 'In-line only when K_S at most', DEFAULT_LIMITS.inLineStabilityMax.value, DEFAULT_LIMITS.inLineStabilityMax.source),
  limit('crossFlowVrMin', 'Cross-flow lock-in from V_R', DEFAULT_LIMITS.crossFlowReducedVelocity.min, DEFAULT_LIMITS.crossFlowReducedVelocity.source),
  limit('crossFlowVrMax', 'Cross-flow lock-in up to V_R', DEFAULT_LIMITS.crossFlowReducedVelocity.max, DEFAULT_LIMITS.crossFlowReducedVelocity.source),
];

export const FREQUENCY_RATIO_LIMIT: readonly FieldDef[] = [
  limit('stemRatioMax', 'Largest f_s / f_n for a stem', DEFAULT_LIMITS.stemFrequencyRatioMax.value, DEFAULT_LIMITS.stemFrequencyRatioMax.source),
];

export const MARGIN_AND_DAMPING: readonly FieldDef[] = [
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
