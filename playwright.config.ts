import { defineConfig } from '@playwright/test';

/**
 * End-to-end tests in Debian's Chromium (never Playwright's own browser download), against the production
 * build served by `vite preview`, so the service worker and precache are the real ones.
 */
/** Port of the preview server; another worktree may be serving on the default one. */
const port = Number(process.env.WETMODE_E2E_PORT ?? 4173);
const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

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
      executablePath,
      // Flags for a root, offline-by-design machine: no sandbox, no background calls out.
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
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
