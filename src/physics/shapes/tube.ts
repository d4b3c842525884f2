/** Tube: a circular hollow section, outer diameter D and wall t (0 < t < D/2); may hold contents. */
import { roundProps, ROUND_TRAITS } from './round';
import { lerp } from './shear';
import type { ShapeDescription } from './types';

export interface TubeSection {
  shape: 'tube';
  outerDiameterM: number;
  wallThicknessM: number;
}

export function tubeSection(outerDiameterM: number, wallThicknessM: number): TubeSection {
  return { shape: 'tube', outerDiameterM, wallThicknessM };
}

export const TUBE: ShapeDescription<TubeSection> = {
  id: 'tube',
  dimensions: ['outerDiameterM', 'wallThicknessM'],
  choices: {},
  check: (s) =>
    s.wallThicknessM < s.outerDiameterM / 2
      ? null
      : { field: 'wallThicknessM', expected: `less than the outer radius ${s.outerDiameterM / 2} m (use shape "rod" for a solid bar)`, got: s.wallThicknessM },
  holdsContents: true,
  props: (s, m) => roundProps(s.outerDiameterM, s.outerDiameterM - 2 * s.wallThicknessM, m),
  lerp: (a, b, t) => tubeSection(lerp(a.outerDiameterM, b.outerDiameterM, t), lerp(a.wallThicknessM, b.wallThicknessM, t)),
  depthM: (s) => s.outerDiameterM,
  solverBody: (s, c) => ({ shape: 'circle', diameterM: s.outerDiameterM + 2 * c }),
  ...ROUND_TRAITS,
};
