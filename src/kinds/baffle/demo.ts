/**
 * The worked example of this kind, in an invented setting (no real site, company or person). Values are as a
 * surveyor would type them, units included, so they read the same in either unit system.
 */
import type { DemoCase } from '../../forms/types';

export const BAFFLE_DEMO: DemoCase = {
  kind: 'baffle',
  name: 'Marrow Creek plant, mix tank T-4, deflector plate',
  tag: 'MC-T4-DP1',
  note: 'Invented example. A stainless deflector plate in a mixing tank at the fictional Marrow Creek plant, welded at its foot, bolted at the top, standing 40 mm off the flat end wall.',
  system: 'si',
  values: {
    span: '1.6 m',
    width: '250 mm',
    thickness: '12 mm',
    material: 'stainless-316',
    lowerEnd: 'welded',
    upperEnd: 'bolted',
    lowerEndHeight: '0.4 m',
    liquidLevel: '3.1 m',
    liquidDensity: '1080 kg/m^3',
    wallGap: '40 mm',
    perforation: '0 %',
  },
  excitation: { flowSpeed: '0.8 m/s', machineSpeed: '84 rpm', bladeCount: '3' },
};
