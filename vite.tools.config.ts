import { defineConfig } from 'vite';

// Builds one-off tools under test/tools for Node (icon rendering).
export default defineConfig({
  publicDir: false,
  build: { ssr: 'test/tools/make-icons.ts', outDir: 'dist-tools', emptyOutDir: true, target: 'node20', minify: false },
  logLevel: 'warn',
});
