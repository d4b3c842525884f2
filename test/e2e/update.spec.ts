import { test, expect, type Page } from '@playwright/test';
import { serviceWorkerActivated } from './support/service-worker';
import { servedCopyForFile } from './support/served-copy';

/**
 * A new version arriving while a case is open: the app waits for the user, and keeps the open work.
 * Runs on its own server (port 4174) over a copy of the build, so rebuilding it disturbs no other test.
 */
const served = servedCopyForFile(4174);
const PORT = served.port;
const publishBuild = (page: Page, stamp: string) => served.publishBuild(page, stamp);

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
