/**
 * The worked example of this kind, in an invented setting (no real site, company or person): the same plate as
 * examples/plate-marrow-creek-baffle.json, as a surveyor would type it.
 */
import type { DemoCase } from '../../forms/types';

export const PLATE_DEMO: DemoCase = {
  kind: 'plate-panel',
  name: 'Marrow Creek plant, settling tank T-7, cross baffle',
  tag: 'MC-T7-B1',
  note: 'Invented example. A steel cross baffle in a settling tank at the fictional Marrow Creek plant, welded to both side walls and the floor, free along its top, water 2 m deep over it, end walls 3 m away on each side.',
  system: 'si',
  values: {
    width: '2 m',
    height: '1 m',
    thickness: '10 mm',
    material: 'carbon-steel',
    leftEdge: 'clamped',
    rightEdge: 'clamped',
    bottomEdge: 'clamped',
    topEdge: 'free',
    liquidSetting: 'across-tank-2',
    liquidDepth: '2 m',
    endWallDistance: '3 m',
    liquidDensity: '1000 kg/m^3',
  },
  excitation: { machineSpeed: '90 rpm', bladeCount: '3' },
};
