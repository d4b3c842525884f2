/**
 * In the surveyor's hands, at both tablet sizes with touch: a saved case reopens after a reload; a demo is marked
 * as one and is not "unsaved changes" until edited; a new case's verdict says which defaults it rests on.
 */
import { test, expect } from '@playwright/test';

const SIZES = [
  { name: 'landscape 1024×768', viewport: { width: 1024, height: 768 } },
  { name: 'portrait 768×1024', viewport: { width: 768, height: 1024 } },
];

for (const size of SIZES) {
  test.describe(size.name, () => {
    test.use({ viewport: size.viewport, hasTouch: true });

    test('a new pile, saved, is open again after a reload (not the Cases list)', async ({ page }) => {
      await page.goto('/#/cases');
      await page.getByRole('button', { name: /^Pile/ }).first().click();
      await expect(page).toHaveURL(/#\/member$/);
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await page.getByRole('button', { name: 'Save case' }).click();
      await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');
      await page.reload();
      await expect(page.getByRole('heading', { level: 1, name: 'Pile' })).toBeVisible();
      await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');
      await expect(page.getByText('No case is open')).toHaveCount(0);
      await page.screenshot({ path: `test-results/hands-reopen-${size.viewport.width}.png` });
    });

    test('the first start shows the demo marked as a demo, unchanged until edited', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await expect(page.getByTestId('demo-badge')).toHaveText('Demo case');
      await expect(page.getByTestId('save-state')).toHaveText('Not changed');
      await page.locator('[data-field="outerDiameter"] input').fill('813 mm');
      await expect(page.getByTestId('save-state')).toHaveText('Unsaved changes (kept as a draft)');
    });

    test('a new pile says its verdict rests on default values, marks each default with its source, and Results lists entered or default', async ({ page }) => {
      await page.goto('/#/cases');
      await page.getByRole('button', { name: /^Pile/ }).first().click();
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await expect(page.getByTestId('demo-badge')).toHaveCount(0);
      await expect(page.getByTestId('save-state')).toHaveText('Nothing entered yet');
      await expect(page.getByTestId('rests-on-defaults')).toContainText(/Rests on default values for: .*marine growth thickness/i);
      await expect(page.getByTestId('default-growthThickness')).toContainText('NORSOK N-003');
      await page.screenshot({ path: `test-results/hands-defaults-${size.viewport.width}.png`, fullPage: true });
      await page.locator('[data-field="growthThickness"] input').fill('30 mm');
      await expect(page.getByTestId('default-growthThickness')).toHaveCount(0);
      await expect(page.getByTestId('rests-on-defaults')).not.toContainText(/marine growth thickness/i);
      await page.goto('/#/results');
      await expect(page.getByTestId('rests-on-defaults')).toBeVisible();
      await page.getByTestId('results-inputs').locator('summary').click();
      await expect(page.getByTestId('results-inputs').locator('tr', { hasText: 'Marine growth thickness' })).toContainText('entered');
      await expect(page.getByTestId('results-inputs').locator('tr', { hasText: 'Fixity depth' })).toContainText('default');
    });
  });
}
