/**
 * The worked example of this kind, in an invented setting (no real site, company or person). Values are as a
 * surveyor would type them, units included, so they read the same in either unit system.
 */
import type { DemoCase } from '../../forms/types';

export const PILE_DEMO: DemoCase = {
  kind: 'pile',
  name: 'Port Halloran quay, berth 3, pile P7',
  tag: 'PH-B3-P7',
  note: 'Invented example. Open-ended steel pile under the deck of the fictional Port Halloran quay, checked at high water (+1.8 m) with 75 mm of marine growth and a 12 t share of the deck.',
  system: 'si',
  values: {
    outerDiameter: '762 mm',
    wallThickness: '14 mm',
    material: 'carbon-steel',
    waterDepth: '9.5 m',
    topAboveWater: '4.2 m',
    waterLevelOffset: '1.8 m',
    foundation: 'fixity',
    fixityDepth: '',
    topMass: '12 t',
    flooded: 'flooded',
    growthThickness: '75 mm',
    liquidDensity: '1025 kg/m^3',
  },
  excitation: { currentSurface: '1.2 m/s', currentMid: '0.9 m/s', currentBed: '0.4 m/s', wavePeriodMin: '3 s', wavePeriodMax: '8 s' },
};
