/**
 * Which Chromium the browser tests (and `npm run icons`) drive, so that `npm ci && npm test` needs nothing else:
 *
 *   1. `CHROMIUM_PATH`, when set and not empty;
 *   2. `/usr/bin/chromium` (Debian's package), when present and `WETMODE_IGNORE_SYSTEM_CHROMIUM` is not `1`;
 *   3. the headless Chromium shipped inside the `@sparticuz/chromium` devDependency (Linux x64), unpacked once per
 *      user and version into the temporary folder together with the few shared libraries it needs (NSS, NSPR,
 *      expat) and a font, so it starts on a machine with Node and nothing else.
 *
 * `WETMODE_IGNORE_SYSTEM_CHROMIUM=1` (with `CHROMIUM_PATH` unset) is how CI proves the bare-machine path on a
 * machine that has Debian's Chromium. Playwright's own browser download is never used.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { brotliDecompressSync } from 'node:zlib';

export const SYSTEM_CHROMIUM = '/usr/bin/chromium';
const PACKAGE = '@sparticuz/chromium';

/**
 * Flags for every Chromium we drive. `--no-sandbox`: Chromium refuses to start as root with its sandbox (CI runs as
 * root); as a normal user the sandbox would need user namespaces, which containers often forbid. The rest keep an
 * offline-by-design app from making background calls out. The packaged browser gets the same flags, not the
 * serverless set its package suggests (single process, web security off), so both browsers test the same app.
 */
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export interface ChosenChromium {
  executablePath: string;
  /** Extra environment for the browser process (library and font paths of the packaged browser), or undefined. */
  env: Record<string, string> | undefined;
  /** One line saying which browser and why, printed at the start of the browser tests. */
  label: string;
  source: 'CHROMIUM_PATH' | 'system' | 'packaged';
}

/** Folder of the package's compressed files (its `bin`), found from its entry point. */
function packagedBinFolder(): { bin: string; version: string } {
  const require = createRequire(import.meta.url);
  const entry = require.resolve(PACKAGE); // .../@sparticuz/chromium/build/cjs/index.cjs
  const root = join(dirname(entry), '..', '..');
  const version = (JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string }).version;
  return { bin: join(root, 'bin'), version };
}

function untarBrotli(file: string, into: string): void {
  mkdirSync(into, { recursive: true });
  // `tar` is part of every Linux base system; Node brings brotli.
  const r = spawnSync('tar', ['-x', '-C', into], { input: brotliDecompressSync(readFileSync(file)), maxBuffer: 1 << 30 });
  if (r.status !== 0) throw new Error(`unpacking ${file} failed: ${r.stderr?.toString() || r.error?.message}`);
}

/** Fontconfig file that reads the packaged font first, then any system fonts there are. */
function fontsConf(folder: string): string {
  return `<?xml version="1.0"?>\n<!DOCTYPE fontconfig SYSTEM "fonts.dtd">\n<fontconfig>\n  <dir>${folder}/fonts/fonts</dir>\n  <dir>/usr/share/fonts</dir>\n  <cachedir>${folder}/fonts-cache</cachedir>\n</fontconfig>\n`;
}

/**
 * Unpacks the packaged browser once into `<tmp>/wetmode-chromium-<version>-<uid>` (per user, so a root run never
 * leaves files another user cannot run) and returns that folder. Unpacking goes to a fresh folder that is renamed
 * into place at the end, so an interrupted or concurrent run never leaves a half-written browser behind.
 */
export function unpackPackagedChromium(): { folder: string; version: string } {
  const { bin, version } = packagedBinFolder();
  const uid = typeof process.getuid === 'function' ? process.getuid() : 0;
  const folder = join(tmpdir(), `wetmode-chromium-${version}-${uid}`);
  if (existsSync(join(folder, 'chromium'))) return { folder, version };
  const staging = mkdtempSync(`${folder}.partial-`);
  try {
    writeFileSync(join(staging, 'chromium'), brotliDecompressSync(readFileSync(join(bin, 'chromium.br'))), { mode: 0o755 });
    untarBrotli(join(bin, 'swiftshader.tar.br'), staging); // GL libraries next to the binary
    untarBrotli(join(bin, 'fonts.tar.br'), join(staging, 'fonts'));
    untarBrotli(join(bin, 'al2023.tar.br'), staging); // lib/: NSS, NSPR, expat, which a bare Linux lacks
    writeFileSync(join(staging, 'fonts.conf'), fontsConf(folder));
    renameSync(staging, folder);
  } catch (e) {
    rmSync(staging, { recursive: true, force: true });
    if (existsSync(join(folder, 'chromium'))) return { folder, version }; // another run finished first
    throw e;
  }
  return { folder, version };
}

/** The packaged binary and its libraries link against symbols up to GLIBC_2.34 (checked with `objdump -T`). */
const MIN_GLIBC = '2.34';

/** The running glibc's version ("2.36"), or undefined off glibc. */
function glibcVersion(): string | undefined {
  const header = (process.report?.getReport() as { header?: { glibcVersionRuntime?: string } } | undefined)?.header;
  return header?.glibcVersionRuntime;
}

function olderThan(version: string, floor: string): boolean {
  const [a, b] = [version, floor].map((v) => v.split('.').map(Number));
  return a[0] !== b[0] ? a[0] < b[0] : (a[1] ?? 0) < (b[1] ?? 0);
}

/** Why the packaged browser cannot run on this machine, or undefined when it can. */
export function packagedUnavailable(platform: string = process.platform, arch: string = process.arch, glibc: string | undefined = glibcVersion()): string | undefined {
  if (platform !== 'linux' || arch !== 'x64') return `the packaged one (${PACKAGE}) is for Linux x64 and this is ${platform} ${arch}. Set CHROMIUM_PATH to a Chromium or Chrome executable.`;
  if (glibc !== undefined && olderThan(glibc, MIN_GLIBC)) {
    return `the packaged one needs glibc ≥ ${MIN_GLIBC} and this machine has ${glibc}. Install Chromium (Debian: apt-get install chromium) or set CHROMIUM_PATH.`;
  }
  return undefined;
}

/** Chooses the browser (see the top of this file); unpacks the packaged one when it is the choice. */
export function chooseChromium(env: NodeJS.ProcessEnv = process.env, systemChromium: string = SYSTEM_CHROMIUM): ChosenChromium {
  const fromEnv = env.CHROMIUM_PATH?.trim();
  if (fromEnv) return { executablePath: fromEnv, env: undefined, source: 'CHROMIUM_PATH', label: `CHROMIUM_PATH (${fromEnv})` };
  const ignoreSystem = env.WETMODE_IGNORE_SYSTEM_CHROMIUM === '1';
  if (!ignoreSystem && existsSync(systemChromium)) {
    return { executablePath: systemChromium, env: undefined, source: 'system', label: `system Chromium (${systemChromium})` };
  }
  const why = packagedUnavailable();
  if (why !== undefined) throw new Error(`No Chromium for the browser tests: ${why}`);
  const { folder, version } = unpackPackagedChromium();
  const libs = join(folder, 'lib');
  return {
    executablePath: join(folder, 'chromium'),
    env: {
      LD_LIBRARY_PATH: env.LD_LIBRARY_PATH ? `${libs}:${env.LD_LIBRARY_PATH}` : libs,
      FONTCONFIG_FILE: join(folder, 'fonts.conf'),
    },
    source: 'packaged',
    label: `packaged Chromium (${PACKAGE} ${version}${ignoreSystem ? ', system Chromium ignored' : ''}) unpacked at ${folder}`,
  };
}
