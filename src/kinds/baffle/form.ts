/** The tank baffle form: fields, cross-field checks and the mapping to BaffleInput. */
import { type BaffleInput, buildBaffleModel, MAX_PERFORATION_RATIO, type PlateEnd, validateBaffleInput } from './build';
import { COMMON_CORE_FIELDS, commonInput } from '../../forms/common-input';
import { defineForm } from '../../forms/define';
import { BEAM_THEORY_FIELD, END_EFFECT_FIELD, heightField, liquidDensityField, PROCESS_LIQUID_PLAUSIBLE, materialFields, NON_NEGATIVE, POSITIVE, sizeField } from '../../forms/presets';
import { checkStubby, warnSlenderTheory } from '../../forms/plausible';
import type { Choice, FieldDef } from '../../forms/types';

/** Welded = clamped, bolted = pinned (common practice, no source). */
const PLATE_END_CHOICES: readonly Choice[] = [
  { value: 'welded', label: 'Welded', help: 'Taken as clamped.' },
  { value: 'bolted', label: 'Bolted', help: 'Taken as pinned: held in place, free to rotate.' },
  { value: 'free', label: 'Free' },
];

const FIELDS: readonly FieldDef[] = [
  heightField('span', 'Span between supports', '1.2', { min: POSITIVE, help: 'Length of plate between the two supports (or from the support to a free end).' }),
  sizeField('width', 'Plate width', '300'),
  sizeField('thickness', 'Plate thickness', '10'),
  ...materialFields('carbon-steel', { poisson: true }),
  { key: 'lowerEnd', label: 'Lower end', type: 'choice', choices: PLATE_END_CHOICES, default: 'welded' },
  { key: 'upperEnd', label: 'Upper end', type: 'choice', choices: PLATE_END_CHOICES, default: 'bolted' },
  heightField('lowerEndHeight', 'Lower end above tank floor', '0.5', { min: NON_NEGATIVE }),
  heightField('liquidLevel', 'Liquid level above tank floor', '3', {
    min: NON_NEGATIVE,
    help: 'The span runs upward from its lower end. A horizontal baffle is either wholly in the liquid or wholly above it.',
  }),
  liquidDensityField(1000, 'Water 1000 kg/m³, fuels about 800 to 850 kg/m³ (common inputs).', PROCESS_LIQUID_PLAUSIBLE),
  sizeField('wallGap', 'Gap to nearest parallel wall', '', {
    optional: true,
    emptyMeans: 'no wall nearby',
    help: 'Clear gap from the plate face to a wall parallel to it; a close wall raises the added mass.',
  }),
  {
    key: 'perforation',
    label: 'Perforation (open area)',
    type: 'quantity',
    dimension: 'ratio',
    units: { si: '%', us: '%' },
    default: '0',
    min: NON_NEGATIVE,
    max: { valueSI: MAX_PERFORATION_RATIO, inclusive: true },
    help: 'Holes reduce the added mass (DNV-RP-H103, Modelling and Analysis of Marine Operations, §4.6.4.3), up to 50 % open area.',
  },
  END_EFFECT_FIELD,
  BEAM_THEORY_FIELD,
];

export const BAFFLE_FORM = defineForm({
  kind: 'baffle',
  title: 'Tank baffle',
  summary: 'A flat plate strip in a tank, spanning between two supports and vibrating across its thickness (a narrow baffle on clips). For a plate welded on two or more edges use Plate panel.',
  fields: FIELDS,
  toInput(r, err): BaffleInput | null {
    const width = r.num('width');
    const thickness = r.num('thickness');
    if (!(thickness < width)) err('thickness', `thickness must be less than the width (${r.fmt('thickness', width)})`);
    const lower = r.choice('lowerEnd') as PlateEnd;
    const upper = r.choice('upperEnd') as PlateEnd;
    if (!(lower === 'welded' || upper === 'welded' || (lower === 'bolted' && upper === 'bolted'))) {
      err('upperEnd', 'with these ends the plate can swing or slide: make one end welded, or both bolted');
    }
    const input: BaffleInput = {
      spanM: r.num('span'),
      widthM: width,
      thicknessM: thickness,
      ...commonInput(r),
      poissonRatio: r.num('poissonRatio'),
      lowerEnd: lower,
      upperEnd: upper,
      lowerEndAboveFloorM: r.num('lowerEndHeight'),
      liquidLevelAboveFloorM: r.num('liquidLevel'),
      liquidDensityKgPerM3: r.num('liquidDensity'),
      perforationRatio: r.num('perforation'),
    };
    const gap = r.opt('wallGap');
    if (gap !== undefined) input.wallGapM = gap;
    checkStubby('span', 'span', input.spanM, thickness, 'plate thickness', err);
    return input;
  },
  plausible(r, input, warn) {
    warnSlenderTheory('span', input.spanM, input.thicknessM, 'plate thickness', r.choice('beamTheory'), warn);
  },
  validate: validateBaffleInput,
  coreFields: { ...COMMON_CORE_FIELDS, spanM: 'span', widthM: 'width', thicknessM: 'thickness' },
  buildModel: buildBaffleModel,
});
