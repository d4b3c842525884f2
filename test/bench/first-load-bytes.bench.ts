/**
 * JavaScript a cold first load fetches before the app can answer: the scripts dist/index.html loads (module
 * scripts and modulepreload links) and, transitively, the chunks they import statically. Dynamic imports and
 * workers load later and are listed apart. Sizes are raw and gzip (level 9, what a static server's gzip gives
 * within a few per cent). Each file is checked against the service worker's precache list, so offline still works.
 * Target: ≤ 150 kB gzip before the first answer.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join, posix } from 'node:path';
import { gzipSync } from 'node:zlib';

const DIST = 'dist';
const TARGET_GZIP_BYTES = 150_000;

/** Paths (relative to dist/) of the scripts index.html loads eagerly. */
function htmlScripts(html: string): string[] {
  const out: string[] = [];
  for (const m of html.matchAll(/<script\b[^>]*\btype="module"[^>]*\bsrc="([^"]+)"/g)) out.push(m[1]);
  for (const m of html.matchAll(/<link\b[^>]*\brel="modulepreload"[^>]*\bhref="([^"]+)"/g)) out.push(m[1]);
  return out.map((p) => p.replace(/^\//, ''));
}

/** Static imports of a built ES module (`import … from "./x.js"`, `import "./x.js"`), not `import("./x.js")`. */
function staticImports(file: string, code: string): string[] {
  const out: string[] = [];
  for (const m of code.matchAll(/\b(?:import|export)\s*(?:[\w*{}\s,$]+?\s*from\s*)?["']([^"']+\.js)["']/g)) {
    out.push(posix.normalize(posix.join(posix.dirname(file), m[1])));
  }
  return out;
}

function precached(): Set<string> {
  const sw = existsSync(join(DIST, 'sw.js')) ? readFileSync(join(DIST, 'sw.js'), 'utf8') : '';
  return new Set([...sw.matchAll(/url:\s*"([^"]+)"/g)].map((m) => m[1]));
}

const kB = (n: number) => `${(n / 1000).toFixed(1)} kB`;

export function run(): void {
  const html = readFileSync(join(DIST, 'index.html'), 'utf8');
  const cache = precached();
  const eager = new Set<string>();
  const queue = htmlScripts(html);
  while (queue.length > 0) {
    const f = queue.shift()!;
    if (eager.has(f)) continue;
    eager.add(f);
    queue.push(...staticImports(f, readFileSync(join(DIST, f), 'utf8')));
  }
  let raw = 0;
  let gz = 0;
  for (const f of eager) {
    const bytes = readFileSync(join(DIST, f));
    const g = gzipSync(bytes, { level: 9 }).length;
    raw += bytes.length;
    gz += g;
    console.log(`  eager  ${f.padEnd(50)} ${kB(bytes.length).padStart(9)} raw ${kB(g).padStart(9)} gzip  precached: ${cache.has(f) ? 'yes' : 'NO'}`);
  }
  const later = readdirSync(join(DIST, 'assets'))
    .map((n) => `assets/${n}`)
    .filter((f) => f.endsWith('.js') && !eager.has(f));
  for (const f of later) {
    const bytes = readFileSync(join(DIST, f));
    console.log(`  later  ${f.padEnd(50)} ${kB(bytes.length).padStart(9)} raw ${kB(gzipSync(bytes, { level: 9 }).length).padStart(9)} gzip  precached: ${cache.has(f) ? 'yes' : 'NO'}`);
  }
  console.log(
    `${'first-load JavaScript (eager closure of index.html)'.padEnd(58)} ${kB(raw)} raw, ${kB(gz)} gzip in ${eager.size} file(s)  target ≤ ${kB(TARGET_GZIP_BYTES)} gzip: ${gz <= TARGET_GZIP_BYTES ? 'met' : 'NOT met'}`,
  );
}
