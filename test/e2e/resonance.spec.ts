import { test, expect, type Page } from '@playwright/test';

async function setField(page: Page, key: string, text: string) {
  const input = page.locator(`[data-field="${key}"] input`);
  await input.fill(text);
}

test('changing the current on a pile changes its resonance verdict', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  // Still water, no waves: nothing can drive the demo pile.
  await setField(page, 'currentSurface', '0');
  await setField(page, 'currentMid', '');
  await setField(page, 'currentBed', '');
  await setField(page, 'wavePeriodMin', '');
  await setField(page, 'wavePeriodMax', '');
  await expect(page.getByTestId('quick-verdict')).toHaveText(/clear/);
  // A strong tidal current brings mode 1 into the in-line lock-in range (DNV-RP-C205 §9: 1.0 ≤ V_R ≤ 4.5).
  await setField(page, 'currentSurface', '1.2 m/s');
  await expect(page.getByTestId('quick-verdict')).toHaveText(/inside band/);
  await page.screenshot({ path: 'screenshots/resonance-member.png' });
});

test('the frequency chart and the band table show the same bands', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await setField(page, 'machineSpeed', '1450 rpm');
  await setField(page, 'bladeCount', '5');
  await expect(page.getByTestId('quick-verdict')).not.toHaveText('');
  await page.goto('/#/results');
  const table = page.locator('.bands-table tbody tr');
  await expect(table.first()).toBeVisible();
  const labels = await table.locator('th').allTextContents();
  expect(labels.length).toBeGreaterThanOrEqual(4); // in-line, cross-flow, waves, machine orders
  const chartBands = page.locator('svg.freq-chart g.band');
  await expect(chartBands).toHaveCount(labels.length);
  const chartText = (await page.locator('svg.freq-chart').textContent()) ?? '';
  for (const label of labels) expect(chartText).toContain(label.length > 22 ? label.slice(0, 21) : label);
  await page.locator('svg.freq-chart').scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'screenshots/resonance-results.png' });
});
