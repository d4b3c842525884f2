import { expect, test, type Page } from '@playwright/test';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * A copy of the build served on its own port, so a test can publish a second build over it (an app update)
 * without disturbing any other test.
 */
export class ServedCopy {
  private dir = '';
  private server: ChildProcess | null = null;

  constructor(readonly port: number) {}

  get base(): string {
    return `http://localhost:${this.port}/`;
  }

  async start(): Promise<void> {
    this.dir = mkdtempSync(join(tmpdir(), 'wetmode-update-'));
    cpSync('dist', this.dir, { recursive: true });
    // Node runs Vite directly (not through npx), so killing this process stops the server.
    this.server = spawn(process.execPath, ['node_modules/vite/bin/vite.js', 'preview', '--outDir', this.dir, '--port', String(this.port), '--strictPort'], { stdio: 'ignore' });
    for (let i = 0; i < 100; i++) {
      try {
        if ((await fetch(this.base)).ok) return;
      } catch {
        /* not up yet */
      }
      await new Promise((r) => setTimeout(r, 200));
    }
    throw new Error(`preview server on port ${this.port} did not start`);
  }

  /** Publishes a new build over the served one and asks the page's service worker to look for it. */
  async publishBuild(page: Page, stamp: string): Promise<void> {
    const built = spawnSync(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--outDir', this.dir, '--emptyOutDir'], {
      env: { ...process.env, WETMODE_BUILD_STAMP: stamp },
      encoding: 'utf8',
    });
    expect(built.status, built.stderr).toBe(0);
    await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
  }

  stop(): void {
    this.server?.kill();
    if (this.dir) rmSync(this.dir, { recursive: true, force: true });
  }
}

/** A served copy for the tests of one spec file: started before them, stopped after; the file's tests run in order. */
export function servedCopyForFile(port: number): ServedCopy {
  const served = new ServedCopy(port);
  test.describe.configure({ mode: 'serial' });
  test.beforeAll(() => served.start());
  test.afterAll(() => served.stop());
  return served;
}
