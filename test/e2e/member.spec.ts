import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

import { wetmodeJson, formatHz } from './support/cli';
import { DEMO_CASES, FORMS } from '../../src/kinds/registry';

const field = (page: Page, key: string) => page.locator(`[data-field="${key}"] input, [data-field="${key}"] select`).first();

async function typeInto(page: Page, key: string, text: string) {
  const input = field(page, key);
  await input.fill('');
  await input.pressSequentially(text, { delay: 10 });
}

test.describe('pile form', () => {
  test('a fresh device opens the demo pile on the Member screen with an answer', async ({ page }) => {
    await page.goto('/');
    await expect(page).toHaveURL(/#\/member$/);
    await expect(page.getByRole('heading', { level: 1, name: 'Pile' })).toBeVisible();
    await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  });

  test('typing a diameter in inches gives the same frequencies as the wetmode member command on the same model', async ({ page }) => {
    await page.goto('/#/member');
    await expect(page.getByTestId('quick-wet')).toContainText('Hz');
    await typeInto(page, 'outerDiameter', '30 in');
    await typeInto(page, 'topMass', '8 t');
    // The same values through the same forms (as the command line reads them), then the built CLI.
    const demo = DEMO_CASES.find((d) => d.kind === 'pile')!;
    const values = { ...FORMS.pile.defaults('si'), ...demo.values, outerDiameter: '30 in', topMass: '8 t' };
    const built = FORMS.pile.build(values, 'si');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const cli = wetmodeJson('member', built.build.model);
    await expect(page.getByTestId('quick-dry')).toHaveText(formatHz(cli.dry.frequenciesHz[0]));
    await expect(page.getByTestId('quick-wet')).toHaveText(formatHz(cli.wet.frequenciesHz[0]));
    await expect(page.getByTestId('stale-note')).toHaveCount(0);
  });

  test('a wrong value says what was expected beside the field and marks the answer out of date', async ({ page }) => {
    await page.goto('/#/member');
    await expect(page.getByTestId('quick-wet')).toContainText('Hz');
    await typeInto(page, 'outerDiameter', '610 mm');
    await typeInto(page, 'wallThickness', '400 mm');
    await expect(page.locator('[data-field="wallThickness"] .field-error')).toHaveText(/wall thickness must be less than half the outer diameter \(305 mm\)/);
    await expect(page.getByTestId('stale-note')).toContainText('Out of date');
    await expect(page.getByTestId('quick-wet')).toContainText('Hz'); // last good answer kept
    await typeInto(page, 'wallThickness', '5 kg');
    await expect(page.locator('[data-field="wallThickness"] .field-error')).toContainText('expected a length');
    await typeInto(page, 'wallThickness', '12 mm');
    await expect(page.getByTestId('stale-note')).toHaveCount(0);
  });

  test('the SI / US toggle keeps the digits typed, pins their unit, and keeps the answer', async ({ page }) => {
    await page.goto('/#/member');
    await expect(page.getByTestId('quick-wet')).toContainText('Hz');
    const before = await page.getByTestId('quick-wet').textContent();
    await page.getByRole('button', { name: 'US units' }).click();
    await expect(field(page, 'outerDiameter')).toHaveValue('762 mm'); // the digits as typed, with the unit they meant
    await expect(page.getByTestId('quick-wet')).toHaveText(before!);
  });

  for (const size of [
    { name: 'landscape', width: 1024, height: 768 },
    { name: 'portrait', width: 768, height: 1024 },
  ]) {
    test(`the member screen fits a tablet in ${size.name} and passes an accessibility scan`, async ({ page }) => {
      await page.setViewportSize({ width: size.width, height: size.height });
      await page.goto('/#/member');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await page.screenshot({ path: `screenshots/member-pile-${size.name}.png`, fullPage: true });
      const results = await new AxeBuilder({ page }).analyze();
      const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
      expect(bad.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
    });
  }
});
