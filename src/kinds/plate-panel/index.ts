/** The plate-panel kind: everything about it, for the registry (src/kinds/registry.ts). Solved by the plate engine. */
import type { ResonanceSpec } from '../../forms/excitation';
import type { PlateBuild } from '../common/types';
import type { KindModule } from '../kind-module';
import { buildPlateModel, type PlateInput, validatePlateInput } from './build';
import { PLATE_DEMO } from './demo';
import { PLATE_RESONANCE_FIELDS } from './excitation';
import { PLATE_FORM } from './form';

/** Read by readPlateExcitation (excitation.ts), not by the beam kinds' reader: no flow, no waves. */
const RESONANCE: ResonanceSpec = { fields: PLATE_RESONANCE_FIELDS, flow: 'flow-speed', waves: false, frequencyRatioScreen: false };

export const PLATE: KindModule<PlateInput, PlateBuild> = {
  id: PLATE_FORM.kind,
  engine: 'plate',
  title: PLATE_FORM.title,
  summary: PLATE_FORM.summary,
  searchWords: 'plate panel baffle bulkhead wall gate hatch cover tank',
  flowWord: 'liquid speed',
  validate: validatePlateInput,
  build: buildPlateModel,
  form: PLATE_FORM,
  resonance: RESONANCE,
  demo: PLATE_DEMO,
};
