import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { type MemberKind } from '../../src/forms';
import { wetmodeJson, formatHz } from './support/cli';
import { FORMS } from '../../src/kinds/registry';

const KIND_BUTTON: Record<MemberKind, RegExp> = {
  pile: /^Pile/,
  riser: /^Riser or conductor/,
  baffle: /^Tank baffle/,
  stem: /^Sensor stem/,
  'plate-panel': /^Plate panel/,
};

/** What a surveyor types into each new form: values with units as on their drawings. */
const TYPED: Record<'riser' | 'baffle' | 'stem', Record<string, string>> = {
  riser: { outerDiameter: '16 in', wallThickness: '0.625 in' },
  baffle: { thickness: '0.5 in', span: '6 ft' },
  stem: { insertionLength: '10 in', tipMass: '0.2 kg' },
};

async function newCase(page: Page, kind: MemberKind) {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.goto('/#/cases');
  await page.getByRole('button', { name: KIND_BUTTON[kind] }).click();
  await expect(page).toHaveURL(/#\/member$/);
  await expect(page.getByRole('heading', { level: 1, name: FORMS[kind].title })).toBeVisible();
}

for (const kind of ['riser', 'baffle', 'stem'] as const) {
  test(`a new ${kind} filled as a surveyor would matches the wetmode member command on the same model`, async ({ page }) => {
    await newCase(page, kind);
    const typed = TYPED[kind];
    for (const [key, text] of Object.entries(typed)) {
      const input = page.locator(`[data-field="${key}"] input`);
      await input.fill('');
      await input.pressSequentially(text, { delay: 10 });
    }
    const built = FORMS[kind].build({ ...FORMS[kind].defaults('si'), ...typed }, 'si');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const cli = wetmodeJson('member', built.build.model);
    await expect(page.getByTestId('quick-dry')).toHaveText(formatHz(cli.dry.frequenciesHz[0]));
    await expect(page.getByTestId('quick-wet')).toHaveText(formatHz(cli.wet.frequenciesHz[0]));
    for (const size of [
      { name: 'landscape', width: 1024, height: 768 },
      { name: 'portrait', width: 768, height: 1024 },
    ]) {
      await page.setViewportSize(size);
      await page.screenshot({ path: `screenshots/member-${kind}-${size.name}.png`, fullPage: true });
    }
    const scan = await new AxeBuilder({ page }).analyze();
    expect(scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
  });
}

test('a stem wall bore larger than its tip says so beside the field', async ({ page }) => {
  await newCase(page, 'stem');
  const bore = page.locator('[data-field="boreDiameter"] input');
  await bore.fill('40 mm');
  await expect(page.locator('[data-field="boreDiameter"] .field-error')).toBeVisible();
  await expect(page.getByTestId('stale-note')).toContainText('Out of date');
});
