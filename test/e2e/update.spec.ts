import { test, expect, type Page } from '@playwright/test';
import { serviceWorkerActivated } from './support/service-worker';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * A new version arriving while a case is open: the app waits for the user, and keeps the open work.
 * Runs on its own server (port 4174) over a copy of the build, so rebuilding it disturbs no other test.
 */
const PORT = 4174;
let dir = '';
let server: ChildProcess | null = null;

test.describe.configure({ mode: 'serial' });

test.beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'wetmode-update-'));
  cpSync('dist', dir, { recursive: true });
  // Node runs Vite directly (not through npx), so killing this process stops the server.
  server = spawn(process.execPath, ['node_modules/vite/bin/vite.js', 'preview', '--outDir', dir, '--port', String(PORT), '--strictPort'], { stdio: 'ignore' });
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(`http://localhost:${PORT}/`)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('preview server for the update test did not start');
});

/** Publishes a new build over the served one and asks the page's service worker to look for it. */
async function publishBuild(page: Page, stamp: string): Promise<void> {
  const built = spawnSync(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--outDir', dir, '--emptyOutDir'], {
    env: { ...process.env, WETMODE_BUILD_STAMP: stamp },
    encoding: 'utf8',
  });
  expect(built.status, built.stderr).toBe(0);
  await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
}

test.afterAll(() => {
  server?.kill();
  if (dir) rmSync(dir, { recursive: true, force: true });
});

test('a new version waits for the user, and updating keeps the case being edited', async ({ page }) => {
  test.setTimeout(120_000);
  await page.goto(`http://localhost:${PORT}/`);
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await serviceWorkerActivated(page);
  // A later visit: the page is now controlled by the installed version, as on a surveyor's tablet.
  await page.reload();
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  expect(await page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
  const od = page.locator('[data-field="outerDiameter"] input');
  await od.fill('813 mm');

  await publishBuild(page, 'update-test');

  // The prompt appears; the new version waits; nothing reloads by itself; the typed value is still there.
  await expect(page.getByText('A new version of Wetmode is ready')).toBeVisible({ timeout: 30_000 });
  expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.waiting?.state)).toBe('installed');
  await page.waitForTimeout(1500);
  await expect(od).toHaveValue('813 mm');

  await Promise.all([page.waitForEvent('load'), page.getByRole('button', { name: 'Update now' }).click()]);
  await expect(page.locator('[data-field="outerDiameter"] input')).toHaveValue('813 mm'); // the draft came back
  await page.goto(`http://localhost:${PORT}/#/report`);
  await expect(page.getByText('Wetmode 0.1.0+update-test')).toBeVisible(); // the new version is the one running
});

test('a new version that arrives during the very first visit comes in with one tap too', async ({ page }) => {
  test.setTimeout(120_000);
  await page.goto(`http://localhost:${PORT}/`);
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await serviceWorkerActivated(page);
  // First visit: the page is not controlled yet, so the new worker activates without waiting.
  expect(await page.evaluate(() => navigator.serviceWorker.controller)).toBeNull();
  await publishBuild(page, 'first-visit');
  await expect(page.getByText('A new version of Wetmode is ready')).toBeVisible({ timeout: 30_000 });
  await Promise.all([page.waitForEvent('load'), page.getByRole('button', { name: 'Update now' }).click()]);
  await page.goto(`http://localhost:${PORT}/#/report`);
  await expect(page.getByText('Wetmode 0.1.0+first-visit')).toBeVisible();
});
