/** Uncertain inputs of the pile form and the trade's default ranges on them (SI), with their sources. */
import type { RangeDef } from '../../forms/ranges';
import { DEFAULT_FIXITY_DIAMETERS } from './build';

export const PILE_RANGES: readonly RangeDef[] = [
  {
    key: 'fixityDepth',
    // Effective fixity of a laterally loaded pile is usually taken 3.5 to 8 diameters below the mudline, stiff
    // soils at the low end (common practice, no single source).
    defaults: (_likely, read) => {
      const d = read('outerDiameter');
      return d === undefined ? null : { low: 3.5 * d, high: 8 * d };
    },
    likelyWhenEmpty: (read) => {
      const d = read('outerDiameter');
      return d === undefined ? undefined : DEFAULT_FIXITY_DIAMETERS * d;
    },
    source: '3.5 to 8 outer diameters below the mudline (common practice)',
  },
  {
    key: 'soilModulus',
    defaults: (likely) => (likely > 0 ? { low: likely / 2, high: likely * 2 } : null),
    source: 'half to twice the value entered: subgrade moduli are rarely known better (judgement)',
  },
  {
    key: 'soilModulusGradient',
    // Submerged sand, loose 1.3 to dense 10.7 MN/m³ (K. Terzaghi, Evaluation of coefficients of subgrade
    // reaction, Géotechnique 5, 1955).
    defaults: () => ({ low: 1.3e6, high: 10.7e6 }),
    source: 'loose to dense submerged sand, 1.3 to 10.7 MN/m³ (K. Terzaghi, Géotechnique 5, 1955)',
  },
  {
    key: 'growthThickness',
    // 50 to 100 mm in the upper zone of North Sea waters (NORSOK N-003, Actions and action effects); none at all
    // on a cleaned or new pile.
    defaults: () => ({ low: 0, high: 0.1 }),
    source: 'none to 100 mm (NORSOK N-003, Actions and action effects, marine growth)',
  },
  {
    key: 'growthDensity',
    defaults: () => ({ low: 1100, high: 1400 }),
    source: '1100 to 1400 kg/m³ about the 1325 kg/m³ of NORSOK N-003 (judgement)',
  },
  {
    key: 'topMass',
    defaults: (likely) => (likely > 0 ? { low: 0.75 * likely, high: 1.25 * likely } : null),
    source: '±25 % of the share of the deck carried (judgement)',
  },
  {
    key: 'waterLevelOffset',
    defaults: (likely) => ({ low: likely - 1.5, high: likely + 1.5 }),
    source: '±1.5 m of tide and surge: enter the site’s lowest and highest levels (judgement)',
  },
  {
    key: 'wallThickness',
    // A corrosion allowance of a few millimetres on the wall (common practice, no source).
    defaults: (likely) => ({ low: Math.max(likely - 0.003, 0.5 * likely), high: likely }),
    source: 'up to 3 mm lost to corrosion (common practice)',
  },
];
