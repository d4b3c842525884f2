import { defineConfig } from 'vite';
import pkg from './package.json' with { type: 'json' };

// Builds the `wetmode` command (src/cli.ts) into dist-cli/wetmode.js, a small Node ES module that loads each
// command's code (dist-cli/chunks/) only when that command runs, so `--version` and the SI commands skip mathjs.
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
      output: { entryFileNames: 'wetmode.js', chunkFileNames: 'chunks/[name]-[hash].js', banner: (chunk) => (chunk.isEntry ? '#!/usr/bin/env node' : '') },
    },
  },
  ssr: { noExternal: true },
  logLevel: 'warn',
});
