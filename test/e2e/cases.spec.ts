import { test, expect, type Page } from '@playwright/test';
import { serviceWorkerActivated } from './support/service-worker';

async function openDemoAndSave(page: Page, name: string) {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  const nameField = page.locator('#case-name');
  await nameField.fill(name);
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');
}

test('a saved case is still there after a reload, and offline', async ({ page, context }) => {
  await openDemoAndSave(page, 'Berth 3 pile P7 check');
  await page.goto('/#/cases');
  await expect(page.getByText('Berth 3 pile P7 check').first()).toBeVisible();
  await page.reload();
  await expect(page.getByText('Berth 3 pile P7 check').first()).toBeVisible();
  await serviceWorkerActivated(page);
  await context.setOffline(true);
  await page.reload();
  await expect(page.getByText('Berth 3 pile P7 check').first()).toBeVisible();
  await context.setOffline(false);
});

test('an edit is kept as a draft across a reload without saving', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  const od = page.locator('[data-field="outerDiameter"] input');
  await od.fill('813 mm');
  await page.waitForTimeout(900); // draft is written ~0.4 s after the last keystroke
  await page.reload();
  await expect(page.locator('[data-field="outerDiameter"] input')).toHaveValue('813 mm');
});

test('a deleted case comes back with Undo', async ({ page }) => {
  await openDemoAndSave(page, 'Pile to delete');
  await page.goto('/#/cases');
  const row = page.locator('li', { hasText: 'Pile to delete' }).first();
  await row.getByRole('button', { name: /^Delete/ }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Deleted' })).toBeVisible();
  await expect(page.locator('li', { hasText: 'Pile to delete' })).toHaveCount(0);
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.locator('li', { hasText: 'Pile to delete' }).first()).toBeVisible();
});

test('a link copied in one browser opens the same results in a fresh one, marked received', async ({ page, browser, context }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/results');
  const firstRow = page.locator('table.modes-table').locator('tbody tr').first();
  await expect(firstRow).toContainText('Hz');
  const rowText = (await firstRow.textContent())!;
  await page.getByRole('button', { name: 'Copy link' }).click();
  await expect(page.getByText(/Link copied \(\d+ characters\)/)).toBeVisible();
  const link = await page.evaluate(() => navigator.clipboard.readText());
  expect(link).toContain('#/open/');
  const chars = link.length;
  // The demo pile with every field and its default ranges: well inside what a QR code at level L holds
  // (2,953 bytes, ISO/IEC 18004) and what a messaging app carries; a sudden jump would show a codec regression.
  expect(chars).toBeLessThan(1200);

  const fresh = await browser.newContext({ viewport: { width: 768, height: 1024 } });
  const other = await fresh.newPage();
  await other.goto(link);
  await expect(other).toHaveURL(/#\/results$/);
  await expect(other.getByText(/Received case/i).first()).toBeVisible();
  await expect(other.locator('table.modes-table').locator('tbody tr').first()).toHaveText(rowText);
  await other.getByRole('button', { name: 'Save to my cases' }).click();
  await expect(other.getByText(/Saved/).first()).toBeVisible();
  await other.screenshot({ path: 'screenshots/received-portrait.png' });
  await fresh.close();
});

test('a broken link shows its message and changes nothing', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/open/zAAAbrokenlink');
  await expect(page.getByText(/this link is (incomplete|damaged)/i)).toBeVisible();
  await page.goto('/#/member');
  await expect(page.getByRole('heading', { level: 1, name: 'Pile' })).toBeVisible(); // the open case is untouched
});

test('the report prints to PDF with the cautions on it', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/report');
  await expect(page.getByRole('heading', { name: 'Wetmode screening report' })).toBeVisible();
  await expect(page.locator('main')).toContainText('not a design approval');
  await page.emulateMedia({ media: 'print' });
  // In print, the full cautions are part of the page (not hidden by the print styles).
  const sheet = page.locator('.report-sheet');
  for (const phrase of [/not a design approval/, /qualified engineer/, /Uncertain inputs/, /safety procedures/]) {
    await expect(sheet.getByText(phrase).first()).toBeVisible();
  }
  const pdf = await page.pdf({ format: 'A4', path: 'screenshots/report.pdf' });
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(pdf.length).toBeGreaterThan(20_000);
});

test('with no storage (as in some private modes) the app still computes and says plainly that cases cannot be kept', async ({ page }) => {
  await page.addInitScript(() => {
    Object.defineProperty(window, 'indexedDB', { value: undefined, configurable: true });
  });
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(page.getByText(/cannot be kept on this device/).first()).toBeVisible();
  await page.goto('/#/cases');
  await expect(page.getByText('Cases cannot be kept on this device.')).toBeVisible();
});
