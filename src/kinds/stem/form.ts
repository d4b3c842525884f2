/** The sensor stem form: fields, cross-field checks and the mapping to StemInput. */
import { buildStemModel, type StemInput, validateStemInput } from './build';
import { COMMON_CORE_FIELDS, commonInput } from '../../forms/common-input';
import { defineForm } from '../../forms/define';
import { BEAM_THEORY_FIELD, END_EFFECT_FIELD, liquidDensityField, PROCESS_LIQUID_PLAUSIBLE, materialFields, NON_NEGATIVE, POSITIVE, sizeField } from '../../forms/presets';
import { checkStubby, warnSlenderTheory } from '../../forms/plausible';
import type { FieldDef } from '../../forms/types';
import { WATER_TEMPERATURE_RANGE_C } from '../../physics/practice/liquid-properties';

/** Thermowells and probes: about 5 to 100 mm across (common practice); outside that, check the unit. */
const STEM_DIAMETER_PLAUSIBLE = { min: 0.005, max: 0.1, basis: 'sensor stems are about 5 to 100 mm across, common practice' };

const FIELDS: readonly FieldDef[] = [
  sizeField('insertionLength', 'Insertion length', '250', { help: 'From the support face (pipe or vessel wall, or nozzle weld) to the tip.' }),
  sizeField('rootDiameter', 'Root diameter', '28', { plausible: STEM_DIAMETER_PLAUSIBLE }),
  sizeField('tipDiameter', 'Tip diameter', '22', { plausible: STEM_DIAMETER_PLAUSIBLE, help: 'Same as the root diameter for a straight stem.' }),
  sizeField('boreDiameter', 'Bore diameter', '7', { min: NON_NEGATIVE, help: '0 for a solid bar.' }),
  ...materialFields('stainless-316'),
  {
    key: 'tipMass',
    label: 'Sensor or tip mass',
    type: 'quantity',
    dimension: 'mass',
    units: { si: 'kg', us: 'lb' },
    default: '0',
    min: NON_NEGATIVE,
  },
  liquidDensityField(1000, 'Process liquid: water 1000 kg/m³, light oils and fuels about 800 to 850 kg/m³ (common inputs). Not used when a water temperature is given.', PROCESS_LIQUID_PLAUSIBLE),
  {
    key: 'waterTemperature',
    label: 'Water temperature (°C)',
    type: 'quantity',
    dimension: 'ratio',
    units: { si: '', us: '' },
    default: '',
    optional: true,
    emptyMeans: 'density as entered',
    min: { valueSI: WATER_TEMPERATURE_RANGE_C[0], inclusive: true },
    max: { valueSI: WATER_TEMPERATURE_RANGE_C[1], inclusive: true },
    help: `For water, in °C (${WATER_TEMPERATURE_RANGE_C[0]}–${WATER_TEMPERATURE_RANGE_C[1]}): density and viscosity from the CRC Handbook of Chemistry and Physics (Properties of water), in place of the density above. Leave empty for other liquids.`,
  },
  sizeField('surroundingDiameter', 'Surrounding tube inner diameter', '', {
    optional: true,
    emptyMeans: 'open liquid',
    help: 'Only for a tube around the stem and along it (sleeve, stilling well). A pipe the stem crosses does not count: leave empty.',
  }),
  {
    key: 'rootSupport',
    label: 'Support at the root',
    type: 'choice',
    choices: [
      { value: 'rigid', label: 'Rigid', help: 'Clamped at the support face: a stem welded into a thick wall or a stiff forged boss.' },
      { value: 'rotational-spring', label: 'Flexible', help: 'Held in position, rotating against a spring (a flexible nozzle or flange).' },
    ],
    default: 'rigid',
    help: 'A real mounting is never fully rigid: its compliance lowers the natural frequency. ASME PTC 19.3 TW-2010 (Thermowells) allows for this with a support-compliance factor on the ideal clamped frequency; here a flexible root is a rotational spring instead. Rigid gives the upper bound.',
  },
  {
    key: 'rootStiffness',
    label: 'Root rotational stiffness',
    type: 'quantity',
    dimension: 'rotational-stiffness',
    units: { si: 'kN m/rad', us: 'lbf ft/rad' },
    default: '50',
    min: POSITIVE,
    showWhen: { key: 'rootSupport', values: ['rotational-spring'] },
    help: 'Moment per radian at the support face: from the nozzle or flange as a short beam (about E·I/L of the nozzle for a standoff of length L, common practice) or from a measured frequency. The default 50 kN m/rad is a placeholder, not a published value: enter your own.',
  },
  sizeField('shieldedLength', 'Length inside the nozzle', '0', {
    min: NON_NEGATIVE,
    advanced: true,
    help: 'Length from the support face that stays inside a nozzle or standoff, out of the flow: no shedding is screened over it.',
  }),
  END_EFFECT_FIELD,
  BEAM_THEORY_FIELD,
];

export const STEM_FORM = defineForm({
  kind: 'stem',
  title: 'Sensor stem',
  summary: 'A cantilever such as a thermowell or probe reaching into a pipe or vessel full of liquid.',
  fields: FIELDS,
  toInput(r, err): StemInput | null {
    const root = r.num('rootDiameter');
    const tip = r.num('tipDiameter');
    const bore = r.num('boreDiameter');
    if (!(bore < Math.min(root, tip))) {
      err('boreDiameter', `bore must be less than the ${tip <= root ? 'tip' : 'root'} diameter (${r.fmt('boreDiameter', Math.min(root, tip))})`);
    }
    const around = r.opt('surroundingDiameter');
    if (around !== undefined && !(around > Math.max(root, tip))) {
      err('surroundingDiameter', `surrounding tube inner diameter must be more than the stem's largest diameter (${r.fmt('surroundingDiameter', Math.max(root, tip))}). A stem touching the wall is outside the section model (for a circle touching a plane wall, 2D potential flow gives the finite limit Ca = π²/3 − 1 = 2.29, docs/sources.md §S3.3).`);
    }
    const input: StemInput = {
      insertionLengthM: r.num('insertionLength'),
      rootDiameterM: root,
      tipDiameterM: tip,
      boreDiameterM: bore,
      ...commonInput(r),
      tipMassKg: r.num('tipMass'),
      liquidDensityKgPerM3: r.num('liquidDensity'),
      rootSupport: r.choice('rootSupport') === 'rigid' ? { kind: 'rigid' } : { kind: 'rotational-spring', stiffnessNmPerRad: r.num('rootStiffness') },
    };
    if (around !== undefined) input.surroundingInnerDiameterM = around;
    // Added only when set, so a case saved before these fields existed reads to the same input.
    const temp = r.opt('waterTemperature');
    if (temp !== undefined) input.waterTemperatureC = temp;
    const shielded = r.num('shieldedLength');
    if (shielded > 0) {
      if (!(shielded < input.insertionLengthM)) err('shieldedLength', `the length inside the nozzle must be less than the insertion length (${r.fmt('insertionLength', input.insertionLengthM)})`);
      input.shieldedLengthM = shielded;
    }
    checkStubby('insertionLength', 'insertion length', input.insertionLengthM, Math.max(root, tip), 'root diameter', err);
    return input;
  },
  plausible(r, input, warn) {
    warnSlenderTheory('insertionLength', input.insertionLengthM, Math.max(input.rootDiameterM, input.tipDiameterM), 'diameter', r.choice('beamTheory'), warn);
  },
  validate: validateStemInput,
  coreFields: { ...COMMON_CORE_FIELDS },
  buildModel: buildStemModel,
});
