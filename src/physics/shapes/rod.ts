/** Rod: a solid circular bar of diameter D. */
import { roundProps, ROUND_TRAITS } from './round';
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
  ...ROUND_TRAITS,
};
