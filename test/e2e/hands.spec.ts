/**
 * In the surveyor's hands, at both tablet sizes with touch: a saved case reopens after a reload.
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
  });
}
