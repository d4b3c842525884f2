import { describe, it, expect } from 'vitest';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS, chooseChromium, packagedUnavailable } from './chromium';

// Where the packaged browser cannot run (not Linux x64, or an old glibc), choosing it must say why instead.
const packagedHere = packagedUnavailable() === undefined;

describe('the Chromium the browser tests drive', () => {
  it('is CHROMIUM_PATH when that is set, whatever else is installed', () => {
    const c = chooseChromium({ CHROMIUM_PATH: '/opt/some/chrome' });
    expect(c).toMatchObject({ source: 'CHROMIUM_PATH', executablePath: '/opt/some/chrome', env: undefined });
  });

  it('is the system Chromium when there is one and CHROMIUM_PATH is unset or empty', () => {
    const existing = process.execPath; // any file that exists stands in for /usr/bin/chromium
    expect(chooseChromium({ CHROMIUM_PATH: ' ' }, existing)).toMatchObject({ source: 'system', executablePath: existing });
    expect(chooseChromium({}, existing).source).toBe('system');
  });

  it('the packaged one is refused with a reason off Linux x64 or below glibc 2.34', () => {
    expect(packagedUnavailable('darwin', 'arm64', undefined)).toMatch(/for Linux x64 and this is darwin arm64\. Set CHROMIUM_PATH/);
    expect(packagedUnavailable('linux', 'x64', '2.31')).toMatch(/needs glibc ≥ 2\.34 and this machine has 2\.31/);
    expect(packagedUnavailable('linux', 'x64', '2.34')).toBeUndefined();
    expect(packagedUnavailable('linux', 'x64', '3.0')).toBeUndefined();
  });

  it('skips the system Chromium under WETMODE_IGNORE_SYSTEM_CHROMIUM=1 and unpacks the packaged one with its libraries', () => {
    const choose = () => chooseChromium({ WETMODE_IGNORE_SYSTEM_CHROMIUM: '1' }, process.execPath);
    if (!packagedHere) {
      expect(choose).toThrow(/^No Chromium for the browser tests: /);
      return;
    }
    const c = choose();
    expect(c.source).toBe('packaged');
    expect(c.env?.LD_LIBRARY_PATH).toMatch(/wetmode-chromium-[\d.]+-\d+\/lib$/);
    expect(c.label).toContain('system Chromium ignored');
  }, 120_000); // the first call unpacks about 200 MB, which takes seconds on a busy machine

  it('starts and runs a page with the project flags (the chosen browser, or the packaged one under the switch)', async () => {
    const c = chooseChromium();
    const browser = await chromium.launch({ executablePath: c.executablePath, args: CHROMIUM_ARGS, env: c.env ? { ...process.env, ...c.env } : undefined });
    try {
      const page = await browser.newPage();
      await page.setContent('<p id="p"></p><script>document.getElementById("p").textContent = String(6 * 7)</script>');
      expect(await page.textContent('#p')).toBe('42');
      console.log(`browser check: ${c.label}, version ${browser.version()}`);
    } finally {
      await browser.close();
    }
  }, 120_000);
});
