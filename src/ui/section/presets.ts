/**
 * Starting points for the Section editor: common sections and surroundings, in mm. The scenarios are
 * generic (no real site). Each names the motion its map opens with and what a surveyor would expect.
 */
import type { SectionDof } from '../../physics/section';
import { newBody, openWater, type SectionForm } from './form';
import type { SectionView } from './view-words';

export interface SectionPreset {
  id: string;
  label: string;
  /** One line on what it shows. */
  about: string;
  /** Motion shown on the map first. */
  motion: SectionDof;
  /** How the section is seen (see view-words.ts); absent: along a horizontal member (elevation). */
  view?: SectionView;
  make: () => SectionForm;
}

const SEAWATER = '1025';
const FRESH_WATER = '998';

export const SECTION_PRESETS: readonly SectionPreset[] = [
  {
    id: 'circle',
    label: 'Circle in open water',
    about: 'A 500 mm round member far from any boundary: Ca = 1 in every direction.',
    motion: 'x',
    make: () => ({ density: SEAWATER, bodies: [newBody('circle', { diameter: '500' })], surround: openWater() }),
  },
  {
    id: 'square',
    label: 'Square',
    about: 'A 500 mm square box section with sharp corners, moving along a side.',
    motion: 'x',
    make: () => ({ density: SEAWATER, bodies: [newBody('rectangle', { width: '500', height: '500', cornerRadius: '' })], surround: openWater() }),
  },
  {
    id: 'plate',
    label: 'Flat plate',
    about: 'A 1 m wide, 10 mm plate moving across itself (heave): Ca close to 1 on the plate width.',
    motion: 'y',
    make: () => ({ density: SEAWATER, bodies: [newBody('plate', { width: '1000', thickness: '10' })], surround: openWater() }),
  },
  {
    id: 'annulus',
    label: 'Stem in a pipe (annulus)',
    about: 'A 25 mm sensor stem centred in a 100 mm bore: the narrow gap raises the added mass.',
    motion: 'x',
    make: () => ({
      density: FRESH_WATER,
      bodies: [newBody('circle', { diameter: '25' })],
      surround: openWater({ enclosure: 'circle', enclosureDiameter: '100' }),
    }),
  },
  {
    id: 'seabed',
    label: 'Pile near the seabed',
    about: 'A 900 mm pile with its centre 900 mm above the seabed (a 450 mm gap).',
    motion: 'y',
    make: () => ({
      density: SEAWATER,
      bodies: [newBody('circle', { diameter: '900' })],
      surround: openWater({ wallBelow: true, wallBelowDistance: '900' }),
    }),
  },
  {
    id: 'pair',
    label: 'Two piles side by side',
    about: 'Two 900 mm piles 1.8 m apart centre to centre: the off-diagonal terms couple them.',
    motion: 'x',
    view: 'plan',
    make: () => ({
      density: SEAWATER,
      bodies: [newBody('circle', { diameter: '900', x: '-900' }), newBody('circle', { diameter: '900', x: '900' })],
      surround: openWater(),
    }),
  },
  {
    id: 'float',
    label: 'Half-immersed float',
    about: 'A 1 m round float with the free surface through its centre: heave Ca = 0.5 in the high-frequency limit.',
    motion: 'y',
    make: () => ({
      density: SEAWATER,
      bodies: [newBody('circle', { diameter: '1000' })],
      surround: openWater({ freeSurface: true, freeSurfaceDistance: '0' }),
    }),
  },
];
