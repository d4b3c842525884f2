/** The baffle kind: everything about it, for the registry (src/kinds/registry.ts). */
import { MACHINE, MARGIN_AND_DAMPING, speed, VIV_LIMITS } from '../../forms/resonance-fields';
import type { KindModule } from '../kind-module';
import { buildBaffleModel, type BaffleInput, validateBaffleInput } from './build';
import { BAFFLE_DEMO } from './demo';
import { BAFFLE_FORM } from './form';

export const BAFFLE: KindModule<BaffleInput> = {
  id: BAFFLE_FORM.kind,
  engine: 'beam',
  title: BAFFLE_FORM.title,
  summary: BAFFLE_FORM.summary,
  searchWords: 'baffle tank',
  flowWord: 'liquid speed',
  validate: validateBaffleInput,
  build: buildBaffleModel,
  form: BAFFLE_FORM,
  resonance: {
    fields: [speed('flowSpeed', 'Liquid speed past the baffle', '', { optional: true, emptyMeans: 'no flow' }), ...MACHINE, ...MARGIN_AND_DAMPING, ...VIV_LIMITS],
    flow: 'flow-speed',
    waves: false,
    frequencyRatioScreen: false,
  },
  demo: BAFFLE_DEMO,
};
