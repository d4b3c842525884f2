import { test, expect } from '@playwright/test';
import { join } from 'node:path';
import { describeSeries, measureFirstLoads } from './support/first-load';

/**
 * The first answer on a slow tablet: a cold load and a warm (service-worker) visit at 4× CPU throttling.
 * Targets: at most 150 kB of gzipped JavaScript before the first answer, and the first answer within 1.0 s.
 *
 * The byte count is exact and asserted as is. The time is asserted on the best of three loads (each in a fresh
 * browser context) against the target times TIME_MARGIN: on a shared 2-core machine other work stretches any
 * one load by half or more, so the plain target would fail at random. On a quiet machine run with
 * WETMODE_TIME_MARGIN=1 to hold the target itself. The figures are printed either way.
 */
const DIST = join(import.meta.dirname, '../../dist');
const JS_GZIP_BUDGET_BYTES = 150_000;
const FIRST_ANSWER_TARGET_MS = 1000;
const TIME_MARGIN = Number(process.env.WETMODE_TIME_MARGIN ?? 1.6);

test('at most 150 kB of gzipped JavaScript comes before the first answer, and at 4× CPU throttling that answer comes within 1.0 s times the stated margin, cold and warm', async ({ browser, baseURL }) => {
  test.setTimeout(180_000);
  const series = await measureFirstLoads(() => browser.newContext(), `${baseURL}/`, DIST);
  console.log(describeSeries(series));
  const { cold, warm } = series;
  expect(cold[0].scripts.length, 'scripts were seen before the first answer').toBeGreaterThan(0);
  for (const load of cold) expect(load.gzipBytes, 'gzipped JavaScript before the first answer, cold').toBeLessThanOrEqual(JS_GZIP_BUDGET_BYTES);
  const limit = FIRST_ANSWER_TARGET_MS * TIME_MARGIN;
  expect(Math.min(...cold.map((l) => l.firstAnswerMs)), `best cold first answer (limit ${limit} ms)`).toBeLessThanOrEqual(limit);
  expect(Math.min(...warm.map((l) => l.firstAnswerMs)), `best warm first answer (limit ${limit} ms)`).toBeLessThanOrEqual(limit);
});
