/**
 * Renders public/icons/wetmode.svg to the PNG icons the manifest lists, in the Chromium the browser tests use
 * (test/tools/chromium.ts).
 * Run after changing the SVG: `npm run icons`.
 */
import { chromium } from '@playwright/test';
import { readFileSync, writeFileSync } from 'node:fs';
import { CHROMIUM_ARGS, chooseChromium } from './chromium';

const svg = readFileSync('public/icons/wetmode.svg', 'utf8');
// Maskable: full-bleed background and the drawing inside the central 80 % safe zone.
const maskable = svg
  .replace(/<svg([^>]*)>/, '<svg$1><rect width="512" height="512" fill="#0b3d5c"/><g transform="translate(64 64) scale(0.75)">')
  .replace('</svg>', '</g></svg>');

const chosen = chooseChromium();
console.log(`rendering in ${chosen.label}`);
const browser = await chromium.launch({ executablePath: chosen.executablePath, args: CHROMIUM_ARGS, env: chosen.env ? { ...process.env, ...chosen.env } : undefined });
const page = await browser.newPage();
async function render(source: string, size: number, out: string): Promise<void> {
  await page.setViewportSize({ width: size, height: size });
  await page.setContent(`<html><body style="margin:0;background:transparent">${source.replace('<svg ', `<svg width="${size}" height="${size}" `)}</body></html>`);
  writeFileSync(out, await page.screenshot({ omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } }));
}
await render(svg, 192, 'public/icons/wetmode-192.png');
await render(svg, 512, 'public/icons/wetmode-512.png');
await render(maskable, 512, 'public/icons/wetmode-maskable-512.png');
await render(maskable, 180, 'public/icons/apple-touch-icon.png');
await browser.close();
console.log('icons written');
