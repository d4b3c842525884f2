/**
 * The Cases screen with 5,000 saved cases: open, search, sort, delete and undo, timed against 500 ms each and no
 * long task over 100 ms (the browser's own "longtask" entries); figures printed, a regression guard asserted. The cases are written straight into a version 3
 * database in one transaction before the app loads, so the app's upgrade to version 4 builds the list store from
 * them, as it will on a surveyor's tablet that already holds many cases.
 */
import { test, expect, type Page } from '@playwright/test';
import type { Case } from '../../src/case';
import { baffleCase, demoCase } from '../case/fixtures';

const COUNT = 5000;
/**
 * Targets of the feature (interaction budget and the browser's long-task threshold; not from a publication) are
 * printed against the figures. A speed target is not a pass/fail test on a shared machine (the house rules), so
 * the assertions hold a ceiling of GUARD times the target: far above any quiet run, far below the seconds the
 * old screen took (14.7 s to sort 2,000 cases), so a return to parsing every case still fails.
 */
const STEP_MS = 500;
const LONG_TASK_MS = 100;
const GUARD = 4;

/** 5,000 invented cases: names "Pile n — Skerry Alpha" in a shuffled order (so name order is not change order). */
function seedCases(): (Case & { revision: number })[] {
  const base = [demoCase(), baffleCase()];
  const start = Date.parse('2026-01-01T00:00:00.000Z');
  return Array.from({ length: COUNT }, (_, i) => {
    const n = ((i * 7919) % COUNT) + 1;
    const hex = (i + 1).toString(16).padStart(12, '0');
    return {
      ...base[i % 2],
      id: `00000000-0000-4000-8000-${hex}`,
      name: `${i % 2 ? 'Baffle' : 'Pile'} ${n} — ${i % 3 ? 'Skerry Alpha' : 'Port Halloran'}`,
      tag: `SA-${String(n).padStart(4, '0')}`,
      createdAt: new Date(start + i * 60_000).toISOString(),
      updatedAt: new Date(start + i * 60_000).toISOString(),
      revision: 1,
    };
  });
}

async function seedVersion3(page: Page, cases: unknown[]): Promise<number> {
  return page.evaluate(async (records) => {
    const t0 = performance.now();
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const r = indexedDB.open('wetmode', 3);
      r.onupgradeneeded = () => {
        r.result.createObjectStore('cases', { keyPath: 'id' });
        r.result.createObjectStore('drafts', { keyPath: 'key' });
        r.result.createObjectStore('trash', { keyPath: 'token' });
      };
      r.onsuccess = () => resolve(r.result);
      r.onerror = () => reject(r.error);
    });
    const tx = db.transaction('cases', 'readwrite');
    for (const c of records) tx.objectStore('cases').put(c);
    await new Promise((resolve, reject) => {
      tx.oncomplete = resolve;
      tx.onerror = () => reject(tx.error);
    });
    db.close();
    return performance.now() - t0;
  }, cases);
}

/** In the page: resolves with performance.now() once `test()` holds, checked every animation frame (after paint). */
const UNTIL = `window.__until = (test) => new Promise((resolve) => {
  const tick = () => (test() ? resolve(performance.now()) : requestAnimationFrame(tick));
  tick();
});
window.__long = [];
window.__marks = [];
new PerformanceObserver((list) => { for (const e of list.getEntries()) window.__long.push({ at: e.startTime, ms: e.duration }); }).observe({ type: 'longtask' });`;

interface PageTools {
  __marks: [string, number][];
  __until(test: () => boolean): Promise<number>;
  __long: { at: number; ms: number }[];
}

test('5,000 saved cases: open, search, sort, delete and undo stay interactive (figures printed against 500 ms and 100 ms long tasks)', async ({ page }) => {
  test.setTimeout(120_000);
  await page.addInitScript(UNTIL);
  await page.goto('/manifest.webmanifest');
  const seedMs = await seedVersion3(page, seedCases());
  const bootStart = Date.now();
  await page.goto('/#/member');
  await expect(page.getByRole('link', { name: 'Cases' }).first()).toBeVisible();
  // The app upgrades the database to version 4 as it starts, building the list store from the 5,000 cases.
  await expect
    .poll(() => page.evaluate(async () => (await indexedDB.databases()).find((d) => d.name === 'wetmode')?.version), { timeout: 60_000, intervals: [50] })
    .toBe(4);
  const bootMs = Date.now() - bootStart;
  // Let the start finish its own work (first solve, storage checks) before the timed steps.
  await page.evaluate(() => new Promise((resolve) => requestIdleCallback(resolve, { timeout: 3000 })));
  // Measure from here: the app has started (and upgraded the database); every step below is a user action.
  const since = await page.evaluate(() => performance.now());

  const open = await page.evaluate(async (n) => {
    const w = window as unknown as PageTools;
    const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['open', t0]);
    location.hash = '#/cases';
    const t1 = await w.__until(() => (document.querySelector('.list-count')?.textContent ?? '') === `${n} saved cases` && document.querySelector('.case-list .case-row') !== null);
    const rows = document.querySelectorAll('.case-list > li').length;
    // The whole light list is read after the first page: "Show 50 more" appears once it is there (search needs it).
    const t2 = await w.__until(() => document.querySelector('.list-more') !== null);
    return { ms: t1 - t0, wholeMs: t2 - t0, nodes: document.getElementsByTagName('*').length, rows };
  }, COUNT);

  const search = await page.evaluate(async () => {
    const w = window as unknown as PageTools;
    const input = document.querySelector<HTMLInputElement>('.list-tools input[type="search"]')!;
    const times: number[] = [];
    for (const ch of 'pile ') {
      const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['search', t0]);
      input.value += ch;
      input.dispatchEvent(new Event('input', { bubbles: true }));
      const q = input.value.trim();
      times.push((await w.__until(() => (document.querySelector('.list-count')?.textContent ?? '').includes(`“${q}”`))) - t0);
    }
    const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['search-clear', t0]);
    input.value = '';
    input.dispatchEvent(new Event('input', { bubbles: true }));
    times.push((await w.__until(() => !(document.querySelector('.list-count')?.textContent ?? '').includes('match'))) - t0);
    return times;
  });

  const sort = await page.evaluate(async () => {
    const w = window as unknown as PageTools;
    const select = document.querySelector<HTMLSelectElement>('.list-tools select')!;
    const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['sort', t0]);
    select.value = 'name';
    select.dispatchEvent(new Event('change', { bubbles: true }));
    const first = () => document.querySelector('.case-list .case-name')?.textContent ?? '';
    const t1 = await w.__until(() => first().startsWith('Baffle 2 —'));
    const t2 = await w.__until(() => document.querySelector('.list-more') !== null);
    return { ms: t1 - t0, wholeMs: t2 - t0, first: first() };
  });

  const del = await page.evaluate(async (n) => {
    const w = window as unknown as PageTools;
    const button = [...document.querySelectorAll<HTMLButtonElement>('.case-list .case-row button')].find((b) => b.textContent?.startsWith('Delete'))!;
    const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['delete', t0]);
    button.click();
    const t1 = await w.__until(() => (document.querySelector('.list-count')?.textContent ?? '') === `${n - 1} saved cases`);
    return t1 - t0;
  }, COUNT);
  await expect(page.getByRole('button', { name: 'Undo' })).toBeVisible();

  const undo = await page.evaluate(async (n) => {
    const w = window as unknown as PageTools;
    const button = [...document.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent === 'Undo')!;
    const t0 = performance.now();
    (window as unknown as PageTools).__marks.push(['undo', t0]);
    button.click();
    const first = () => document.querySelector('.case-list .case-name')?.textContent ?? '';
    const t1 = await w.__until(() => (document.querySelector('.list-count')?.textContent ?? '') === `${n} saved cases` && first().startsWith('Baffle 2 —'));
    return t1 - t0;
  }, COUNT);

  const all = await page.evaluate(() => (window as unknown as PageTools).__long);
  const long = all.filter((e) => e.at >= since);
  const bootLongest = Math.max(0, ...all.filter((e) => e.at < since).map((e) => e.ms));
  // Which step each long task fell in (the last step started before it), to say where time went.
  const marks = await page.evaluate(() => (window as unknown as PageTools).__marks);
  const where = long.map((e) => `${e.ms.toFixed(0)} ms in ${[...marks].reverse().find((m) => m[1] <= e.at)?.[0] ?? 'start'}`);
  const longest = Math.max(0, ...long.map((e) => e.ms));
  console.log(
    `cases-scale: seed ${COUNT} in ${seedMs.toFixed(0)} ms; start and upgrade to version 4 ${bootMs} ms; open ${open.ms.toFixed(0)} ms to the first page, ${open.wholeMs.toFixed(0)} ms to the whole list (${open.rows} rows, ${open.nodes} elements); ` +
      `search per key ${search.map((m) => m.toFixed(0)).join(', ')} ms; sort by name ${sort.ms.toFixed(0)} ms (whole list ${sort.wholeMs.toFixed(0)} ms); delete ${del.toFixed(0)} ms; undo ${undo.toFixed(0)} ms; ` +
      `long tasks ${long.length}, longest ${longest.toFixed(0)} ms [${where.join('; ')}] (while starting and upgrading: longest ${bootLongest.toFixed(0)} ms)`,
  );
  expect(open.rows).toBe(50);
  const met = (ms: number, target: number) => (ms <= target ? 'met' : 'NOT met');
  console.log(
    `cases-scale targets: open ${met(open.ms, STEP_MS)}, search ${met(Math.max(...search), STEP_MS)}, sort ${met(sort.ms, STEP_MS)}, ` +
      `delete ${met(del, STEP_MS)}, undo ${met(undo, STEP_MS)} (each ≤ ${STEP_MS} ms); long tasks ${met(longest, LONG_TASK_MS)} (≤ ${LONG_TASK_MS} ms)`,
  );
  expect(open.ms).toBeLessThan(GUARD * STEP_MS);
  for (const m of search) expect(m).toBeLessThan(GUARD * STEP_MS);
  expect(sort.ms).toBeLessThan(GUARD * STEP_MS);
  expect(del).toBeLessThan(GUARD * STEP_MS);
  expect(undo).toBeLessThan(GUARD * STEP_MS);
  expect(longest).toBeLessThanOrEqual(GUARD * LONG_TASK_MS);

  // The list stays a list, its count is announced, and the next page comes with "Show 50 more".
  await expect(page.locator('.list-count')).toHaveAttribute('aria-live', 'polite');
  await page.getByRole('button', { name: 'Show 50 more' }).click();
  await expect(page.locator('.case-list').first().locator(':scope > li')).toHaveCount(100);
  await expect(page.getByText(`Showing 100 of ${COUNT}.`)).toBeVisible();
  // Keyboard focus moved to the first new row, not left below the list.
  await expect(page.locator('.case-list').first().locator(':scope > li').nth(50).getByRole('button').first()).toBeFocused();
  // The heading of the list just below the sticky top bar; then, on a tablet held upright, the end of the page.
  await page.evaluate(() => window.scrollTo(0, document.querySelector<HTMLElement>('#saved-h')!.getBoundingClientRect().top + window.scrollY - 70));
  await page.waitForTimeout(100);
  await page.screenshot({ path: 'test-results/cases-scale-1024x768.png' });
  await page.setViewportSize({ width: 768, height: 1024 });
  for (let i = 0; i < 3; i++) {
    // Rows drawn for the first time take their real height: scroll again until the end stays put.
    await page.locator('.list-more').scrollIntoViewIfNeeded();
    await page.waitForTimeout(100);
  }
  await page.screenshot({ path: 'test-results/cases-scale-768x1024.png' });
});
