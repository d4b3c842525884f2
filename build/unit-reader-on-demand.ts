import { resolve } from 'node:path';
import type { Plugin } from 'vite';

const UNITS = resolve(import.meta.dirname, '../src/units');
const ON_DEMAND = resolve(UNITS, 'math-on-demand.ts');

/**
 * In the app (not the command line or the tests), src/units reads through ./math-on-demand instead of ./math,
 * so mathjs is a chunk of its own, fetched when a typed value first needs it rather than before the first answer.
 * Only the files of src/units are redirected; math-on-demand itself still imports the real ./math.
 */
export function unitReaderOnDemand(): Plugin {
  return {
    name: 'wetmode-unit-reader-on-demand',
    enforce: 'pre',
    resolveId(source, importer) {
      if (source !== './math' || !importer) return null;
      const from = resolve(importer, '..');
      if (from !== UNITS || resolve(importer) === ON_DEMAND) return null;
      return ON_DEMAND;
    },
  };
}
