import { test, expect } from '@playwright/test';
import { deflateRawSync } from 'node:zlib';
import { decodeCasePayload, encodeCasePayload } from '../../src/share';
import { fromBase64url } from '../../src/share/base64url';
import { caseToWire } from '../../src/share/wire';
import { demoCase } from '../case/fixtures';
import { int, seeded } from '../case/fuzz-gen';
import { framed } from '../share/frame';

/**
 * One codec: a seeded corpus of mutated links — junk after the deflate stream, bit flips and cuts inside it
 * (re-framed so the checksum passes and the decompressor is reached), white space and percent-encoding — is
 * decoded in Node here and opened in the browser; both must give the same answer for every link.
 */
async function corpus(): Promise<string[]> {
  const rnd = seeded(1718);
  const good = await encodeCasePayload(demoCase());
  const d = fromBase64url(good.slice(1));
  if (!d.ok) throw new Error('payload must decode');
  const body = d.bytes.subarray(7);
  // The same case compressed by zlib instead of CompressionStream: a different stream, the same case.
  const zlibBody = new Uint8Array(deflateRawSync(new TextEncoder().encode(JSON.stringify(caseToWire(demoCase())))));
  const out: string[] = [good, framed('z', zlibBody)];
  for (let k = 0; k < 36; k++) {
    const b = body.slice();
    switch (k % 4) {
      case 0: // junk after the stream
        out.push(framed('z', new Uint8Array([...b, ...Array.from({ length: 1 + int(rnd, 6) }, () => int(rnd, 256))])));
        break;
      case 1: // bits flipped inside the stream
        for (let f = 1 + int(rnd, 2); f > 0; f--) b[int(rnd, b.length)] ^= 1 << int(rnd, 8);
        out.push(framed('z', b));
        break;
      case 2: // the stream cut short
        out.push(framed('z', b.subarray(0, int(rnd, b.length))));
        break;
      default: { // white space and percent-encoding where a mail app or a browser puts them
        const at = 1 + int(rnd, good.length - 2);
        const filler = [' ', '%20', '%0A', '%0D%0A', '\t', '%'][int(rnd, 6)];
        out.push(good.slice(0, at) + filler + good.slice(at));
      }
    }
  }
  return out;
}

test('Node and the browser give the same answer for every link of a mutated corpus', async ({ page }) => {
  test.setTimeout(120_000);
  await page.goto('/#/cases');
  await expect(page.getByRole('heading', { name: 'Cases', exact: true })).toBeVisible();
  let opened = 0;
  for (const link of await corpus()) {
    const node = await decodeCasePayload(link);
    await page.evaluate(() => (location.hash = '#/cases'));
    await expect(page.getByRole('heading', { name: 'Cases', exact: true })).toBeVisible();
    // The browser hands the fragment over percent-encoded, as it would from an address bar.
    await page.evaluate((l) => (location.hash = `#/open/${l}`), link);
    if (node.ok) {
      opened++;
      await expect(page.getByText('Received case — not saved on this device'), link.slice(0, 60)).toBeVisible();
    } else {
      await expect(page.getByRole('heading', { name: 'This link could not be opened' }), link.slice(0, 60)).toBeVisible();
      await expect(page.getByRole('alert')).toContainText(node.message.slice(1));
    }
  }
  // The good link, its zlib twin and the white-space variants open.
  expect(opened).toBeGreaterThanOrEqual(5);
});
