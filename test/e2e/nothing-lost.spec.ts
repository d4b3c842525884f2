import { test, expect, type Page } from '@playwright/test';
import { encodeCasePayload, LINK_MESSAGES } from '../../src/share';
import { fromBase64url } from '../../src/share/base64url';
import { demoCase } from '../case/fixtures';
import { framed } from '../share/frame';

/**
 * Nothing lost across tabs and reloads: two tabs saving one case, the last keystroke before a reload, a draft
 * whose inputs overflow, and links that mail apps have wrapped.
 */

async function startOnDemo(page: Page) {
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
}

test('two tabs editing and saving the same case: the conflict is offered and both versions are kept', async ({ page, context }) => {
  const tabA = page;
  await startOnDemo(tabA);
  await tabA.locator('#case-name').fill('Skerry Alpha caisson');
  await tabA.getByRole('button', { name: 'Save case' }).click();
  await expect(tabA.getByTestId('save-state')).toHaveText('Saved on this device');

  const tabB = await context.newPage();
  await tabB.goto('/#/cases');
  await tabB.locator('li', { hasText: 'Skerry Alpha caisson' }).first().getByRole('button', { name: /^Open/ }).click();
  await expect(tabB.getByTestId('quick-wet')).toContainText('Hz');

  // B starts an edit; then A renames, changes the wall and saves.
  await tabB.locator('#case-name').fill('Edited in tab B');
  await tabA.locator('#case-name').fill('Renamed in tab A');
  await tabA.locator('[data-field="wallThickness"] input').fill('20 mm');
  await tabA.getByRole('button', { name: 'Save case' }).click();
  await expect(tabA.getByTestId('save-state')).toHaveText('Saved on this device');

  // B is told, keeps its edit, and its save is not silent.
  await expect(tabB.getByTestId('elsewhere')).toContainText('changed and saved in another tab');
  await tabB.getByRole('button', { name: 'Save case' }).click();
  await expect(tabB.getByRole('heading', { name: 'This case was saved elsewhere' })).toBeVisible();
  await tabB.getByRole('button', { name: 'Keep both (save mine as a copy)' }).click();
  await expect(tabB.getByTestId('save-state')).toHaveText('Saved on this device');

  for (const tab of [tabB, tabA]) {
    await tab.goto('/#/cases');
    await expect(tab.locator('li', { hasText: 'Renamed in tab A' }).first()).toBeVisible();
    await expect(tab.locator('li', { hasText: /Edited in tab B \(my version, / }).first()).toBeVisible();
  }
  await tabA.locator('li', { hasText: 'Renamed in tab A' }).first().getByRole('button', { name: /^Open/ }).click();
  await expect(tabA.locator('[data-field="wallThickness"] input')).toHaveValue('20 mm');
});

test('the Cases list in another tab follows a save', async ({ page, context }) => {
  await startOnDemo(page);
  await page.locator('#case-name').fill('Marrow Creek intake pile');
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(page.getByTestId('save-state')).toHaveText('Saved on this device');
  const other = await context.newPage();
  await other.goto('/#/cases');
  await expect(other.locator('li', { hasText: 'Marrow Creek intake pile' }).first()).toBeVisible();
  await page.locator('#case-name').fill('Marrow Creek intake pile, checked');
  await page.getByRole('button', { name: 'Save case' }).click();
  await expect(other.locator('li', { hasText: 'Marrow Creek intake pile, checked' }).first()).toBeVisible();
});

test('a change typed 100 ms before a reload is there after it', async ({ page }) => {
  await startOnDemo(page);
  await page.locator('[data-field="outerDiameter"] input').fill('914 mm');
  await page.waitForTimeout(100);
  await page.reload();
  await expect(page.locator('[data-field="outerDiameter"] input')).toHaveValue('914 mm');
  // And again straight after typing, with no wait at all.
  await page.locator('#case-name').fill('Typed just before reload');
  await page.reload();
  await expect(page.locator('#case-name')).toHaveValue('Typed just before reload');
});

test('a draft holding 1e308 m in the outer diameter opens with a message, and the Cases list works', async ({ page }) => {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await startOnDemo(page);
  const od = page.locator('[data-field="outerDiameter"]');
  await od.locator('input').fill('1e308 m');
  await expect(od.locator('.field-error')).toContainText(/too large or too small|must be at most/);
  await page.waitForTimeout(700); // the draft is written about 0.4 s after the last keystroke
  await page.reload();
  await expect(page.locator('[data-field="outerDiameter"] input')).toHaveValue('1e308 m');
  await expect(page.locator('[data-field="outerDiameter"] .field-error')).toContainText(/too large or too small|must be at most/);
  await expect(page.getByText('Out of date: fix the field marked ✖')).toBeVisible();
  await expect(page.getByText('Updating…')).toHaveCount(0);
  await page.goto('/#/cases');
  await expect(page.getByRole('heading', { name: 'Saved on this device' })).toBeVisible();
  await expect(page.getByText('Opening the cases saved on this device…')).toHaveCount(0);
  // Fix the value: the answer comes back.
  await page.goto('/#/member');
  await page.locator('[data-field="outerDiameter"] input').fill('610 mm');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  expect(errors).toEqual([]);
});

test('a link with spaces, %20 and line breaks opens; one with junk after the deflate stream is refused as in Node', async ({ page }) => {
  const payload = await encodeCasePayload(demoCase());
  const mangled = `${payload.slice(0, 30)} ${payload.slice(30, 60)}%20${payload.slice(60, 90)}%0A${payload.slice(90, 120)}%0D%0A  ${payload.slice(120)}`;
  await page.goto(`/#/open/${mangled}`);
  await expect(page.getByText('Received case — not saved on this device')).toBeVisible();
  await expect(page.getByTestId('quick-wet').or(page.locator('table.modes-table'))).toContainText('Hz');

  const d = fromBase64url(payload.slice(1));
  if (!d.ok) throw new Error('payload must decode');
  const junk = framed('z', new Uint8Array([...d.bytes.subarray(7), 0x00, 0x41]));
  await page.goto('/#/cases');
  await page.goto(`/#/open/${junk}`);
  await expect(page.getByRole('heading', { name: 'This link could not be opened' })).toBeVisible();
  await expect(page.getByRole('alert')).toContainText(LINK_MESSAGES.damaged.slice(1));
});

test('a tab opened from another (a copy of its session) gets its own draft: neither replaces the other', async ({ page, context }) => {
  await startOnDemo(page);
  await page.locator('#case-name').fill('Draft of tab A');
  const [tabB] = await Promise.all([context.waitForEvent('page'), page.evaluate(() => void window.open('/#/member'))]);
  await expect(tabB.getByTestId('quick-wet')).toContainText('Hz');
  expect(await tabB.evaluate(() => sessionStorage.getItem('wetmode.tabId'))).not.toBe(await page.evaluate(() => sessionStorage.getItem('wetmode.tabId')));
  await tabB.locator('#case-name').fill('Draft of tab B');
  await tabB.waitForTimeout(700);
  await page.waitForTimeout(700);
  await page.reload();
  await expect(page.locator('#case-name')).toHaveValue('Draft of tab A');
  await tabB.reload();
  await expect(tabB.locator('#case-name')).toHaveValue('Draft of tab B');
});

test('links with huge and tiny numbers open with a message beside the field, never a stuck page', async ({ page }) => {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  const huge = { ...demoCase(), inputs: { ...demoCase().inputs, outerDiameter: '1e308 m', wallThickness: '1e-300 m' } };
  await page.goto(`/#/open/${await encodeCasePayload(huge)}`);
  await expect(page.getByText('Received case — not saved on this device')).toBeVisible();
  await page.goto('/#/member');
  await expect(page.locator('[data-field="outerDiameter"] .field-error').or(page.locator('[data-field="wallThickness"] .field-error')).first()).toBeVisible();
  await page.goto('/#/cases');
  await expect(page.getByRole('heading', { name: 'Saved on this device' })).toBeVisible();
  expect(errors).toEqual([]);
});

test('unsaved work in a closed tab comes back in the next new tab; an older one is offered on the Cases screen', async ({ context }) => {
  const first = await context.newPage();
  await startOnDemo(first);
  await first.locator('#case-name').fill('Port Halloran berth 2, older');
  await first.waitForTimeout(700);
  const second = await context.newPage();
  await second.goto('/#/member');
  await expect(second.getByTestId('quick-wet')).toContainText('Hz');
  await second.locator('#case-name').fill('Port Halloran berth 2, newer');
  await second.waitForTimeout(700);
  await first.close();
  await second.close();

  const fresh = await context.newPage();
  await fresh.goto('/');
  await expect(fresh.locator('#case-name')).toHaveValue('Port Halloran berth 2, newer');
  await fresh.goto('/#/cases');
  const offered = fresh.locator('li', { hasText: 'Port Halloran berth 2, older' });
  await expect(offered).toBeVisible();
  await offered.getByRole('button', { name: 'Open draft' }).click();
  // The open case has unsaved work: the screen asks first; even "without saving" sets it aside, not away.
  await fresh.getByRole('button', { name: 'Continue without saving' }).click();
  await expect(fresh.locator('#case-name')).toHaveValue('Port Halloran berth 2, older');
  await fresh.goto('/#/cases');
  await expect(fresh.locator('li', { hasText: 'Port Halloran berth 2, newer' })).toBeVisible();
});

/**
 * Runs in the page before its scripts: the device store's database opens `delayMs` later than it would (its
 * "success" event is held back), as on a slow tablet, so the page is usable before the store is there.
 */
function slowStoreOpening(delayMs: number): void {
  const open = IDBFactory.prototype.open;
  IDBFactory.prototype.open = function (this: IDBFactory, ...args: Parameters<IDBFactory['open']>) {
    const request = open.apply(this, args);
    const add = request.addEventListener.bind(request);
    request.addEventListener = ((type: string, listener: EventListener, options?: AddEventListenerOptions) =>
      add(type, type === 'success' ? (e: Event) => void setTimeout(() => listener.call(request, e), delayMs) : listener, options)) as IDBOpenDBRequest['addEventListener'];
    return request;
  };
}

/** The drafts in the page's database (read directly, not through the app), as [case name, outer diameter]. */
function storedDrafts(page: Page): Promise<[string, string][]> {
  return page.evaluate(
    () =>
      new Promise<[string, string][]>((resolve, reject) => {
        const r = indexedDB.open('wetmode');
        r.onerror = () => reject(r.error);
        r.onsuccess = () => {
          const db = r.result;
          const all = db.transaction('drafts').objectStore('drafts').getAll();
          all.onsuccess = () => {
            db.close();
            resolve((all.result as { case: { name: string; inputs: { outerDiameter: string } } }[]).map((d) => [d.case.name, d.case.inputs.outerDiameter]));
          };
        };
      }),
  );
}

test('a draft the store holds replaces the demo a device that seemed fresh opened before the store: nothing is lost', async ({ context }) => {
  const first = await context.newPage();
  await startOnDemo(first);
  await first.locator('#case-name').fill('Skerry Alpha riser guide, unsaved');
  await first.waitForTimeout(700); // the draft is written 400 ms after the last edit
  await first.close();
  // The same device with its localStorage and sessionStorage cleared but its database kept: nothing says there is
  // work, so the demo opens at once; the store, once open, holds the closed tab's draft, and that is opened instead.
  const second = await context.newPage();
  await second.addInitScript(() => {
    localStorage.clear();
    sessionStorage.clear();
  });
  await second.addInitScript(slowStoreOpening, 1500);
  await second.goto('/');
  await expect(second.getByTestId('quick-wet')).toContainText('Hz'); // the demo's answer, before the store
  await expect(second.locator('#case-name')).not.toHaveValue('Skerry Alpha riser guide, unsaved');
  await expect(second.locator('#case-name')).toHaveValue('Skerry Alpha riser guide, unsaved', { timeout: 10_000 });
  await expect(second).toHaveURL(/#\/member$/);
  await expect(second.getByTestId('quick-wet')).toContainText('Hz');
});

test('edits typed into the demo before the store has opened are kept as a draft once it opens, and reopen', async ({ context }) => {
  const page = await context.newPage();
  await page.addInitScript(slowStoreOpening, 2500);
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.locator('[data-field="outerDiameter"] input').fill('1067 mm');
  await page.locator('#case-name').fill('Typed before the store opened');
  expect(await page.evaluate(() => performance.getEntriesByName('wetmode:store-open').length)).toBe(0);
  // Once the store is open, the edits are in it as this tab's draft (and the edited case stays open).
  await expect.poll(() => storedDrafts(page), { timeout: 10_000 }).toContainEqual(['Typed before the store opened', '1067 mm']);
  await expect(page.locator('#case-name')).toHaveValue('Typed before the store opened');
  await page.close();
  const next = await context.newPage();
  await next.goto('/');
  await expect(next.locator('#case-name')).toHaveValue('Typed before the store opened');
  await expect(next.locator('[data-field="outerDiameter"] input')).toHaveValue('1067 mm');
});

test('Save pressed before the store has opened waits for it and saves the case, never saying storage is unavailable', async ({ page }) => {
  await page.addInitScript(slowStoreOpening, 2000);
  await page.goto('/');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  await page.locator('#case-name').fill('Marrow Creek intake pile, saved at once');
  await page.getByRole('button', { name: 'Save case' }).click();
  expect(await page.evaluate(() => performance.getEntriesByName('wetmode:store-open').length)).toBe(0);
  await expect(page.getByText('Saved on this device').first()).toBeVisible({ timeout: 10_000 });
  await expect(page.getByText(/cannot be kept/)).toHaveCount(0);
  await page.goto('/#/cases');
  await expect(page.locator('li', { hasText: 'Marrow Creek intake pile, saved at once' }).first()).toBeVisible();
});

test('a reload shows the work it left before the store has opened, and it stays once the store agrees', async ({ page }) => {
  await startOnDemo(page);
  await page.locator('[data-field="outerDiameter"] input').fill('1219 mm');
  await page.locator('#case-name').fill('Port Halloran dolphin, reloaded');
  await page.addInitScript(slowStoreOpening, 2000);
  await page.reload();
  await expect(page.locator('#case-name')).toHaveValue('Port Halloran dolphin, reloaded');
  await expect(page.getByTestId('quick-wet')).toContainText('Hz');
  expect(await page.evaluate(() => performance.getEntriesByName('wetmode:store-open').length)).toBe(0);
  await expect.poll(() => page.evaluate(() => performance.getEntriesByName('wetmode:store-open').length), { timeout: 10_000 }).toBe(1);
  await expect(page.locator('#case-name')).toHaveValue('Port Halloran dolphin, reloaded');
  await expect(page.locator('[data-field="outerDiameter"] input')).toHaveValue('1219 mm');
  await expect(page.getByText('Unsaved changes (kept as a draft)').first()).toBeVisible();
});
