import type { Page } from '@playwright/test';

/** Waits until the page's service worker is active and fully activated; returns its state. */
export function serviceWorkerActivated(page: Page): Promise<string> {
  return page.evaluate(async () => {
    const reg = await navigator.serviceWorker.ready;
    const sw = reg.active!;
    if (sw.state !== 'activated') {
      await new Promise<void>((resolve) => sw.addEventListener('statechange', () => sw.state === 'activated' && resolve()));
    }
    return sw.state;
  });
}
