import { test, expect, type Page } from '@playwright/test';

async function setField(page: Page, key: string, text: string) {
  const input = page.locator(`[data-field="${key}"] input`);
  await input.fill('');
  await input.pressSequentially(text, { delay: 10 });
}

async function newRiser(page: Page) {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/cases');
  await page.getByRole('button', { name: /^Riser or conductor/ }).click();
  await expect(page).toHaveURL(/#\/member$/);
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
}

for (const caisson of ['34 in', '11.5 in']) {
  test(`a riser inside a ${caisson} caisson is screened with the flow inside it, not the open current`, async ({ page }) => {
    await newRiser(page);
    // A 1.5 m/s open current puts the new riser's first mode in the lock-in range (DNV-RP-C205 §9).
    await setField(page, 'currentSurface', '1.5 m/s');
    await expect(page.getByTestId('quick-verdict')).toHaveText(/inside band/);
    // Inside the caisson the water is still by default: nothing left to drive it.
    await setField(page, 'caissonDiameter', caisson);
    await expect(page.getByTestId('quick-verdict')).toHaveText(/clear/);
    // A flow measured inside the caisson is what the verdict is then based on.
    await setField(page, 'caissonInnerFlow', '1.2 m/s');
    await expect(page.getByTestId('quick-verdict')).toHaveText(/inside band/);
    await setField(page, 'caissonInnerFlow', '0.2 m/s');
    await expect(page.getByTestId('quick-verdict')).toHaveText(/clear/);
    await page.goto('/#/results');
    await expect(page.locator('.screening-notes')).toContainText('Shielded inside the caisson');
    await expect(page.locator('.screening-notes')).toContainText('U = 0.2 m/s');
    await page.screenshot({ path: `screenshots/riser-caisson-${caisson.replace(/\W+/g, '')}.png`, fullPage: true });
  });
}

test('an inside-band verdict shows an indicative cross-flow amplitude beside it, on Results and in the Report', async ({ page }) => {
  await newRiser(page);
  await setField(page, 'currentSurface', '1.5 m/s');
  await expect(page.getByTestId('quick-verdict')).toHaveText(/inside band/);
  await page.goto('/#/results');
  await expect(page.getByTestId('severity')).toContainText(/Indicative cross-flow amplitude at lock-in, mode 1: A\/D ≈ [0-9.]+/);
  await expect(page.getByTestId('severity')).toContainText('Scruton number K_S');
  await page.goto('/#/report');
  await expect(page.getByTestId('severity')).toContainText('Indicative only');
});
