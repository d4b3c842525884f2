/** The stem kind: everything about it, for the registry (src/kinds/registry.ts). */
import { FREQUENCY_RATIO_LIMIT, MACHINE, MARGIN_AND_DAMPING, speed, VIV_LIMITS } from '../../forms/resonance-fields';
import type { KindModule } from '../kind-module';
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
      speed('flowSpeed', 'Flow speed in the pipe', '2', { help: 'Largest expected flow speed past the stem (design flow rate ÷ pipe bore area).' }),
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
