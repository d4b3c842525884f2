import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

test('a stem centred in a pipe gets the confined added mass of a concentric annulus', async ({ page }) => {
  await page.goto('/#/section');
  await page.getByRole('button', { name: 'Stem in a pipe (annulus)' }).click();
  const caRow = page.locator('.section-numbers tr', { has: page.locator('th', { hasText: /^Ca$/ }) }).first();
  // R1 = 12.5 mm, R2 = 50 mm: Ca = (R2² + R1²)/(R2² − R1²) = 1.1333 (R.J. Fritz, ASME J. Eng. Industry 94 (1972) 167).
  await expect(caRow).toContainText('1.133');
  await page.screenshot({ path: 'screenshots/section-annulus.png', fullPage: true });
});

test('a body too large for its pipe is refused beside its field and nothing is solved from it', async ({ page }) => {
  await page.goto('/#/section');
  await page.getByRole('button', { name: 'Stem in a pipe (annulus)' }).click();
  await expect(page.locator('.section-numbers')).toContainText('1.133');
  const diameter = page.getByLabel('Diameter').first();
  await diameter.fill('150');
  await expect(page.getByText(/outside|does not fit|enclosure/i).first()).toBeVisible();
  await expect(page.getByText('Out of date').first()).toBeVisible();
});

test('the section view passes an accessibility scan at tablet portrait size', async ({ page }) => {
  await page.setViewportSize({ width: 768, height: 1024 });
  await page.goto('/#/section');
  await expect(page.locator('.section-numbers')).toContainText('Ca');
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  const scan = await new AxeBuilder({ page }).analyze();
  expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
});

test('the Results screen shows the submerged section of the open member with its flow map and Ca', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/results');
  // The demo pile stands in open water: a circle, Ca = 1 (H. Lamb, Hydrodynamics, classical).
  await expect(page.getByTestId('member-section-ca')).toContainText('Sway Ca = 1.000');
  await page.getByRole('link', { name: 'Open in the Section view' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Section' })).toBeVisible();
  await expect(page.getByText(/This member's section at z =/)).toBeVisible();
  // The pile stands up through the water: its section is a plan view, with quay or tank walls, not a seabed.
  await expect(page.getByLabel('Section seen')).toHaveValue('plan');
  await expect(page.getByText('Quay wall or tank wall alongside', { exact: false })).toBeVisible();
  await expect(page.locator('.section-numbers')).toContainText('1.000');
});
