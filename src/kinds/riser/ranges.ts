/** Uncertain inputs of the riser form and default ranges on them (SI), with their sources. */
import type { RangeDef } from '../../forms/ranges';

export const RISER_RANGES: readonly RangeDef[] = [
  {
    key: 'topTension',
    defaults: (likely) => (likely > 0 ? { low: 0.8 * likely, high: 1.2 * likely } : null),
    source: '±20 % of the top tension: tensioner settings drift (judgement)',
  },
  {
    key: 'contentsDensity',
    defaults: (likely) => (likely > 0 ? { low: 0.8 * likely, high: 1.2 * likely } : null),
    source: '±20 % of the contents density (judgement)',
  },
  {
    key: 'waterSurface',
    defaults: (likely) => ({ low: likely - 1.5, high: likely + 1.5 }),
    source: '±1.5 m of tide and surge: enter the site’s lowest and highest levels (judgement)',
  },
  {
    key: 'coatingThickness',
    defaults: (likely) => (likely > 0 ? { low: 0, high: likely + 0.05 } : null),
    source: 'coating or growth from none to 50 mm more than entered (judgement)',
  },
  {
    key: 'wallThickness',
    defaults: (likely) => ({ low: Math.max(likely - 0.003, 0.5 * likely), high: likely }),
    source: 'up to 3 mm lost to corrosion (common practice)',
  },
];
