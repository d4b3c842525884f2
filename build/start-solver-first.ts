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
      handler(html, ctx) {
        const chunk = Object.values(ctx.bundle ?? {}).find((c) => c.type === 'chunk' && c.isEntry && c.facadeModuleId === ENTRY);
        if (!chunk) throw new Error('wetmode-start-solver-first: the start-solver entry was not built');
        // Just before the app's script, ahead of its preloads: asked for second, it is not queued behind them.
        const at = html.indexOf('<script type="module"');
        if (at < 0) throw new Error('wetmode-start-solver-first: index.html has no module script');
        return `${html.slice(0, at)}<script type="module" async src="/${chunk.fileName}"></script>\n    ${html.slice(at)}`;
      },
    },
  };
}
