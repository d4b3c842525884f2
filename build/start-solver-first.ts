import { resolve } from 'node:path';
import type { Plugin } from 'vite';

const ENTRY = resolve(import.meta.dirname, '../src/start-solver.ts');

/**
 * Builds src/start-solver.ts as an entry of its own and puts it first in index.html as an `async` module script,
 * so the solver worker starts as soon as that small file arrives, not after the app's whole module graph has been
 * fetched and run (a few hundred ms on a slow tablet). Build only: the dev server's app makes its own worker.
 */
export function startSolverFirst(): Plugin {
  return {
    name: 'wetmode-start-solver-first',
    apply: 'build',
    config: () => ({ build: { rollupOptions: { input: { index: resolve(import.meta.dirname, '../index.html'), 'start-solver': ENTRY } } } }),
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const chunk = Object.values(ctx.bundle ?? {}).find((c) => c.type === 'chunk' && c.isEntry && c.facadeModuleId === ENTRY);
        if (!chunk) throw new Error('wetmode-start-solver-first: the start-solver entry was not built');
        return [{ tag: 'script', attrs: { type: 'module', async: true, src: `/${chunk.fileName}` }, injectTo: 'head' }];
      },
    },
  };
}
