import { defineConfig } from 'vite';
import pkg from './package.json' with { type: 'json' };

// Builds the `wetmode` command (src/cli.ts) into one Node ES module, dist-cli/wetmode.js.
export default defineConfig({
  publicDir: false,
  define: { __APP_VERSION__: JSON.stringify(pkg.version) },
  build: {
    ssr: 'src/cli.ts',
    outDir: 'dist-cli',
    emptyOutDir: true,
    target: 'node20',
    minify: false,
    rollupOptions: {
      output: { entryFileNames: 'wetmode.js', banner: '#!/usr/bin/env node' },
    },
  },
  ssr: { noExternal: true },
  logLevel: 'warn',
});
