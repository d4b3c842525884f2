/**
 * Measures the first load of the built app in Chromium: time from navigation to the first answer (the Member
 * screen's lowest dry frequency in Hz, its lowest wet frequency when the member is wet, and the verdict, all
 * shown) under CPU throttling, and the JavaScript fetched before that answer
 * (page and dedicated-worker requests; the service worker's own precache downloads are not counted).
 *
 * `vite preview` serves files uncompressed, so the gzip size of each script is computed here from `dist/` with
 * zlib at level 9 (as Vite's own build report does); a static host compressing at a lower level sends a little more.
 * Used by test/e2e/first-load.spec.ts (asserting the targets) and test/bench/first-load.bench.ts (printing them).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { BrowserContext, Request } from '@playwright/test';
import { serviceWorkerActivated } from './service-worker';

export interface ScriptFetch {
  /** Path on the server, e.g. /assets/index-abc.js. */
  path: string;
  rawBytes: number;
  gzipBytes: number;
}

export interface FirstLoad {
  /** Navigation start to the quick wet frequency on screen, in ms (page clock). */
  firstAnswerMs: number;
  /** Scripts requested before the first answer, in request order. */
  scripts: ScriptFetch[];
  gzipBytes: number;
  rawBytes: number;
  /** The page's start steps (src/ui/state/boot-marks.ts and navigation timing), ms from navigation, in order. */
  steps: { name: string; atMs: number }[];
}

/**
 * Runs in the page before any of its scripts: notes the page-clock time the first answer shows, that is the
 * lowest dry frequency in Hz with the verdict beside it (and the lowest wet frequency, which the demo case has).
 */
function watchForFirstAnswer(): void {
  const w = window as unknown as { __firstAnswerMs?: number };
  const shows = (id: string, pattern: RegExp) => pattern.test(document.querySelector(`[data-testid=${id}]`)?.textContent ?? '');
  const check = () => {
    if (w.__firstAnswerMs !== undefined) return;
    if (shows('quick-dry', /Hz/) && shows('quick-wet', /Hz/) && shows('quick-verdict', /\S/)) {
      w.__firstAnswerMs = performance.now();
      observer.disconnect();
    }
  };
  const observer = new MutationObserver(check);
  observer.observe(document, { subtree: true, childList: true, characterData: true });
}

function sizesOf(distDir: string, path: string): { rawBytes: number; gzipBytes: number } {
  const buf = readFileSync(join(distDir, decodeURIComponent(path)));
  return { rawBytes: buf.length, gzipBytes: gzipSync(buf, { level: 9 }).length };
}

/**
 * Opens `url` in a new page of `context` at `cpuSlowdown`× CPU throttling (Chrome DevTools Protocol
 * Emulation.setCPUThrottlingRate, which slows the page's main thread; the solver worker runs unthrottled) and
 * waits for the first answer. A fresh context is a cold load; a second call in the same context, after one with
 * `thenInstallServiceWorker`, is a warm visit served by the service worker.
 */
export async function measureFirstLoad(
  context: BrowserContext,
  url: string,
  distDir: string,
  { cpuSlowdown = 4, thenInstallServiceWorker = false } = {},
): Promise<FirstLoad> {
  const page = await context.newPage();
  await page.addInitScript(watchForFirstAnswer);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: cpuSlowdown });
  // When each script was asked for: the browser's own start time of the request (the event reaches this process a
  // little later, so its arrival time could put a request made just before the answer after it).
  const requests: { path: string; request: Request; seenEpochMs: number }[] = [];
  page.on('request', (r) => {
    const u = new URL(r.url());
    if (u.pathname.endsWith('.js')) requests.push({ path: u.pathname, request: r, seenEpochMs: Date.now() });
  });
  await page.goto(url);
  await page.waitForFunction(() => (window as unknown as { __firstAnswerMs?: number }).__firstAnswerMs !== undefined, null, { timeout: 30_000, polling: 50 });
  const { firstAnswerMs, origin, steps } = await page.evaluate(() => {
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
    const marks = performance.getEntriesByType('mark').map((m) => ({ name: m.name.replace('wetmode:', ''), atMs: m.startTime }));
    const navSteps = nav ? [{ name: 'html-received', atMs: nav.responseEnd }, { name: 'dom-content-loaded', atMs: nav.domContentLoadedEventEnd }] : [];
    return {
      firstAnswerMs: (window as unknown as { __firstAnswerMs: number }).__firstAnswerMs,
      origin: performance.timeOrigin,
      steps: [...navSteps, ...marks].sort((a, b) => a.atMs - b.atMs),
    };
  });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
  // For a following warm visit: wait until the service worker has precached everything and taken over.
  if (thenInstallServiceWorker) await serviceWorkerActivated(page);
  await page.close();
  const answerEpochMs = origin + firstAnswerMs;
  const seen = new Set<string>();
  const scripts: ScriptFetch[] = [];
  for (const r of requests) {
    const started = r.request.timing().startTime;
    const atEpochMs = started > 0 ? started : r.seenEpochMs;
    if (atEpochMs > answerEpochMs || seen.has(r.path)) continue;
    seen.add(r.path);
    scripts.push({ path: r.path, ...sizesOf(distDir, r.path) });
  }
  return {
    firstAnswerMs,
    scripts,
    gzipBytes: scripts.reduce((s, x) => s + x.gzipBytes, 0),
    rawBytes: scripts.reduce((s, x) => s + x.rawBytes, 0),
    steps,
  };
}

export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** One line per script and a total, for the test log and the benchmark. */
export function describeLoad(label: string, load: FirstLoad): string {
  const kb = (b: number) => (b / 1000).toFixed(1);
  const lines = load.scripts.map((s) => `    ${s.path}: ${kb(s.rawBytes)} kB raw, ${kb(s.gzipBytes)} kB gzip`);
  const steps = load.steps.map((s) => `${s.name} ${s.atMs.toFixed(0)}`).join(', ');
  return [`  ${label}: first answer ${load.firstAnswerMs.toFixed(0)} ms; JS before it ${kb(load.gzipBytes)} kB gzip (${kb(load.rawBytes)} kB raw)`, `    steps (ms): ${steps}`, ...lines].join('\n');
}

export interface FirstLoadSeries {
  cold: FirstLoad[];
  warm: FirstLoad[];
}

/** `runs` cold loads, each in a fresh context, each followed by a warm visit in the same context. */
export async function measureFirstLoads(newContext: () => Promise<BrowserContext>, url: string, distDir: string, runs = 3): Promise<FirstLoadSeries> {
  const cold: FirstLoad[] = [];
  const warm: FirstLoad[] = [];
  for (let i = 0; i < runs; i++) {
    const context = await newContext();
    cold.push(await measureFirstLoad(context, url, distDir, { thenInstallServiceWorker: true }));
    warm.push(await measureFirstLoad(context, url, distDir));
    await context.close();
  }
  return { cold, warm };
}

/** The figures of a series: medians and bests of the throttled times, and the scripts of the first cold load. */
export function describeSeries({ cold, warm }: FirstLoadSeries): string {
  const ms = (ls: FirstLoad[]) => ls.map((l) => l.firstAnswerMs);
  const fig = (ls: FirstLoad[]) => `median ${median(ms(ls)).toFixed(0)} ms, best ${Math.min(...ms(ls)).toFixed(0)} ms (${ms(ls).map((x) => x.toFixed(0)).join(', ')})`;
  return [
    `first answer at 4x CPU throttle, cold: ${fig(cold)}`,
    `first answer at 4x CPU throttle, warm (service worker): ${fig(warm)}`,
    describeLoad('cold load', cold[0]),
    `  warm load: first answer ${warm[0].firstAnswerMs.toFixed(0)} ms`,
    `    steps (ms): ${warm[0].steps.map((s) => `${s.name} ${s.atMs.toFixed(0)}`).join(', ')}`,
  ].join('\n');
}
