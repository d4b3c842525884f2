import { defineConfig } from 'vite';

// Builds the benchmark runner for Node, so `npm run bench` measures the same bundled code path the CLI uses.
export default defineConfig({
  publicDir: false,
  build: {
    ssr: 'test/bench/run.ts',
    outDir: 'dist-bench',
    emptyOutDir: true,
    target: 'node20',
    minify: false,
  },
  logLevel: 'warn',
});
