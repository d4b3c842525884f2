import { test, expect } from '@playwright/test';
import { join } from 'node:path';
import { describeSeries, measureFirstLoads } from './support/first-load';

/**
 * What a cold first load fetches before the first answer, at 4× CPU throttling, cold and with the service worker
 * warm. The targets themselves (at most 150 kB of gzipped JavaScript, first answer within 1.0 s) are speed and
 * size figures: `npm run bench` measures and prints them (test/bench/first-load.bench.ts), as the house rules
 * ask. This test holds what must not regress whatever the machine's load: the first answer comes without the
 * unit reader (mathjs) or any screen but the Member screen being fetched first.
 */
const DIST = join(import.meta.dirname, '../../dist');

test('the first answer comes before the unit reader or any other screen is fetched, cold and warm; the figures are printed', async ({ browser, baseURL }) => {
  test.setTimeout(180_000);
  const series = await measureFirstLoads(() => browser.newContext(), `${baseURL}/`, DIST);
  console.log(describeSeries(series));
  const { cold, warm } = series;
  expect(cold[0].scripts.length, 'scripts were seen before the first answer').toBeGreaterThan(0);
  for (const load of [...cold, ...warm]) {
    const names = load.scripts.map((s) => s.path);
    expect(names.filter((p) => /\/(math|ReportScreen|SectionScreen|CasesScreen|ResultsWithActions)-/.test(p)), 'on-demand chunks fetched before the first answer').toEqual([]);
    expect(load.firstAnswerMs).toBeGreaterThan(0);
  }
});
