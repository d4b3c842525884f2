/** The pile kind: everything about it, for the registry (src/kinds/registry.ts). */
import { CURRENT, MACHINE, MARGIN_AND_DAMPING, VIV_LIMITS, WAVES } from '../../forms/resonance-fields';
import type { KindModule } from '../kind-module';
import { buildPileModel, type PileInput, validatePileInput } from './build';
import { PILE_DEMO } from './demo';
import { PILE_FORM } from './form';

export const PILE: KindModule<PileInput> = {
  id: PILE_FORM.kind,
  engine: 'beam',
  title: PILE_FORM.title,
  summary: PILE_FORM.summary,
  searchWords: 'pile',
  flowWord: 'current',
  validate: validatePileInput,
  build: buildPileModel,
  form: PILE_FORM,
  resonance: {
    fields: [...CURRENT, ...WAVES, ...MACHINE, ...MARGIN_AND_DAMPING, ...VIV_LIMITS],
    flow: 'current-profile',
    waves: true,
    frequencyRatioScreen: false,
  },
  demo: PILE_DEMO,
};
