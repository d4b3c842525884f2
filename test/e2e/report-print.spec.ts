/**
 * The printed record of every demo case, printed by Chromium to PDF on A4 and on Letter: at most 3 pages, a
 * "Page n of N" number on every page, the cautions in full on page 1, no "from memory" anywhere, and a QR code,
 * shown under print media, that decodes (jsQR, an independent decoder) to the case link printed beside it.
 *
 * The PDF's text is read with pdfjs-dist (the PDF reader of a widely used browser, kept up to date on the npm
 * registry) rather than a parser of our own. The QR symbol is drawn by the browser on a canvas (no image
 * library needed) and read by jsQR.
 */
import { test, expect, type Page } from '@playwright/test';
import { createRequire } from 'node:module';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { cautionsFor } from '../../src/text/cautions';

const PAPERS = ['A4', 'Letter'] as const;
const DEMOS = 5; // one per kind: pile, riser, baffle, stem, plate panel

/** Text of each page of a PDF, white space as pdf.js reports it. */
async function pageTexts(pdf: Buffer): Promise<string[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const out: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    out.push(content.items.map((it) => ('str' in it ? it.str : '')).join(' '));
  }
  await doc.destroy();
  return out;
}

/** Letters only, lower case: line breaks and spacing in the PDF do not matter. */
const squash = (s: string): string => s.toLowerCase().replace(/[\s\u00ad]+/g, '');

/**
 * Decodes the QR symbol as printed: the report's SVG drawn by the browser at a whole number of pixels per module
 * (a screenshot at screen resolution blurs the modules of a long link), read by jsQR loaded into that blank page,
 * so only the decoded text comes back.
 */
async function decodeQr(page: Page, svg: string): Promise<string | null> {
  const blank = await page.context().newPage();
  await blank.addScriptTag({ path: createRequire(import.meta.url).resolve('jsqr') });
  const text = await blank.evaluate(async (markup) => {
    const img = new Image();
    img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(markup)}`;
    await img.decode();
    const side = Number(/viewBox="0 0 (\d+)/.exec(markup)?.[1] ?? 100) * 6;
    const c = document.createElement('canvas');
    c.width = side;
    c.height = side;
    const ctx = c.getContext('2d')!;
    ctx.imageSmoothingEnabled = false;
    ctx.drawImage(img, 0, 0, side, side);
    const decode = (window as unknown as { jsQR: (d: Uint8ClampedArray, w: number, h: number) => { data: string } | null }).jsQR;
    return decode(ctx.getImageData(0, 0, side, side).data, side, side)?.data ?? null;
  }, svg);
  await blank.close();
  return text;
}

test.describe('printed record of each demo case', () => {
  for (let i = 0; i < DEMOS; i++) {
    test(`demo ${i + 1} prints to at most 3 pages on A4 and Letter, numbered, cautions on page 1, with a QR code of its link`, async ({ page }) => {
      await page.goto('/#/cases');
      await page.locator('details.demos summary').click();
      const buttons = page.locator('.demo-button');
      await expect(buttons).toHaveCount(DEMOS);
      await buttons.nth(i).click();
      await expect(page).toHaveURL(/#\/(member|results)$/);
      await page.goto('/#/report');
      await expect(page.getByTestId('case-qr')).toBeVisible();
      await expect(page.locator('.report-sheet')).not.toContainText('No results');
      const plate = /Plate panel/.test(await page.locator('.report-meta').innerText());
      const link = (await page.locator('.report-link-text').innerText()).trim();
      expect(link).toMatch(/#\/open\/./);
      await page.emulateMedia({ media: 'print' });

      const qr = page.getByTestId('case-qr');
      await expect(qr).toBeVisible();
      const svg = await qr.evaluate((el) => new XMLSerializer().serializeToString(el));
      const decoded = await decodeQr(page, svg);
      expect(decoded, 'the QR code decodes to the case link printed beside it').toBe(link);

      for (const format of PAPERS) {
        const texts = await pageTexts(await page.pdf({ format }));
        const n = texts.length;
        expect(n, `${format}: pages`).toBeLessThanOrEqual(3);
        texts.forEach((t, p) => expect(t.replace(/\s+/g, ' '), `${format}: number on page ${p + 1}`).toContain(`Page ${p + 1} of ${n}`));
        const first = squash(texts[0]);
        for (const c of cautionsFor(plate ? 'plate' : 'beam')) {
          expect(first, `${format}: caution “${c.title}” on page 1`).toContain(squash(`${c.title} ${c.text}`));
        }
        expect(squash(texts.join(' ')), `${format}: no "from memory" in the record`).not.toContain(squash('from memory'));
      }
    });
  }
});
