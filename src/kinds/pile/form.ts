/** The pile form: fields, defaults with their sources, cross-field checks and the mapping to PileInput. */
import { buildPileModel, DEFAULT_FIXITY_DIAMETERS, type PileFoundation, type PileHead, type PileInput, validatePileInput } from './build';
import { SOIL_PRESETS, type SoilPresetId } from '../../physics/practice/soil-presets';
import { COMMON_CORE_FIELDS, commonInput, TUBE_CORE_FIELDS, tubeInput } from '../../forms/common-input';
import { defineForm } from '../../forms/define';
import { BEAM_THEORY_FIELD, densityField, END_EFFECT_FIELD, GROWTH_THICKNESS_RANGE, heightField, massField, TUBE_DIAMETER_MAX, liquidDensityField, materialFields, NON_NEGATIVE, POSITIVE, SEAWATER_HELP, sizeField } from '../../forms/presets';
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
      { value: 'fixity', label: 'Fixed at a depth (as entered)', help: 'Equivalent cantilever clamped at an effective fixity depth you enter (common practice).' },
      {
        value: 'fixity-soil',
        label: 'Fixed at a depth from the soil type',
        help: 'Equivalent cantilever clamped at the depth to fixity of M.T. Davisson & K.E. Robinson (Bending and buckling of partially embedded piles, 6th ICSMFE, 1965), from the soil type.',
      },
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
  {
    key: 'soilType',
    label: 'Soil type',
    type: 'choice',
    choices: (Object.keys(SOIL_PRESETS) as SoilPresetId[]).map((id) => ({ value: id, label: SOIL_PRESETS[id].label, help: `${SOIL_PRESETS[id].source}.` })),
    default: 'medium-sand',
    showWhen: { key: 'foundation', values: ['fixity-soil'] },
    help: 'Indicative subgrade moduli for screening; a site investigation governs.',
  },
  heightField('embeddedLength', 'Embedded length', '15', {
    min: POSITIVE,
    showWhen: { key: 'foundation', values: [...SPRINGS, 'fixity-soil'] },
    help: 'Pile length below the original mudline (before scour). With a soil type, used to check that the pile is long enough for the method.',
  }),
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
  massField('topMass', 'Top mass', '0', { help: 'Share of the deck that sways with the pile head (deck sway mass), or anything else carried at the top.' }),
  {
    key: 'headRestraint',
    label: 'Pile head',
    type: 'choice',
    choices: [
      { value: 'free', label: 'Free', help: 'Nothing holds the head (a mooring or fender pile).' },
      { value: 'held', label: 'Held against rotation', help: 'A stiff deck keeps the head from rotating; it still sways.' },
      { value: 'spring', label: 'Rotational spring', help: 'A deck of finite stiffness: enter its rotational stiffness.' },
    ],
    default: 'free',
    advanced: true,
    help: 'How the deck holds the pile head: held against rotation can raise f1 a great deal over a free head.',
  },
  {
    key: 'headRotationalStiffness',
    label: 'Head rotational stiffness',
    type: 'quantity',
    dimension: 'rotational-stiffness',
    units: { si: 'MN m/rad', us: 'kip ft/rad' },
    default: '100',
    min: POSITIVE,
    advanced: true,
    showWhen: { key: 'headRestraint', values: ['spring'] },
    help: 'Moment per radian of head rotation that the deck resists.',
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
  heightField('scourDepth', 'Scour depth', '0', {
    min: NON_NEGATIVE,
    advanced: true,
    help: 'Depth of scour below the original mudline: the mudline and the soil support move down by this much; the water depth is measured to the original mudline.',
  }),
  {
    key: 'axialLoad',
    label: 'Axial load (compression)',
    type: 'quantity',
    dimension: 'force',
    units: { si: 'kN', us: 'kip' },
    default: '0',
    min: NON_NEGATIVE,
    advanced: true,
    help: 'Deck load carried down the pile; compression lowers the bending frequencies (P-Δ). 0 for none.',
  },
  densityField('growthDensity', 'Marine growth density', '1325', { advanced: true, help: 'About 1325 kg/m³ (NORSOK N-003, Actions and action effects).' }),
  heightField('growthTop', 'Marine growth from (above still water)', '2', { advanced: true, help: 'Top of the growth zone above the still water level (NORSOK N-003, Actions and action effects, marine growth zones).' }),
  heightField('growthBottom', 'Marine growth down to (below still water)', '40', { advanced: true, help: 'Bottom of the growth zone below the still water level; it stops at the mudline.' }),
  END_EFFECT_FIELD,
  BEAM_THEORY_FIELD,
];

function foundationOf(r: Reader): PileFoundation {
  const kind = r.choice('foundation');
  if (kind === 'fixity-soil') return { kind, soil: r.choice('soilType') as SoilPresetId, embeddedLengthM: r.num('embeddedLength') };
  if (kind === 'soil-springs') return { kind, embeddedLengthM: r.num('embeddedLength'), modulusNPerM2: r.num('soilModulus') };
  if (kind === 'soil-springs-linear') return { kind, embeddedLengthM: r.num('embeddedLength'), modulusGradientNPerM3: r.num('soilModulusGradient') };
  const depth = r.opt('fixityDepth');
  return depth === undefined ? { kind: 'fixity' } : { kind: 'fixity', depthBelowMudlineM: depth };
}

function headOf(r: Reader): PileHead {
  const kind = r.choice('headRestraint');
  if (kind === 'held') return { kind };
  if (kind === 'spring') return { kind, rotationalStiffnessNmPerRad: r.num('headRotationalStiffness') };
  return { kind: 'free' };
}

/** Pile length from the fixity point or toe to the top (the default fixity depth is 6 diameters, docs/sources.md §S9). */
function pileLengthM(input: PileInput): number {
  const f = input.foundation ?? { kind: 'fixity' };
  // For fixity from a soil type the depth needs EI; the default 6 D stands in here (a plausibility check only).
  const sixD = DEFAULT_FIXITY_DIAMETERS * input.outerDiameterM;
  const below = f.kind === 'fixity' ? (f.depthBelowMudlineM ?? sixD) : f.kind === 'fixity-soil' ? sixD : f.embeddedLengthM;
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
    const kind = r.choice('foundation');
    if ((kind === 'soil-springs' || kind === 'soil-springs-linear') && !(r.num('scourDepth') < r.num('embeddedLength'))) {
      err('scourDepth', `scour must be less than the embedded length (${r.fmt('embeddedLength', r.num('embeddedLength'))})`);
    }
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
    // Added only when set, so a case saved before these fields existed reads to the same input.
    const scour = r.num('scourDepth');
    if (scour > 0) input.scourDepthM = scour;
    const head = headOf(r);
    if (head.kind !== 'free') input.head = head;
    const axial = r.num('axialLoad');
    if (axial > 0) input.axialCompressionN = axial;
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
