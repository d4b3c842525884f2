/** The stem kind: everything about it, for the registry (src/kinds/registry.ts). */
import { FREQUENCY_RATIO_LIMIT, MACHINE, MARGIN_AND_DAMPING, speed, VIV_LIMITS } from '../../forms/resonance-fields';
import type { KindModule } from '../kind-module';
import { NON_NEGATIVE, sizeField } from '../../forms/presets';
import { buildStemModel, type StemInput, validateStemInput } from './build';
import { STEM_DEMO } from './demo';
import { STEM_FORM } from './form';

export const STEM: KindModule<StemInput> = {
  id: STEM_FORM.kind,
  engine: 'beam',
  title: STEM_FORM.title,
  summary: STEM_FORM.summary,
  searchWords: 'sensor stem',
  flowWord: 'flow speed',
  validate: validateStemInput,
  build: buildStemModel,
  form: STEM_FORM,
  resonance: {
    fields: [
      speed('flowSpeed', 'Flow speed in the pipe', '2', {
        optional: true,
        emptyMeans: 'from the flow rate',
        help: 'Largest expected flow speed past the stem. Or clear it and give the flow rate and the pipe bore below.',
      }),
      {
        key: 'flowRate',
        label: 'Flow rate',
        type: 'quantity',
        dimension: 'flow-rate',
        units: { si: 'm^3/h', us: 'gal/min' },
        default: '',
        optional: true,
        emptyMeans: 'flow speed as entered',
        min: NON_NEGATIVE,
        help: 'Largest expected volume flow rate; with the pipe bore it gives the mean flow speed Q ÷ (π d²/4). Used when the flow speed is empty.',
      },
      sizeField('pipeBore', 'Pipe bore', '', { optional: true, emptyMeans: 'not needed', help: 'Inside diameter of the pipe the stem reaches into; needed with a flow rate.' }),
      ...MACHINE,
      ...MARGIN_AND_DAMPING,
      ...VIV_LIMITS,
      ...FREQUENCY_RATIO_LIMIT,
    ],
    flow: 'flow-speed',
    waves: false,
    frequencyRatioScreen: true,
  },
  demo: STEM_DEMO,
};
