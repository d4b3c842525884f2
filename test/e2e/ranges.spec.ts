import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

/**
 * Ranges on uncertain inputs on the demo pile: the band, what drives it and the verdict over the band, and the
 * ranges kept through save, reload and a share link.
 */
const field = (page: Page, key: string) => page.locator(`[data-field="${key}"] input, [data-field="${key}"] select`).first();
const rangeOf = (page: Page, key: string) => page.locator(`[data-range="m-${key}"]`);

async function typeInto(page: Page, key: string, text: string) {
  const input = field(page, key);
  await input.fill('');
  await input.pressSequentially(text, { delay: 5 });
}

async function expectNoSeriousAxeFindings(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
}

/** The demo pile in a slow current with short waves: close at the likely values, and inside band over the fixity range. */
async function openDemoInWaves(page: Page) {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await typeInto(page, 'currentSurface', '0.3');
  await typeInto(page, 'currentMid', '0.2');
  await typeInto(page, 'currentBed', '0.1');
  await typeInto(page, 'wavePeriodMin', '1');
  await typeInto(page, 'wavePeriodMax', '1.5');
  await expect(page.getByTestId('stale-note')).toHaveCount(0);
  await expect(page.getByTestId('quick-verdict')).toContainText('close');
}

test('a fixity range on the demo pile gives a band, a band verdict worse than the likely one, and where it changes', async ({ page }) => {
  await openDemoInWaves(page);
  const fixity = rangeOf(page, 'fixityDepth');
  await fixity.getByRole('checkbox', { name: 'Range' }).check();
  // The trade's default, 3.5 to 8 outer diameters of 762 mm.
  await expect(fixity.locator('#m-fixityDepth-low')).toHaveValue('2.667');
  await expect(fixity.locator('#m-fixityDepth-high')).toHaveValue('6.096');
  await expect(fixity.locator('#m-fixityDepth-low')).toHaveAttribute('inputmode', 'decimal');
  const quick = page.getByTestId('quick-band');
  await expect(quick.getByTestId('band-likely-verdict')).toContainText('close', { timeout: 20_000 });
  await expect(quick.getByTestId('band-band-verdict')).toContainText('inside band');
  await expect(quick.getByTestId('band-switches')).toContainText('close unless fixity depth below mudline is below');
  await expect(quick.getByTestId('quick-band-range')).toContainText('Hz');
  await page.screenshot({ path: 'screenshots/ranges-member-1024.png', fullPage: false });
  await expectNoSeriousAxeFindings(page);
  await page.setViewportSize({ width: 768, height: 1024 });
  await fixity.scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'screenshots/ranges-member-768-form.png' });
  // In portrait the answer bar keeps the band in view while the ranges are typed.
  await expect(page.getByTestId('answer-bar-band')).toContainText('inside band');

  // A low end above the high end is refused beside the range, naming the field.
  await fixity.locator('#m-fixityDepth-low').fill('7');
  await expect(fixity.locator('.field-error')).toContainText('the range of fixity depth below mudline runs from 7 m to 6.096 m');
  await expect(page.getByTestId('quick-band').getByTestId('band-failure')).toContainText('fixity depth below mudline');
  await fixity.screenshot({ path: 'screenshots/ranges-field-error.png' });
  await fixity.locator('#m-fixityDepth-low').fill('2.667');
  await expect(fixity.locator('.field-error')).toHaveCount(0);
});

test('the default ranges give a band table, a sensitivity chart with its table, and survive save, reload and a link', async ({ page, browser, context }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await openDemoInWaves(page);
  await page.getByRole('button', { name: 'Use the default ranges' }).click();
  await expect(page.getByTestId('ranges-bar')).toContainText('6 on');
  await expect(page.getByTestId('quick-band').getByTestId('band-band-verdict')).toContainText('inside band', { timeout: 20_000 });
  await page.locator('#case-name').fill('P7 with ranges');
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');

  await page.goto('/#/results');
  const panel = page.getByTestId('band-panel');
  await expect(panel.getByTestId('band-wet-1')).toContainText(/Hz/, { timeout: 20_000 });
  const wetBand = (await panel.getByTestId('band-wet-1').textContent())!;
  await expect(panel.getByTestId('band-method')).toContainText('corners');
  const sens = panel.getByTestId('band-sensitivity');
  await expect(sens.locator('svg.sens-chart .sens-row')).toHaveCount(6);
  await expect(sens.locator('tbody tr')).toHaveCount(6);
  // Fixity moves the lowest wet frequency most on this pile: first row of the chart and of its table.
  await expect(sens.locator('tbody tr').first()).toContainText('Fixity depth below mudline');
  await expect(panel.getByTestId('band-likely-verdict')).toContainText('close');
  await expect(panel.getByTestId('band-band-verdict')).toContainText('inside band');
  await panel.screenshot({ path: 'screenshots/ranges-results-1024.png' });
  await expectNoSeriousAxeFindings(page);
  await page.setViewportSize({ width: 768, height: 1024 });
  await panel.screenshot({ path: 'screenshots/ranges-results-768.png' });

  // The Cases list shows the verdict over the ranges kept with the saved case.
  await page.goto('/#/cases');
  await expect(page.locator('li', { hasText: 'P7 with ranges' }).first().getByTestId('case-band-verdict')).toContainText('inside band');
  await page.goto('/#/results');
  await page.reload();
  await expect(page.getByTestId('band-panel').getByTestId('band-wet-1')).toHaveText(wetBand, { timeout: 20_000 });
  await page.goto('/#/report');
  await expect(page.getByTestId('report-band').locator('svg.sens-chart .sens-row')).toHaveCount(6, { timeout: 20_000 });
  await page.getByTestId('report-band').screenshot({ path: 'screenshots/ranges-report.png' });
  await page.goto('/#/results');

  await page.getByRole('button', { name: 'Copy link' }).click();
  const link = await page.evaluate(() => navigator.clipboard.readText());
  const fresh = await browser.newContext({ viewport: { width: 768, height: 1024 } });
  const other = await fresh.newPage();
  await other.goto(link);
  await expect(other).toHaveURL(/#\/results$/);
  await expect(other.getByTestId('band-panel').getByTestId('band-wet-1')).toHaveText(wetBand, { timeout: 20_000 });
  await expect(other.getByTestId('band-panel').getByTestId('band-band-verdict')).toContainText('inside band');
  await other.goto(other.url().replace('#/results', '#/member'));
  await expect(other.locator('#m-growthThickness-high')).toHaveValue('100');
  await other.screenshot({ path: 'screenshots/ranges-member-768.png', fullPage: false });
  await fresh.close();
});
