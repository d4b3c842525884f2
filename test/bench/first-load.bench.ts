/**
 * First load of the built app (dist/, from `npm run build`) in Chromium at 4× CPU throttling: gzipped JavaScript
 * before the first answer (target ≤ 150 kB) and time to the first answer, cold and warm (target ≤ 1.0 s).
 * The same measurement as test/e2e/first-load.spec.ts, served by `vite preview` on a spare port.
 */
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import { preview } from 'vite';
import { describeSeries, measureFirstLoads, median } from '../e2e/support/first-load';

const DIST = join(process.cwd(), 'dist');
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export async function run(): Promise<void> {
  if (!existsSync(join(DIST, 'index.html'))) {
    console.log('first load: not measured (no dist/: run `npm run build` first)');
    return;
  }
  if (!existsSync(CHROMIUM)) {
    console.log(`first load: not measured (no Chromium at ${CHROMIUM}; set CHROMIUM_PATH)`);
    return;
  }
  console.log(`dist/ built ${statSync(join(DIST, 'index.html')).mtime.toISOString()}`);
  // Plain static serving of dist/ (the app's own config, with its plugins, is not needed to serve it).
  const server = await preview({ configFile: false, root: process.cwd(), build: { outDir: 'dist' }, logLevel: 'silent', preview: { port: Number(process.env.WETMODE_BENCH_PORT ?? 4299), strictPort: false } });
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'] });
  try {
    const url = server.resolvedUrls?.local[0] ?? 'http://localhost:4299/';
    const series = await measureFirstLoads(() => browser.newContext(), url, DIST);
    console.log(describeSeries(series));
    const kb = series.cold[0].gzipBytes / 1000;
    console.log(`targets: JS before first answer ≤ 150 kB gzip: ${kb <= 150 ? 'met' : 'NOT met'}; first answer ≤ 1000 ms (median, cold): ${median(series.cold.map((l) => l.firstAnswerMs)) <= 1000 ? 'met' : 'NOT met'}`);
  } finally {
    await browser.close();
    await server.close();
  }
}
