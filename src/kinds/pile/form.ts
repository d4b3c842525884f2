/** The pile form: fields, defaults with their sources, cross-field checks and the mapping to PileInput. */
import { buildPileModel, DEFAULT_FIXITY_DIAMETERS, type PileFoundation, type PileInput, validatePileInput } from './build';
import { COMMON_CORE_FIELDS, commonInput, TUBE_CORE_FIELDS, tubeInput } from '../../forms/common-input';
import { defineForm } from '../../forms/define';
import { BEAM_THEORY_FIELD, densityField, END_EFFECT_FIELD, GROWTH_THICKNESS_RANGE, heightField, TUBE_DIAMETER_MAX, liquidDensityField, materialFields, NON_NEGATIVE, POSITIVE, SEAWATER_HELP, sizeField } from '../../forms/presets';
import { checkStubby, warnSlenderTheory, warnThinWall } from '../../forms/plausible';
import type { Reader } from '../../forms/read';
import type { FieldDef } from '../../forms/types';

const SPRINGS = ['soil-springs', 'soil-springs-linear'] as const;

const FIELDS: readonly FieldDef[] = [
  sizeField('outerDiameter', 'Outer diameter', '610', { max: TUBE_DIAMETER_MAX }),
  sizeField('wallThickness', 'Wall thickness', '12'),
  ...materialFields('carbon-steel'),
  heightField('waterDepth', 'Water depth', '8', { min: NON_NEGATIVE, help: 'From the mudline to the still water level (e.g. mean sea level) at the pile.' }),
  heightField('topAboveWater', 'Top above still water', '3', { help: 'Height of the pile top above the still water level; negative if the top is under water.' }),
  heightField('waterLevelOffset', 'Tide or surge offset', '0', { help: 'Raises (+) or lowers (−) the water surface from the still water level; the pile does not move.' }),
  {
    key: 'foundation',
    label: 'Below the mudline',
    type: 'choice',
    choices: [
      { value: 'fixity', label: 'Fixed at a depth', help: 'Equivalent cantilever clamped at an effective fixity depth (common practice).' },
      { value: 'soil-springs', label: 'Soil springs, constant (clay)', help: 'Lateral springs of constant subgrade modulus over the embedded length.' },
      { value: 'soil-springs-linear', label: 'Soil springs, rising with depth (sand)', help: 'Lateral springs rising linearly with depth.' },
    ],
    default: 'fixity',
  },
  heightField('fixityDepth', 'Fixity depth below mudline', '', {
    optional: true,
    emptyMeans: `${DEFAULT_FIXITY_DIAMETERS} × outer diameter`,
    min: NON_NEGATIVE,
    showWhen: { key: 'foundation', values: ['fixity'] },
    help: 'Effective fixity is usually 3.5 to 8 diameters below the mudline, often 6 (common practice).',
  }),
  heightField('embeddedLength', 'Embedded length', '15', { min: POSITIVE, showWhen: { key: 'foundation', values: SPRINGS }, help: 'Pile length below the mudline.' }),
  {
    key: 'soilModulus',
    label: 'Soil spring modulus',
    type: 'quantity',
    dimension: 'soil-modulus',
    units: { si: 'MN/m^2', us: 'psi' },
    default: '5',
    min: POSITIVE,
    showWhen: { key: 'foundation', values: ['soil-springs'] },
    help: 'Lateral spring per metre of pile per metre of deflection. Clays: about 67 × undrained shear strength (M.T. Davisson & K.E. Robinson, Bending and buckling of partially embedded piles, 6th ICSMFE, 1965).',
  },
  {
    key: 'soilModulusGradient',
    label: 'Soil modulus gradient',
    type: 'quantity',
    dimension: 'soil-modulus-gradient',
    units: { si: 'MN/m^3', us: 'pci' },
    default: '4.4',
    min: POSITIVE,
    showWhen: { key: 'foundation', values: ['soil-springs-linear'] },
    help: 'Rise of the spring modulus per metre of depth. Submerged sand: loose 1.3, medium 4.4, dense 10.7 MN/m³ (K. Terzaghi, Evaluation of coefficients of subgrade reaction, Géotechnique 5, 1955).',
  },
  {
    key: 'topMass',
    label: 'Top mass',
    type: 'quantity',
    dimension: 'mass',
    units: { si: 't', us: 'lb' },
    default: '0',
    min: NON_NEGATIVE,
    help: 'Share of the deck or anything else carried at the top.',
  },
  {
    key: 'flooded',
    label: 'Inside',
    type: 'choice',
    choices: [
      { value: 'flooded', label: 'Flooded', help: 'Open or vented: water inside up to the outside water surface.' },
      { value: 'sealed', label: 'Sealed (empty)' },
    ],
    default: 'flooded',
  },
  sizeField('growthThickness', 'Marine growth thickness', '50', {
    ...GROWTH_THICKNESS_RANGE,
    help: 'Typically 50 to 100 mm in the upper 40 m of North Sea waters (NORSOK N-003, Actions and action effects); 0 for none.',
  }),
  liquidDensityField(1025, SEAWATER_HELP),
  {
    key: 'topRotaryInertia',
    label: 'Top mass rotary inertia',
    type: 'quantity',
    dimension: 'rotary-inertia',
    units: { si: 't m^2', us: 'lb ft^2' },
    default: '0',
    min: NON_NEGATIVE,
    advanced: true,
    help: 'About a horizontal axis through the pile top.',
  },
  densityField('growthDensity', 'Marine growth density', '1325', { advanced: true, help: 'About 1325 kg/m³ (NORSOK N-003, Actions and action effects).' }),
  heightField('growthTop', 'Marine growth from (above still water)', '2', { advanced: true, help: 'Top of the growth zone above the still water level (NORSOK N-003, Actions and action effects, marine growth zones).' }),
  heightField('growthBottom', 'Marine growth down to (below still water)', '40', { advanced: true, help: 'Bottom of the growth zone below the still water level; it stops at the mudline.' }),
  END_EFFECT_FIELD,
  BEAM_THEORY_FIELD,
];

function foundationOf(r: Reader): PileFoundation {
  const kind = r.choice('foundation');
  if (kind === 'soil-springs') return { kind, embeddedLengthM: r.num('embeddedLength'), modulusNPerM2: r.num('soilModulus') };
  if (kind === 'soil-springs-linear') return { kind, embeddedLengthM: r.num('embeddedLength'), modulusGradientNPerM3: r.num('soilModulusGradient') };
  const depth = r.opt('fixityDepth');
  return depth === undefined ? { kind: 'fixity' } : { kind: 'fixity', depthBelowMudlineM: depth };
}

/** Pile length from the fixity point or toe to the top (the default fixity depth is 6 diameters, docs/sources.md §S9). */
function pileLengthM(input: PileInput): number {
  const f = input.foundation ?? { kind: 'fixity' };
  const below = f.kind === 'fixity' ? (f.depthBelowMudlineM ?? DEFAULT_FIXITY_DIAMETERS * input.outerDiameterM) : f.embeddedLengthM;
  return input.waterDepthM + input.topAboveStillWaterM + below;
}

export const PILE_FORM = defineForm({
  kind: 'pile',
  title: 'Pile',
  summary: 'A vertical tube from the seabed up through the water, fixed below the mudline, free or carrying a mass at the top.',
  fields: FIELDS,
  toInput(r, err): PileInput | null {
    const tube = tubeInput(r, err);
    const depth = r.num('waterDepth');
    const top = r.num('topAboveWater');
    if (!(top > -depth)) err('topAboveWater', `top above still water must be more than ${r.fmt('topAboveWater', -depth)} so the top is above the mudline`);
    const growth = r.num('growthThickness');
    const gTop = r.num('growthTop');
    const gBottom = r.num('growthBottom');
    if (growth > 0 && !(gBottom > -gTop)) {
      err('growthBottom', `the bottom of the growth zone must be below its top: enter more than ${r.fmt('growthBottom', -gTop)}`);
    }
    const input: PileInput = {
      ...tube,
      ...commonInput(r),
      waterDepthM: depth,
      topAboveStillWaterM: top,
      waterLevelOffsetM: r.num('waterLevelOffset'),
      foundation: foundationOf(r),
      topMassKg: r.num('topMass'),
      topRotaryInertiaKgM2: r.num('topRotaryInertia'),
      flooded: r.choice('flooded') === 'flooded',
      liquidDensityKgPerM3: r.num('liquidDensity'),
    };
    if (growth > 0) {
      input.marineGrowth = { thicknessM: growth, densityKgPerM3: r.num('growthDensity'), topAboveStillWaterM: gTop, bottomBelowStillWaterM: gBottom };
    }
    checkStubby('outerDiameter', 'the pile length from its fixity or toe to its top', pileLengthM(input), tube.outerDiameterM, 'outer diameter', err);
    return input;
  },
  plausible(r, input, warn) {
    warnThinWall('wallThickness', input.wallThicknessM, input.outerDiameterM, (v) => r.fmt('wallThickness', v), warn);
    warnSlenderTheory('outerDiameter', pileLengthM(input), input.outerDiameterM, 'outer diameter', r.choice('beamTheory'), warn);
  },
  validate: validatePileInput,
  coreFields: { ...COMMON_CORE_FIELDS, ...TUBE_CORE_FIELDS, waterDepthM: 'waterDepth', topAboveStillWaterM: 'topAboveWater', waterLevelOffsetM: 'waterLevelOffset', topMassKg: 'topMass', topRotaryInertiaKgM2: 'topRotaryInertia' },
  buildModel: buildPileModel,
});
