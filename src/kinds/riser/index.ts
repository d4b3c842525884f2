/** The riser kind: everything about it, for the registry (src/kinds/registry.ts). */
import { CURRENT, MACHINE, MARGIN_AND_DAMPING, VIV_LIMITS, WAVES } from '../../forms/resonance-fields';
import type { KindModule } from '../kind-module';
import { buildRiserModel, type RiserInput, validateRiserInput } from './build';
import { RISER_DEMO } from './demo';
import { RISER_FORM } from './form';

export const RISER: KindModule<RiserInput> = {
  id: RISER_FORM.kind,
  engine: 'beam',
  title: RISER_FORM.title,
  summary: RISER_FORM.summary,
  searchWords: 'riser conductor',
  flowWord: 'current',
  validate: validateRiserInput,
  build: buildRiserModel,
  form: RISER_FORM,
  resonance: {
    fields: [...CURRENT, ...WAVES, ...MACHINE, ...MARGIN_AND_DAMPING, ...VIV_LIMITS],
    flow: 'current-profile',
    waves: true,
    frequencyRatioScreen: false,
  },
  demo: RISER_DEMO,
};
