/**
 * The worked example of this kind, in an invented setting (no real site, company or person). Values are as a
 * surveyor would type them, units included, so they read the same in either unit system.
 */
import type { DemoCase } from '../../forms/types';

export const RISER_DEMO: DemoCase = {
  kind: 'riser',
  name: 'Skerry Alpha, gas export riser in caisson C2',
  tag: 'SKA-C2-GX',
  note: 'Invented example. A 12¾ in gas riser on the fictional platform Skerry Alpha, pinned at its foot, held by four guides and running inside a 24 in caisson, 2 in off centre.',
  system: 'us',
  values: {
    outerDiameter: '12.75 in',
    wallThickness: '0.5 in',
    length: '148 ft',
    guides: '30 ft, 62 ft, 94 ft, 126 ft',
    bottomEnd: 'pinned',
    topEnd: 'free',
    contents: 'gas',
    waterSurface: '120 ft',
    liquidDensity: '64 lb/ft^3',
    topTension: '0 kip',
    caissonDiameter: '24 in',
    caissonOffset: '2 in',
  },
  excitation: { currentSurface: '0', wavePeriodMin: '', wavePeriodMax: '' },
};
