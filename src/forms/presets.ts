/**
 * Presets and field builders shared by the forms: materials, contents, liquid density and the common
 * length fields. Sources of default values are stated in the help text the surveyor sees.
 */
import { formatQuantity, type UnitSystem } from '../units';
import type { Bound, Choice, ChoiceField, FieldDef, Plausible, QuantityField } from './types';

export const POSITIVE: Bound = { valueSI: 0, inclusive: false };
export const NON_NEGATIVE: Bound = { valueSI: 0, inclusive: true };

/** A density: kg/m³ in SI, lb/ft³ in US units. */
export function densityField(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'density', units: { si: 'kg/m^3', us: 'lb/ft^3' }, default: def, min: NON_NEGATIVE, ...extra };
}

/** Common inputs (carbon steel; stainless 316, docs/sources.md §S7); ν = 0.3 for both (common practice). */
export const MATERIAL_CHOICES: readonly Choice[] = [
  {
    value: 'carbon-steel',
    label: 'Carbon steel',
    help: 'E = 210 GPa, density 7850 kg/m³, Poisson 0.3 (common inputs; US practice often takes E = 200 to 207 GPa).',
    presets: { youngsModulus: 210e9, materialDensity: 7850, poissonRatio: 0.3 },
  },
  {
    value: 'stainless-316',
    label: 'Stainless steel 316',
    help: 'E = 193 GPa, density 8000 kg/m³, Poisson 0.3 (common inputs).',
    presets: { youngsModulus: 193e9, materialDensity: 8000, poissonRatio: 0.3 },
  },
  { value: 'other', label: 'Other', help: 'Enter the modulus and density under More.' },
];

/** Material choice plus its modulus, density (and Poisson's ratio for plates), taken from the preset when left empty. */
export function materialFields(defaultMaterial: 'carbon-steel' | 'stainless-316', options: { advanced?: boolean; poisson?: boolean } = {}): FieldDef[] {
  const fields: FieldDef[] = [
    { key: 'material', label: 'Material', type: 'choice', choices: MATERIAL_CHOICES, default: defaultMaterial, advanced: options.advanced },
    {
      key: 'youngsModulus',
      label: "Young's modulus",
      type: 'quantity',
      dimension: 'modulus',
      units: { si: 'GPa', us: 'ksi' },
      default: '',
      optional: true,
      emptyMeans: 'from the material',
      presetFrom: 'material',
      min: POSITIVE,
      advanced: true,
    },
    densityField('materialDensity', 'Material density', '', { optional: true, emptyMeans: 'from the material', presetFrom: 'material', min: POSITIVE, advanced: true }),
  ];
  if (options.poisson) {
    fields.push({
      key: 'poissonRatio',
      label: "Poisson's ratio",
      type: 'quantity',
      dimension: 'ratio',
      units: { si: '', us: '' },
      default: '',
      optional: true,
      emptyMeans: 'from the material',
      presetFrom: 'material',
      min: NON_NEGATIVE,
      max: { valueSI: 0.5, inclusive: false },
      advanced: true,
    });
  }
  return fields;
}

/**
 * Riser contents. Gas: ρ = pM/(ZRT) (classical) gives about 80 to 130 kg/m³ for natural gas at 100 to 150 bar
 * and 15 °C; 100 is a round middle value (our estimate). Oil 850 (crude oils 800 to 950, common practice).
 * Water 1000, seawater 1025 (docs/sources.md §S7). Drilling mud 1500, middle of 1200 to 2000 (common practice, §S7): enter the
 * actual mud weight.
 */
export const CONTENTS_CHOICES: readonly Choice[] = [
  { value: 'empty', label: 'Empty (air)', presets: { contentsDensity: 0 } },
  { value: 'gas', label: 'Gas', help: 'About 80 to 130 kg/m³ at 100 to 150 bar (ideal-gas estimate); 100 used.', presets: { contentsDensity: 100 } },
  { value: 'oil', label: 'Oil', help: 'Crude oil 800 to 950 kg/m³ (common practice); 850 used.', presets: { contentsDensity: 850 } },
  { value: 'water', label: 'Fresh water', presets: { contentsDensity: 1000 } },
  { value: 'seawater', label: 'Seawater', presets: { contentsDensity: 1025 } },
  { value: 'mud', label: 'Drilling mud', help: '1200 to 2000 kg/m³; 1500 used unless you enter the mud weight.', presets: { contentsDensity: 1500 } },
  { value: 'other', label: 'Other', help: 'Enter the contents density.' },
];

/**
 * Hard range of a liquid density, kg/m³: from light hydrocarbon liquids (about 600) to heavy muds and brines
 * (about 2000), docs/sources.md §S7; 500 leaves room below. A value under it is most often a density typed in
 * t/m³ or a specific gravity.
 */
export const LIQUID_DENSITY_MIN_KG_PER_M3 = 500;
export const LIQUID_DENSITY_MAX_KG_PER_M3 = 2000;

/** Soft range for water: fresh water about 1000, seawater about 1025 kg/m³ (docs/sources.md §S7), with room for temperature and brines. */
export const WATER_DENSITY_PLAUSIBLE: Plausible = { min: 950, max: 1100, basis: 'fresh water about 1000, seawater about 1025 kg/m³, docs/sources.md §S7' };

/** Soft range for process liquids: light oils and fuels about 800 to water and brines up to 1100 kg/m³ (docs/sources.md §S7). */
export const PROCESS_LIQUID_PLAUSIBLE: Plausible = { min: 700, max: 1100, basis: 'fuels and light oils about 800 to 850, water about 1000 kg/m³, docs/sources.md §S7' };

const KG_PER_M3_PER_LB_PER_FT3 = 16.018463;

/** "did you mean 1025 kg/m³ or 1.025 t/m³?" for a number that looks like t/m³ or a specific gravity. */
export function densityDidYouMean(valueSI: number, system: UnitSystem): string | undefined {
  if (system === 'si') {
    const k = valueSI * 1000;
    if (k >= LIQUID_DENSITY_MIN_KG_PER_M3 && k <= LIQUID_DENSITY_MAX_KG_PER_M3) return `did you mean ${formatQuantity(k, 'kg/m^3')} or ${formatQuantity(k, 't/m^3')}?`;
    return undefined;
  }
  const typed = valueSI / KG_PER_M3_PER_LB_PER_FT3;
  const asSg = typed * 1000;
  if (asSg >= LIQUID_DENSITY_MIN_KG_PER_M3 && asSg <= LIQUID_DENSITY_MAX_KG_PER_M3) return `did you mean a specific gravity of ${typed}, that is ${formatQuantity(asSg, 'lb/ft^3')}?`;
  return undefined;
}

/** Density of the liquid around the member: hard 500 to 2000 kg/m³, and a soft range (water by default). */
export function liquidDensityField(defaultKgPerM3: number, help: string, plausible: Plausible = WATER_DENSITY_PLAUSIBLE): QuantityField {
  return densityField('liquidDensity', 'Liquid density', String(defaultKgPerM3), {
    min: { valueSI: LIQUID_DENSITY_MIN_KG_PER_M3, inclusive: true },
    max: { valueSI: LIQUID_DENSITY_MAX_KG_PER_M3, inclusive: true },
    plausible,
    didYouMean: densityDidYouMean,
    help,
  });
}

/**
 * Marine growth thickness: NORSOK N-003 (Actions and action effects) gives up to 0.1 m in the North Sea
 * (docs/sources.md §S8); above 0.3 m is warned, above 1 m refused (no growth zone of that size is tabulated).
 */
export const GROWTH_THICKNESS_RANGE: Partial<QuantityField> = {
  min: { valueSI: 0, inclusive: true },
  max: { valueSI: 1, inclusive: true },
  plausible: { max: 0.3, basis: 'NORSOK N-003, Actions and action effects, gives up to 0.1 m, docs/sources.md §S8' },
};

export const SEAWATER_HELP = 'Seawater 1025 kg/m³, fresh water 1000 kg/m³ (common inputs).';

/** A size across the member: mm in SI, inches in US units. */
export function sizeField(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'length', units: { si: 'mm', us: 'in' }, default: def, min: POSITIVE, ...extra };
}

/**
 * Outer diameter of a pile or riser: refused above 20 m (the largest driven piles are about 10 m across, common
 * practice), so a stray exponent (1e308 m) is refused beside the field instead of wedging the solver.
 */
export const TUBE_DIAMETER_MAX: Bound = { valueSI: 20, inclusive: true };

/** A lumped mass carried by the member (a top or deck mass): tonnes in SI, pounds in US units, zero or more. */
export function massField(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'mass', units: { si: 't', us: 'lb' }, default: def, min: NON_NEGATIVE, ...extra };
}

/** A length or height along the member: m in SI, feet in US units. */
export function heightField(key: string, label: string, def: string, extra: Partial<QuantityField> = {}): QuantityField {
  return { key, label, type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' }, default: def, ...extra };
}

export function yesNoField(key: string, label: string, def: 'yes' | 'no', extra: Partial<ChoiceField> = {}): ChoiceField {
  return {
    key,
    label,
    type: 'choice',
    choices: [
      { value: 'no', label: 'No' },
      { value: 'yes', label: 'Yes' },
    ],
    default: def,
    ...extra,
  };
}

/** Beam theory: automatic (shear included when length / depth < 10, common practice: docs/sources.md §S13), or chosen. */
export const BEAM_THEORY_FIELD: ChoiceField = {
  key: 'beamTheory',
  label: 'Beam theory',
  type: 'choice',
  choices: [
    { value: 'auto', label: 'Automatic', help: 'Includes shear deformation when the member is stubby (length under 10 × its depth).' },
    { value: 'euler-bernoulli', label: 'Slender beam (Euler–Bernoulli)' },
    { value: 'timoshenko', label: 'With shear (Timoshenko)' },
  ],
  default: 'auto',
  advanced: true,
};

/** The beam engine's optional 3D end-effect reduction of added mass. */
export const END_EFFECT_FIELD: ChoiceField = yesNoField('endEffect3d', '3D end effect on added mass', 'no', {
  advanced: true,
  help: 'Reduce the added mass of a short submerged length (DNV-RP-H103, Modelling and Analysis of Marine Operations, Table A-2). Off: two-dimensional strip theory.',
});
