/**
 * The worked example of this kind, in an invented setting (no real site, company or person). Values are as a
 * surveyor would type them, units included, so they read the same in either unit system.
 */
import type { DemoCase } from '../../forms/types';

export const STEM_DEMO: DemoCase = {
  kind: 'stem',
  name: 'MV Tern Haven, seawater cooling line, temperature well TW2',
  tag: 'TH-SW-TW2',
  note: 'Invented example. A tapered stainless thermowell in the seawater cooling line of the fictional vessel MV Tern Haven, with a 50 g sensor head at the tip.',
  system: 'si',
  values: {
    insertionLength: '180 mm',
    rootDiameter: '25 mm',
    tipDiameter: '19 mm',
    boreDiameter: '6.5 mm',
    material: 'stainless-316',
    tipMass: '50 g',
    liquidDensity: '1025 kg/m^3',
    surroundingDiameter: '',
    rootSupport: 'rigid',
  },
  excitation: { flowSpeed: '3.2 m/s', machineSpeed: '1780 rpm', bladeCount: '6' },
};
