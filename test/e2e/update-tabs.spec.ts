import { test, expect, type Page } from '@playwright/test';
import { serviceWorkerActivated } from './support/service-worker';
import { encodeCasePayload } from '../../src/share';
import { demoCase } from '../case/fixtures';
import { servedCopyForFile } from './support/served-copy';

/**
 * A new version arriving while two tabs are open: only the tab whose user accepts reloads; the other keeps its
 * prompt and its open case (here a received one, from a link) until its own user accepts, and both cases come
 * back after the update. Runs on its own server (port 4192) over a copy of the build, like update.spec.ts.
 */
const served = servedCopyForFile(4192);
const PORT = served.port;
const publishBuild = (page: Page, stamp: string) => served.publishBuild(page, stamp);

test('an update accepted in one of two tabs reloads only that tab; the other keeps its prompt, and both keep their cases', async ({ page, context }) => {
  test.setTimeout(150_000);
  const base = `http://localhost:${PORT}/`;
  const tabA = page;
  await tabA.goto(base);
  await expect(tabA.getByTestId('quick-wet')).toContainText('Hz');
  await serviceWorkerActivated(tabA);
  await tabA.reload(); // now controlled by the installed version
  await expect(tabA.getByTestId('quick-wet')).toContainText('Hz');
  await tabA.locator('[data-field="outerDiameter"] input').fill('813 mm');

  const tabB = await context.newPage();
  const received = { ...demoCase(), name: 'MV Tern Haven stern tube' };
  await tabB.goto(`${base}#/open/${await encodeCasePayload(received)}`);
  await expect(tabB.getByText('Received case — not saved on this device')).toBeVisible();
  expect(await tabB.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
  await tabB.evaluate(() => ((window as unknown as { stayed: boolean }).stayed = true));

  await publishBuild(tabA, 'two-tabs');
  await expect(tabA.getByText('A new version of Wetmode is ready')).toBeVisible({ timeout: 30_000 });
  await expect(tabB.getByText('A new version of Wetmode is ready')).toBeVisible({ timeout: 30_000 });

  await Promise.all([tabA.waitForEvent('load'), tabA.getByRole('button', { name: 'Update now' }).click()]);
  await expect(tabA.locator('[data-field="outerDiameter"] input')).toHaveValue('813 mm');

  // Tab B did not reload: same page, prompt still there, its received case still open.
  await tabB.waitForTimeout(2000);
  expect(await tabB.evaluate(() => (window as unknown as { stayed?: boolean }).stayed === true)).toBe(true);
  await expect(tabB.getByText('A new version of Wetmode is ready')).toBeVisible();
  await expect(tabB.getByText('Received case — not saved on this device')).toBeVisible();

  // Its user accepts: it reloads into the new version with the received case reopened, still marked received.
  await Promise.all([tabB.waitForEvent('load'), tabB.getByRole('button', { name: 'Update now' }).click()]);
  await expect(tabB.getByText('Received case — not saved on this device')).toBeVisible();
  await expect(tabB.getByText('MV Tern Haven stern tube').first()).toBeVisible();
  for (const tab of [tabA, tabB]) {
    await tab.goto(`${base}#/report`);
    await expect(tab.getByText('Wetmode 0.1.0+two-tabs')).toBeVisible();
  }
});
