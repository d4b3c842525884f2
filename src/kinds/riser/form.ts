/** The riser / conductor form: fields, cross-field checks and the mapping to RiserInput. */
import { type EndCondition, endSupports, leavesRigidBodyMotion } from '../common/ends';
import { stubbinessLengthM } from '../common/theory';
import { buildRiserModel, type RiserInput, validateRiserInput } from './build';
import { riserTopTension } from './tension';
import { COMMON_CORE_FIELDS, commonInput, TUBE_CORE_FIELDS, tubeInput } from '../../forms/common-input';
import { defineForm } from '../../forms/define';
import {
  BEAM_THEORY_FIELD,
  CONTENTS_CHOICES,
  densityField,
  END_EFFECT_FIELD,
  heightField, massField,
  liquidDensityField,
  materialFields,
  NON_NEGATIVE,
  POSITIVE,
  SEAWATER_HELP,
  sizeField,
  TUBE_DIAMETER_MAX,
  yesNoField,
} from '../../forms/presets';
import { checkStubby, warnSlenderTheory, warnThinWall } from '../../forms/plausible';
import type { Choice, FieldDef } from '../../forms/types';
import { speed } from '../../forms/resonance-fields';

const END_CHOICES: readonly Choice[] = [
  { value: 'clamped', label: 'Clamped', help: 'Held in position and rotation.' },
  { value: 'pinned', label: 'Pinned', help: 'Held in position, free to rotate.' },
  { value: 'sliding', label: 'Sliding', help: 'Rotation held, free to move sideways.' },
  { value: 'free', label: 'Free' },
];

const FIELDS: readonly FieldDef[] = [
  sizeField('outerDiameter', 'Outer diameter', '273', { max: TUBE_DIAMETER_MAX }),
  sizeField('wallThickness', 'Wall thickness', '12.7'),
  heightField('length', 'Length, bottom to top', '40', { min: POSITIVE, help: 'All heights on this form are measured up from the bottom end.' }),
  {
    key: 'guides',
    label: 'Guide heights',
    type: 'quantity-list',
    dimension: 'length',
    units: { si: 'm', us: 'ft' },
    default: '10, 20, 30',
    min: POSITIVE,
    optional: true,
    help: 'Heights of the guides above the bottom end, separated by commas (or semicolons if you use decimal commas). Guides hold the riser sideways and let it rotate.',
  },
  { key: 'bottomEnd', label: 'Bottom end', type: 'choice', choices: END_CHOICES, default: 'pinned' },
  { key: 'topEnd', label: 'Top end', type: 'choice', choices: END_CHOICES, default: 'free' },
  { key: 'contents', label: 'Contents', type: 'choice', choices: CONTENTS_CHOICES, default: 'oil' },
  heightField('waterSurface', 'Water surface above the bottom', '30', { help: 'Height of the still water surface above the bottom end.' }),
  liquidDensityField(1025, SEAWATER_HELP),
  {
    key: 'topTension',
    label: 'Top tension',
    type: 'quantity',
    dimension: 'force',
    units: { si: 'kN', us: 'kip' },
    default: '0',
    min: NON_NEGATIVE,
    help: 'Tension applied at the top, 0 if none.',
  },
  sizeField('caissonDiameter', 'Caisson inner diameter', '', {
    optional: true,
    emptyMeans: 'no caisson',
    help: 'If the riser runs inside a caisson or conductor over its submerged length, the water between them is confined.',
  }),
  speed('caissonInnerFlow', 'Current inside the caisson', '', {
    optional: true,
    emptyMeans: 'still water',
    help: 'Used only with a caisson: the caisson shields the riser from the open current, so shedding inside it is screened with this flow. Leave empty for still water; enter a measured or assumed flow if water moves through the caisson (open bottom, pumped or vented).',
  }),
  ...materialFields('carbon-steel', { advanced: true }),
  densityField('contentsDensity', 'Contents density', '', { optional: true, emptyMeans: 'from the contents', presetFrom: 'contents', advanced: true }),
  sizeField('coatingThickness', 'Coating thickness', '0', { min: NON_NEGATIVE, advanced: true }),
  densityField('coatingDensity', 'Coating density', '1300', {
    advanced: true,
    help: 'Polymer coatings about 900 to 1400 kg/m³, concrete weight coat 2200 to 3000 kg/m³ (common practice).',
  }),
  heightField('waterBottom', 'Water from (above the bottom)', '0', { advanced: true, help: 'Lower end of the water around the riser, if it does not start at the bottom end.' }),
  heightField('caissonBottom', 'Caisson open bottom (above the bottom end)', '', {
    optional: true,
    emptyMeans: 'the bottom of the water',
    advanced: true,
    help: 'Where the caisson ends below: it confines the water and shields the riser from the current from here up; below it the riser is in open water.',
  }),
  sizeField('caissonOffset', 'Caisson offset', '0', { min: NON_NEGATIVE, advanced: true, help: 'Distance between the riser and caisson centres.' }),
  {
    key: 'caissonOffsetAngle',
    label: 'Caisson offset direction',
    type: 'quantity',
    dimension: 'angle',
    units: { si: 'deg', us: 'deg' },
    default: '0',
    advanced: true,
    help: 'Angle between the offset and the direction of vibration: 0 = towards the near caisson wall.',
  },
  {
    key: 'tensionBasis',
    label: 'Top tension is',
    type: 'choice',
    choices: [
      { value: 'effective', label: 'Effective tension', help: 'The tension that governs bending (what riser analyses report), used as entered.' },
      { value: 'wall', label: 'Wall tension (load cell)', help: 'The true tension in the pipe wall; internal and external pressure turn it into the effective tension (Sparks, 1984).' },
    ],
    default: 'effective',
    advanced: true,
    help: "Bending uses the effective tension T_eff = T_wall − p_i·A_i + p_e·A_e (R. Sparks, ASME J. Energy Resources Technology 106, 1984); the tension used is shown with the results.",
  },
  {
    key: 'internalPressure',
    label: 'Internal pressure at the top',
    type: 'quantity',
    dimension: 'pressure',
    units: { si: 'bar', us: 'psi' },
    default: '0',
    advanced: true,
    showWhen: { key: 'tensionBasis', values: ['wall'] },
    help: 'Gauge pressure of the contents at the top. The outside water pressure at the top is worked out from the water surface.',
  },
  massField('topMass', 'Top mass', '0', { advanced: true, help: 'Wellhead, tree or tensioner frame carried at the top end; 0 for none.' }),
  sizeField('growthThickness', 'Marine growth thickness', '0', {
    min: NON_NEGATIVE,
    advanced: true,
    help: 'On the submerged length; typically 50 to 100 mm in the upper 40 m of North Sea waters (NORSOK N-003, Actions and action effects); 0 for none.',
  }),
  densityField('growthDensity', 'Marine growth density', '1325', { advanced: true, help: 'About 1325 kg/m³ (NORSOK N-003, Actions and action effects).' }),
  yesNoField('weightInTension', 'Weight changes the tension', 'yes', {
    advanced: true,
    help: 'Yes: tension falls from the top by the submerged weight below (compression near the bottom if the top tension is small).',
  }),
  END_EFFECT_FIELD,
  BEAM_THEORY_FIELD,
];

export const RISER_FORM = defineForm({
  kind: 'riser',
  title: 'Riser or conductor',
  summary: 'A vertical tube held sideways at guides, with chosen conditions at its bottom and top, optionally tensioned or inside a caisson.',
  fields: FIELDS,
  toInput(r, err): RiserInput | null {
    const tube = tubeInput(r, err);
    const length = r.num('length');
    const guides = [...r.list('guides')].sort((a, b) => a - b);
    const high = guides.find((z) => !(z < length));
    if (high !== undefined) err('guides', `guide heights must be below the top end (${r.fmt('length', length)}); ${r.fmt('guides', high)} is not`);
    const twice = guides.find((z, i) => i > 0 && z - guides[i - 1] <= 1e-6 * length);
    if (twice !== undefined) err('guides', `guide heights must differ: ${r.fmt('guides', twice)} appears twice`);
    const waterBottom = r.num('waterBottom');
    const waterSurface = r.num('waterSurface');
    if (!(waterSurface > waterBottom)) err('waterSurface', `the water surface must be above where the water starts (${r.fmt('waterSurface', waterBottom)})`);
    const coating = r.num('coatingThickness');
    const growth = r.num('growthThickness');
    const dc = r.opt('caissonDiameter');
    const offset = r.num('caissonOffset');
    const outer = tube.outerDiameterM + 2 * coating + 2 * growth;
    if (dc !== undefined && !(dc > outer + 2 * offset)) {
      const what = growth > 0 ? 'with coating and marine growth' : 'with coating';
      err('caissonDiameter', `caisson inner diameter must be more than the riser's outer diameter ${what} plus twice the offset (${r.fmt('caissonDiameter', outer + 2 * offset)}). A member touching the wall is outside the section model (for a circle touching a plane wall, 2D potential flow gives the finite limit Ca = π²/3 − 1 = 2.29, docs/sources.md §S3.3).`);
    }
    checkStubby('length', 'length', length, tube.outerDiameterM, 'outer diameter', err);
    const bottom = r.choice('bottomEnd') as EndCondition;
    const top = r.choice('topEnd') as EndCondition;
    const tension = r.num('topTension');
    const varies = r.choice('weightInTension') === 'yes';
    const supports = [...endSupports(bottom, 0), ...guides.map((atM) => ({ atM, kind: 'pinned' as const })), ...endSupports(top, length)];
    const input: RiserInput = {
      ...tube,
      ...commonInput(r),
      lengthM: length,
      contentsDensityKgPerM3: r.num('contentsDensity'),
      guideElevationsM: guides,
      bottom,
      top,
      topTensionN: tension,
      tensionVariesWithWeight: varies,
      liquidDensityKgPerM3: r.num('liquidDensity'),
      liquidFromM: waterBottom,
      liquidToM: waterSurface,
    };
    if (coating > 0) input.coating = { thicknessM: coating, densityKgPerM3: r.num('coatingDensity') };
    if (growth > 0) input.marineGrowth = { thicknessM: growth, densityKgPerM3: r.num('growthDensity') };
    const topMass = r.num('topMass');
    if (topMass > 0) input.topMassKg = topMass;
    if (r.choice('tensionBasis') === 'wall') {
      input.tensionBasis = 'wall';
      input.internalPressurePa = r.num('internalPressure');
    }
    // A constant tension holds rotation like a pendulum: the effective tension, as the build uses it.
    if (leavesRigidBodyMotion(supports, length, riserTopTension(input).effectiveN > 0 && !varies)) {
      err('bottomEnd', 'these ends and guides leave the riser free to move: add a guide, or make an end clamped or pinned');
    }
    // The angle field reads in radians (SI); the input takes degrees.
    if (dc !== undefined) {
      input.caisson = { innerDiameterM: dc, offsetM: offset, offsetAngleDeg: (r.num('caissonOffsetAngle') * 180) / Math.PI, innerFlowMPerS: r.opt('caissonInnerFlow') ?? 0 };
      const bottom = r.opt('caissonBottom');
      if (bottom !== undefined) {
        if (!(bottom < waterSurface)) err('caissonBottom', `the caisson's open bottom must be below the water surface (${r.fmt('waterSurface', waterSurface)})`);
        input.caisson.fromM = bottom;
      }
    }
    return input;
  },
  plausible(r, input, warn) {
    warnThinWall('wallThickness', input.wallThicknessM, input.outerDiameterM, (v) => r.fmt('wallThickness', v), warn);
    const held = [...endSupports(input.bottom, 0), ...input.guideElevationsM.map((atM) => ({ atM, kind: 'pinned' })), ...endSupports(input.top, input.lengthM)];
    const span = stubbinessLengthM(input.lengthM, held.filter((s) => s.kind === 'clamped' || s.kind === 'pinned').map((s) => s.atM));
    warnSlenderTheory(span < input.lengthM ? 'guides' : 'length', span, input.outerDiameterM, 'outer diameter', r.choice('beamTheory'), warn);
  },
  validate: validateRiserInput,
  coreFields: { ...COMMON_CORE_FIELDS, ...TUBE_CORE_FIELDS },
  buildModel: buildRiserModel,
});
