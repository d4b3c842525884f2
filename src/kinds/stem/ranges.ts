/** Uncertain inputs of the sensor-stem form and default ranges on them (SI), with their sources. */
import type { RangeDef } from '../../forms/ranges';

export const STEM_RANGES: readonly RangeDef[] = [
  {
    key: 'rootStiffness',
    defaults: (likely) => (likely > 0 ? { low: likely / 2, high: likely * 2 } : null),
    source: 'half to twice the stiffness entered: root fixity is rarely known better (judgement)',
  },
  {
    key: 'liquidDensity',
    defaults: (likely) => ({ low: 0.9 * likely, high: 1.1 * likely }),
    source: '±10 % of the liquid density (judgement)',
  },
  {
    key: 'insertionLength',
    defaults: (likely) => ({ low: likely - 0.003, high: likely + 0.003 }),
    source: '±3 mm of fabrication and fitting tolerance (judgement)',
  },
  {
    key: 'tipMass',
    defaults: (likely) => (likely > 0 ? { low: 0.8 * likely, high: 1.2 * likely } : null),
    source: '±20 % of the sensor mass (judgement)',
  },
];
