import { defineConfig } from '@playwright/test';
import { CHROMIUM_ARGS, chooseChromium } from './test/tools/chromium';

/**
 * End-to-end tests against the production build served by `vite preview`, so the service worker and precache are
 * the real ones, in `CHROMIUM_PATH`, else Debian's `/usr/bin/chromium`, else the Chromium shipped in the
 * `@sparticuz/chromium` devDependency (test/tools/chromium.ts); never Playwright's own browser download.
 */
/** Port of the preview server; another worktree may be serving on the default one. */
const port = Number(process.env.WETMODE_E2E_PORT ?? 4173);
const browser = chooseChromium();
// The config is read by the runner and again by each worker: say once which browser runs.
if (process.env.TEST_WORKER_INDEX === undefined) console.log(`Browser tests run in ${browser.label}`);

export default defineConfig({
  testDir: 'test/e2e',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 2,
  retries: 0,
  reporter: [['list']],
  outputDir: 'test-results',
  use: {
    baseURL: `http://localhost:${port}`,
    viewport: { width: 1024, height: 768 },
    launchOptions: {
      executablePath: browser.executablePath,
      args: CHROMIUM_ARGS,
      ...(browser.env ? { env: { ...process.env, ...browser.env } } : {}),
    },
    trace: 'off',
  },
  webServer: {
    command: `npx vite preview --port ${port} --strictPort`,
    url: `http://localhost:${port}`,
    reuseExistingServer: !process.env.CI,
    timeout: 60_000,
  },
});
