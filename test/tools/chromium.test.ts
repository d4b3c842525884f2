import { describe, it, expect } from 'vitest';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS, SYSTEM_CHROMIUM, chooseChromium } from './chromium';

describe('the Chromium the browser tests drive', () => {
  it('is CHROMIUM_PATH when that is set, whatever else is installed', () => {
    const c = chooseChromium({ CHROMIUM_PATH: '/opt/some/chrome' });
    expect(c).toMatchObject({ source: 'CHROMIUM_PATH', executablePath: '/opt/some/chrome', env: undefined });
  });

  it('an empty CHROMIUM_PATH counts as unset', () => {
    expect(chooseChromium({ CHROMIUM_PATH: ' ' }).source).not.toBe('CHROMIUM_PATH');
  });

  it('skips the system Chromium under WETMODE_IGNORE_SYSTEM_CHROMIUM=1 and unpacks the packaged one with its libraries', () => {
    const c = chooseChromium({ WETMODE_IGNORE_SYSTEM_CHROMIUM: '1' });
    expect(c.source).toBe('packaged');
    expect(c.executablePath).not.toBe(SYSTEM_CHROMIUM);
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
