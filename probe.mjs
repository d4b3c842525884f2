import { chromium } from '@playwright/test';
const b = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
for (let i = 0; i < 3; i++) {
const ctx = await b.newContext();
const p = await ctx.newPage();
const cdp = await ctx.newCDPSession(p);
await cdp.send('Emulation.setCPUThrottlingRate', { rate: Number(process.env.RATE ?? 4) });
await p.addInitScript(() => {
  const t0 = performance.now();
  const obs = new MutationObserver(() => { const el = document.querySelector('[data-testid=quick-wet]'); if (el && /Hz/.test(el.textContent)) { window.__done = performance.now(); obs.disconnect(); } });
  obs.observe(document, { subtree: true, childList: true, characterData: true });
});
await p.goto('http://localhost:4232/');
await p.waitForFunction(() => window.__done, null, { polling: 50 });
const r = await p.evaluate(() => ({ done: window.__done, nav: performance.getEntriesByType('navigation').map(e => ({ rs: e.responseEnd, dcl: e.domContentLoadedEventEnd, load: e.loadEventEnd })), res: performance.getEntriesByType('resource').map(e => `${e.name.split('/').pop()} ${e.startTime.toFixed(0)}-${e.responseEnd.toFixed(0)}`), marks: performance.getEntriesByType('mark').map(m => `${m.name} ${m.startTime.toFixed(0)}`) }));
console.log(JSON.stringify(r, null, 1));
await ctx.close();
}
await b.close();
