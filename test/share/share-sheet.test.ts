import { describe, expect, it } from 'vitest';
import { copyText, shareLink } from '../../src/share';

const data = { url: 'https://wetmode.example/#/open/zAAA', title: 'Pile B7' };
const abort = Object.assign(new Error('closed'), { name: 'AbortError' });

describe('share sheet and clipboard', () => {
  it('share answers shared, cancelled, failed or unsupported', async () => {
    expect(await shareLink(data, { share: async () => undefined })).toBe('shared');
    expect(await shareLink(data, { share: async () => Promise.reject(abort) })).toBe('cancelled');
    expect(await shareLink(data, { share: async () => Promise.reject(new Error('NotAllowedError')) })).toBe('failed');
    expect(await shareLink(data, { share: async () => undefined, canShare: () => false })).toBe('unsupported');
    expect(await shareLink(data, {})).toBe('unsupported');
    expect(await shareLink(data, undefined)).toBe('unsupported');
  });

  it('copy answers copied, failed or unsupported, and copies the exact text', async () => {
    let got = '';
    expect(await copyText('link', { clipboard: { writeText: async (t) => void (got = t) } })).toBe('copied');
    expect(got).toBe('link');
    expect(await copyText('link', { clipboard: { writeText: async () => Promise.reject(new Error('denied')) } })).toBe('failed');
    expect(await copyText('link', {})).toBe('unsupported');
  });
});
