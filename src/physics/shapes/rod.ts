/** Rod: a solid circular bar of diameter D. */
import { roundFlowSection, roundProps, ROUND_CA_REFERENCE } from './round';
import { lerp } from './shear';
import type { ShapeDescription } from './types';

export interface RodSection {
  shape: 'rod';
  diameterM: number;
}

export function rodSection(diameterM: number): RodSection {
  return { shape: 'rod', diameterM };
}

export const ROD: ShapeDescription<RodSection> = {
  id: 'rod',
  dimensions: ['diameterM'],
  choices: {},
  check: () => null,
  holdsContents: false,
  props: (s, m) => roundProps(s.diameterM, 0, m),
  lerp: (a, b, t) => rodSection(lerp(a.diameterM, b.diameterM, t)),
  depthM: (s) => s.diameterM,
  solverBody: (s, c) => ({ shape: 'circle', diameterM: s.diameterM + 2 * c }),
  flowSection: roundFlowSection,
  closedForm: 'circle closed form (Lamb)',
  perforable: false,
  endEffectBasis: 'circular cylinder',
  caReferenceArea: ROUND_CA_REFERENCE,
  wetWarning: () => null,
};
