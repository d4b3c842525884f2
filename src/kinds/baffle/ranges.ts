/** Uncertain inputs of the baffle form and default ranges on them (SI), with their sources. */
import type { RangeDef } from '../../forms/ranges';

export const BAFFLE_RANGES: readonly RangeDef[] = [
  {
    key: 'liquidLevel',
    defaults: (likely) => (likely > 0 ? { low: 0.5 * likely, high: 1.2 * likely } : null),
    source: 'half to 1.2 times the level entered: tank levels move with operation (judgement)',
  },
  {
    key: 'thickness',
    defaults: (likely) => ({ low: Math.max(likely - 0.0015, 0.5 * likely), high: likely }),
    source: 'up to 1.5 mm lost to corrosion (common practice)',
  },
  {
    key: 'perforation',
    defaults: (likely) => ({ low: Math.max(0, likely - 0.05), high: Math.min(0.5, likely + 0.05) }),
    source: '±5 points of open area (judgement)',
  },
  {
    key: 'liquidDensity',
    defaults: (likely) => ({ low: 0.95 * likely, high: 1.05 * likely }),
    source: '±5 % of the liquid density (judgement)',
  },
];
