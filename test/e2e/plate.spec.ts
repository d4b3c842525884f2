import { readFileSync } from 'node:fs';
import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { wetmodeJson, formatHz } from './support/cli';

/** The Marrow Creek baffle: the same plate as examples/plate-marrow-creek-baffle.json, run through `wetmode plate`. */
const EXAMPLE = JSON.parse(readFileSync('examples/plate-marrow-creek-baffle.json', 'utf8'));

/** What a surveyor types for that baffle, with units as on the drawing. */
const TYPED: Record<string, string> = {
  width: '2000 mm',
  height: '1 m',
  thickness: '10 mm',
  liquidDepth: '2 m',
  endWallDistance: '3 m',
  liquidDensity: '1000 kg/m^3',
};

const CHOSEN: Record<string, string> = {
  material: 'carbon-steel',
  leftEdge: 'clamped',
  rightEdge: 'clamped',
  bottomEdge: 'clamped',
  topEdge: 'free',
  liquidSetting: 'across-tank-2',
};

async function expectNoSeriousAxeViolations(page: Page) {
  const scan = await new AxeBuilder({ page }).analyze();
  expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
}

async function shoot(page: Page, name: string) {
  for (const size of [
    { name: 'landscape', width: 1024, height: 768 },
    { name: 'portrait', width: 768, height: 1024 },
  ]) {
    await page.setViewportSize(size);
    await page.screenshot({ path: `screenshots/plate-${name}-${size.name}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1024, height: 768 });
}

test('a plate panel entered with the form gives the numbers of wetmode plate, draws its shapes, and is saved, shared and printed', async ({ page, browser, context }) => {
  const cli = wetmodeJson('plate', EXAMPLE);
  const dry = formatHz(cli.dry.frequenciesHz[0]);
  const wet = formatHz(cli.wet.frequenciesHz[0]);

  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/cases');
  await page.getByRole('button', { name: /^Plate panel/ }).click();
  await expect(page).toHaveURL(/#\/member$/);
  await expect(page.getByRole('heading', { level: 1, name: 'Plate panel' })).toBeVisible();
  for (const [key, value] of Object.entries(CHOSEN)) await page.locator(`[data-field="${key}"] select`).selectOption(value);
  for (const [key, text] of Object.entries(TYPED)) {
    const input = page.locator(`[data-field="${key}"] input`);
    await input.fill('');
    await input.pressSequentially(text, { delay: 5 });
  }
  await expect(page.getByTestId('quick-dry')).toHaveText(dry);
  await expect(page.getByTestId('quick-wet')).toHaveText(wet);
  await expect(page.getByTestId('answer-bar')).toContainText(wet);
  await expect(page.locator('.plate-schematic svg')).toBeVisible();
  await expect(page.getByText('Screening estimate only.').first()).toBeVisible();
  // An agitator at 90 rpm with 3 blades: blade pass 4.5 Hz (classical f = blades · rpm / 60), more than 20 % below the wet mode.
  await page.locator('[data-field="machineSpeed"] input').fill('90 rpm');
  await page.locator('[data-field="bladeCount"] input').fill('3');
  await expect(page.getByTestId('quick-verdict')).toContainText('clear');
  await shoot(page, 'member');
  await expectNoSeriousAxeViolations(page);

  await page.goto('/#/results');
  const table = page.locator('table.modes-table');
  for (let i = 0; i < cli.dry.frequenciesHz.length; i++) {
    const row = table.locator('tbody tr').nth(i);
    await expect(row.locator('td').nth(0)).toHaveText(formatHz(cli.dry.frequenciesHz[i]));
    await expect(row.locator('td').nth(1)).toHaveText(formatHz(cli.wet.frequenciesHz[i]));
  }
  await expect(page.getByTestId('plate-shapes-dry').locator('svg')).toHaveCount(cli.dry.frequenciesHz.length);
  await expect(page.getByTestId('plate-shapes-wet').locator('svg')).toHaveCount(cli.wet.frequenciesHz.length);
  // Mode 2 of a plate clamped on three sides has a nodal line (it is antisymmetric across the width).
  await expect(page.getByTestId('plate-shapes-dry').locator('figure').nth(1).locator('line.plate-nodal').first()).toBeAttached();
  await expect(page.getByTestId('plate-sloshing')).toContainText(formatHz(cli.sloshingHz[0]));
  const cautions = page.locator('.cautions-panel');
  await expect(cautions).toContainText('thin-plate model');
  await expect(cautions).toContainText('not a design approval');
  await expect(page.locator('table.checks-table')).toContainText('blade pass');
  await page.getByRole('region', { name: 'Mode shapes on the plate' }).screenshot({ path: 'screenshots/plate-shapes.png' });
  await shoot(page, 'results');
  await expectNoSeriousAxeViolations(page);

  // Saved on this device and reopened from the Cases list.
  await page.goto('/#/member');
  await page.locator('#case-name').fill('Marrow Creek T-7 cross baffle');
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');
  await page.reload();
  await page.goto('/#/cases');
  await page.locator('li', { hasText: 'Marrow Creek T-7 cross baffle' }).first().getByRole('button', { name: /^Open/ }).click();
  // Opening a case moves to its Member screen; go on to Results once it has.
  await expect(page.getByRole('heading', { level: 1, name: 'Plate panel' })).toBeVisible();
  await page.goto('/#/results');
  await expect(table.locator('tbody tr').first().locator('td').nth(1)).toHaveText(wet);

  // Shared by link: a fresh browser at tablet portrait size opens the same results.
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  const firstRow = (await table.locator('tbody tr').first().textContent())!;
  await page.getByRole('button', { name: 'Copy link' }).click();
  const link = await page.evaluate(() => navigator.clipboard.readText());
  expect(link).toContain('#/open/');
  const fresh = await browser.newContext({ viewport: { width: 768, height: 1024 } });
  const other = await fresh.newPage();
  await other.goto(link);
  await expect(other).toHaveURL(/#\/results$/);
  await expect(other.locator('table.modes-table tbody tr').first()).toHaveText(firstRow);
  await expect(other.getByTestId('plate-shapes-wet').locator('svg').first()).toBeVisible();
  await other.screenshot({ path: 'screenshots/plate-received-portrait.png', fullPage: true });
  await fresh.close();

  // Printed: the report carries the plate's frequencies, shapes, sloshing and the plate cautions.
  await page.goto('/#/report');
  await expect(page.getByRole('heading', { name: 'Wetmode screening report' })).toBeVisible();
  const sheet = page.locator('.report-sheet');
  await expect(sheet.locator('table.modes-table tbody tr').first()).toHaveText(firstRow);
  await expect(sheet.getByTestId('plate-shapes-dry').locator('svg').first()).toBeVisible();
  await expect(sheet).toContainText('thin-plate model');
  await page.emulateMedia({ media: 'print' });
  await expect(sheet.getByText(/not a design approval/).first()).toBeVisible();
  const pdf = await page.pdf({ format: 'A4', path: 'screenshots/plate-report.pdf' });
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  await page.emulateMedia({ media: 'screen' });
  await page.screenshot({ path: 'screenshots/plate-report.png', fullPage: true });
});
