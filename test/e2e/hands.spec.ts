/**
 * In the surveyor's hands, at both tablet sizes with touch: a saved case reopens after a reload; a demo is marked
 * as one and is not "unsaved changes" until edited; a new case's verdict says which defaults it rests on; units
 * typed as a mariner or a drawing writes them are read and echoed; the unit chip enters values with digits only;
 * the SI/US switch leaves typed text as typed; the answer stays in view while the last field has focus; notices cover
 * no input and wide tables say they scroll.
 */
import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

const input = (page: Page, key: string) => page.locator(`[data-field="${key}"] input`);

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

    test('while the last field of the form has focus, the lowest wet frequency and the verdict are in view and cover no field', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      const last = page.locator('[data-field] input[inputmode="decimal"]:visible').last();
      await last.focus();
      await last.fill('');
      await last.pressSequentially('1');
      // Portrait: the answer bar at the bottom of the screen; landscape: the answer panel beside the form.
      const answer = size.viewport.width <= 900 ? page.getByTestId('answer-bar') : page.getByTestId('quick-wet');
      await expect(answer).toBeInViewport();
      await expect(answer).toContainText('Hz');
      const field = await last.boundingBox();
      const bar = await answer.boundingBox();
      expect(field && bar, 'both boxes are laid out').toBeTruthy();
      if (size.viewport.width <= 900) {
        // The bar is pinned to the bottom: the field in use must sit wholly above it.
        expect(field!.y + field!.height, 'bottom of the focused field against the top of the answer bar').toBeLessThanOrEqual(bar!.y + 0.5);
      }
      await expect(last).toBeInViewport();
      await page.screenshot({ path: `test-results/hands-last-field-${size.viewport.width}.png` });
      // Every unit chip names a unit: counts and plain ratios have none to pick.
      const chips = await page.locator('select.unit-chip').evaluateAll((els) => els.map((e) => (e as HTMLSelectElement).value));
      expect(chips.length).toBeGreaterThan(3);
      expect(chips.filter((v) => v === '')).toEqual([]);
    });

    test('the "ready to work offline" notice covers no input, and a table wider than the screen says it scrolls or fits', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await expect(page.getByText('Ready to work offline')).toBeVisible({ timeout: 30_000 });
      // Whatever sits at the centre of each visible input must be that input: no notice or bar on top of it.
      const covered = await page.locator('[data-field] input:visible').evaluateAll((inputs) =>
        inputs
          .filter((el) => {
            const r = el.getBoundingClientRect();
            return r.bottom > 0 && r.top < window.innerHeight;
          })
          .filter((el) => {
            const r = el.getBoundingClientRect();
            const y = Math.min(Math.max(r.top + r.height / 2, 0), window.innerHeight - 1);
            const top = document.elementFromPoint(r.left + r.width / 2, y);
            return top !== el && !el.contains(top);
          })
          .map((el) => el.closest('[data-field]')?.getAttribute('data-field')),
      );
      expect(covered).toEqual([]);
      await page.goto('/#/results');
      const boxes = page.locator('.table-scroll:visible');
      await expect(page.getByRole('table', { name: /resonance/i }).first()).toBeVisible();
      expect(await boxes.count()).toBeGreaterThan(1);
      for (const box of await boxes.all()) {
        const wide = await box.evaluate((el) => el.scrollWidth > el.clientWidth + 2);
        // A table that does not fit has a visible cue just before it; one that fits needs none.
        if (wide) await expect(box.locator('xpath=preceding-sibling::p[@data-testid="scroll-cue"][1]')).toBeVisible();
      }
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

    test('1.5 kt, 24" and 2\' 6" are read and the value understood is echoed beside the field', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await input(page, 'currentSurface').fill('1.5 kt');
      // 1.5 × 1852 m / 3600 s = 0.7717 m/s (international knot).
      await expect(page.getByTestId('echo-currentSurface')).toHaveText('= 0.7717 m/s');
      await expect(page.locator('[data-field="currentSurface"] select.unit-chip')).toHaveValue('kt');
      await input(page, 'outerDiameter').fill('24"');
      await expect(page.getByTestId('echo-outerDiameter')).toHaveText(/^= 609\.6 mm$/);
      await input(page, 'outerDiameter').fill(`2' 6"`);
      await expect(page.getByTestId('echo-outerDiameter')).toHaveText(/^= 762 mm$/);
      await expect(page.locator('[data-field="outerDiameter"] .field-error')).toHaveCount(0);
      await expect(page.getByTestId('stale-note')).toHaveCount(0);
      await page.screenshot({ path: `test-results/hands-units-${size.viewport.width}.png` });
    });

    test('the unit chip enters a value with the numeric keypad only', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      const od = input(page, 'outerDiameter');
      await expect(od).toHaveAttribute('inputmode', 'decimal');
      await od.fill('');
      await od.pressSequentially('30', { delay: 10 }); // digits only, as on the decimal keypad
      await page.locator('[data-field="outerDiameter"] select.unit-chip').selectOption('in');
      await expect(od).toHaveValue('30 in');
      await expect(page.getByTestId('echo-outerDiameter')).toHaveText('= 762 mm');
      // A unit chosen first, on an empty field, follows the digits when the field is left.
      const cur = input(page, 'currentSurface');
      await cur.fill('');
      await page.locator('[data-field="currentSurface"] select.unit-chip').selectOption('kt');
      await cur.pressSequentially('2', { delay: 10 });
      await cur.blur();
      await expect(cur).toHaveValue('2 kt');
    });

    test('switching to US units and back leaves every typed text as typed', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      const demoWet = (await page.getByTestId('quick-wet').textContent())!;
      await input(page, 'outerDiameter').fill('29.5 in');
      await input(page, 'currentSurface').fill('1.5 kt');
      await input(page, 'waterDepth').fill('8');
      await expect(page.getByTestId('stale-note')).toHaveCount(0);
      // The answer to these inputs (the demo's gives way shortly after the last keystroke).
      await expect(page.getByTestId('quick-wet')).not.toHaveText(demoWet);
      const wet = await page.getByTestId('quick-wet').textContent();
      await page.getByRole('button', { name: 'US units' }).click();
      await expect(input(page, 'outerDiameter')).toHaveValue('29.5 in');
      await expect(input(page, 'currentSurface')).toHaveValue('1.5 kt');
      await expect(input(page, 'waterDepth')).toHaveValue('8 m');
      await expect(page.getByTestId('quick-wet')).toHaveText(wet!);
      await page.getByRole('button', { name: 'SI units' }).click();
      await expect(input(page, 'outerDiameter')).toHaveValue('29.5 in');
      await expect(input(page, 'waterDepth')).toHaveValue('8 m');
    });

    test('a photo picked on the tablet is kept with the case on the device and shown as a thumbnail in the report', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      await expect(page.getByTestId('site-evidence')).toContainText('They go into the exported case file too, never into the case link');
      // A 1 × 1 PNG, as the file picker would hand over.
      const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=', 'base64');
      await expect(page.getByTestId('photo-input')).toHaveAttribute('capture', 'environment');
      await page.getByTestId('photo-input').setInputFiles({ name: 'tag-plate.png', mimeType: 'image/png', buffer: png });
      await expect(page.locator('.site-evidence img')).toHaveCount(1);
      await expect(page.locator('.site-evidence img')).toHaveAttribute('src', /^data:image\/jpeg;base64,/);
      await page.reload();
      await expect(page.locator('.site-evidence img')).toHaveCount(1);
      await page.goto('/#/report');
      await expect(page.getByTestId('report-photos').locator('img')).toHaveCount(1);
    });

    test('two piles side by side: the Section view gives their added mass moving together, in opposition and one at a time', async ({ page }) => {
      await page.goto('/#/section');
      await page.getByRole('button', { name: 'Two piles side by side' }).click();
      const pattern = page.getByTestId('motion-pattern');
      await expect(pattern).toBeVisible({ timeout: 30_000 });
      const read = async () => Number((await page.getByTestId('pattern-x-0').textContent())!.replace(/[^\d.\-]/g, ''));
      const together = await read();
      await pattern.getByLabel('In opposition').check();
      const opposed = await read();
      await pattern.getByLabel('One at a time').check();
      const alone = await read();
      // Side by side across the sway direction, the piles' sway coupling is not zero, so the three differ and the
      // single pile lies between the two patterns (its own term, plus or minus the coupling).
      expect(together).not.toBe(opposed);
      expect(Math.min(together, opposed)).toBeLessThan(alone);
      expect(Math.max(together, opposed)).toBeGreaterThan(alone);
      const box = (await pattern.locator('label.pattern-radio').first().boundingBox())!;
      expect(box.height).toBeGreaterThanOrEqual(44);
      await pattern.screenshot({ path: `test-results/hands-pattern-${size.viewport.width}.png` });
    });

    test('the unit choice radios, the range checkboxes and the cautions link are tap targets of at least 44 px', async ({ page }) => {
      await page.goto('/#/cases');
      await expect(page.locator('label.radio').first()).toBeVisible();
      const targets = [
        ...(await page.locator('label.radio').all()),
        page.getByRole('link', { name: 'Read the cautions' }),
      ];
      expect(targets.length).toBeGreaterThanOrEqual(3);
      for (const t of targets) {
        const box = (await t.boundingBox())!;
        expect(box.height, `height of "${await t.textContent()}"`).toBeGreaterThanOrEqual(44);
        expect(box.width, `width of "${await t.textContent()}"`).toBeGreaterThanOrEqual(44);
      }
      await page.goto('/#/member');
      const range = page.locator('[data-range] label.range-switch').first();
      const box = (await range.boundingBox())!;
      expect(box.height).toBeGreaterThanOrEqual(44);
    });

    test('axe finds no serious or critical violation on the Member, Results and Cases screens', async ({ page }) => {
      await page.goto('/');
      await expect(page.getByTestId('quick-wet')).toContainText('Hz');
      for (const screen of ['member', 'results', 'cases']) {
        await page.goto(`/#/${screen}`);
        await expect(page.locator('h1')).toBeVisible();
        await page.waitForTimeout(300);
        const r = await new AxeBuilder({ page }).analyze();
        const bad = r.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
        expect(bad.map((v) => `${screen} ${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
      }
    });
  });
}
