import { test, expect, type Page, type Route } from '@playwright/test';
import { serviceWorkerActivated } from './support/service-worker';

/**
 * What the first load leaves for later must still work: screens fetched on first use (also offline, from the
 * service worker's precache), and typed values that need the full unit reader before it has arrived.
 */
const field = (page: Page, key: string) => page.locator(`[data-field="${key}"] input`).first();

const SCREENS: readonly [string, string | RegExp][] = [
  ['cases', 'Cases'],
  ['results', /^Results/],
  ['report', 'Report'],
  ['section', 'Section'],
];

test('with the network cut after the first visit, every screen loaded on demand still opens', async ({ page, context }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await serviceWorkerActivated(page);
  await context.setOffline(true);
  await page.reload();
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  for (const [screen, title] of SCREENS) {
    await page.goto(`/#/${screen}`);
    await expect(page.getByRole('heading', { level: 1, name: title }), `${screen} screen offline`).toBeVisible();
    await expect(page.getByRole('alert').filter({ hasText: 'could not be loaded' })).toHaveCount(0);
  }
  // The unit reader (mathjs) is one of the chunks precached: an expression only it can read works offline.
  await page.goto('/#/member');
  await field(page, 'outerDiameter').fill('2 ft + 6 in');
  await expect(page.locator('[data-field="outerDiameter"] .field-error')).toHaveCount(0);
  await expect(page.getByTestId('stale-note')).toHaveCount(0);
  await context.setOffline(false);
});

test('a value typed before the unit reader has arrived is read once it does, and the answer follows', async ({ page }) => {
  // Hold back the unit reader's chunk until the expression has been typed.
  const held: Route[] = [];
  await page.route(/\/assets\/math-[^/]*\.js$/, (route) => void held.push(route));
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  const before = await page.getByTestId('quick-wet').textContent();
  await field(page, 'outerDiameter').fill('1524 mm / 2'); // 762 mm, the demo's own diameter: arithmetic the quick reader leaves to mathjs
  await field(page, 'wallThickness').fill('40 mm / 2');
  await expect.poll(() => held.length, { message: 'the unit reader was asked for' }).toBeGreaterThan(0);
  await expect(page.getByTestId('quick-wet')).toHaveText(before!); // the last answer stays while it loads
  for (const r of held) await r.continue();
  await expect(page.locator('[data-field="outerDiameter"] .field-error')).toHaveCount(0);
  await expect(page.getByTestId('stale-note')).toHaveCount(0);
  await expect(page.getByTestId('quick-wet')).not.toHaveText(before!); // a thicker wall changes the frequency
});
