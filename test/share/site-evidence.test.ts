/** Site photos and location in a case file: beside the case, checked part by part, never stopping the case. */
import { describe, expect, it } from 'vitest';
import { caseFromFileText, caseToFileText } from '../../src/share';
import { encodeCaseLink } from '../../src/share/link';
import { MAX_FILE_PHOTOS, MAX_PHOTO_DATA_URL_CHARS, readSiteEvidence, type SiteEvidence } from '../../src/share/site-evidence';
import { demoCase } from '../case/fixtures';

const JPEG = 'data:image/jpeg;base64,/9j/4AAQSkZJRgABAQAAAQABAAD/2wBDAAgGBgcGBQgHBwcJCQgKDBQNDAsLDBkSEw8U';
const photo = (n: number) => ({ dataUrl: `${JPEG}${'A'.repeat(n)}`, takenAt: '2026-12-03T09:0' + (n % 10) + ':00Z', widthPx: 1600, heightPx: 1200 });
const evidence = (): SiteEvidence => ({
  photos: [photo(4), photo(8)],
  location: { latitudeDeg: 57.12345, longitudeDeg: -2.54321, accuracyM: 12, at: '2026-12-03T09:00:00Z' },
});
/** A file with the given `siteEvidence` member beside the demo case. */
const fileWith = (siteEvidence: unknown): string => JSON.stringify({ ...demoCase(), siteEvidence });

describe('site evidence in the case file', () => {
  it('a file with photos and a location reads back to the same case and the same evidence', () => {
    const r = caseFromFileText(caseToFileText(demoCase(), evidence()));
    expect(r).toEqual({ ok: true, value: demoCase(), evidence: evidence() });
  });

  it('the evidence is a top-level siteEvidence member beside the case, and a case without evidence gives the file it gave before', () => {
    const withEvidence = JSON.parse(caseToFileText(demoCase(), evidence()));
    expect(withEvidence.siteEvidence.photos).toHaveLength(2);
    expect(caseToFileText(demoCase(), { photos: [], location: null })).toBe(caseToFileText(demoCase()));
    expect('siteEvidence' in JSON.parse(caseToFileText(demoCase()))).toBe(false);
  });

  it('the link of a case read from a file with evidence is the link of the case alone', async () => {
    const r = caseFromFileText(caseToFileText(demoCase(), evidence()));
    if (!r.ok) throw new Error(r.message);
    expect(await encodeCaseLink(r.value, 'https://wetmode.example/')).toBe(await encodeCaseLink(demoCase(), 'https://wetmode.example/'));
  });

  it('a photo that is not a JPEG data URL is dropped with what was expected and got; the case and the other parts still open', () => {
    const r = caseFromFileText(fileWith({ photos: [{ ...photo(4), dataUrl: 'data:image/png;base64,iVBORw0KGgo=' }, photo(8)], location: evidence().location }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value).toEqual(demoCase());
    expect(r.evidence).toEqual({ photos: [photo(8)], location: evidence().location });
    expect(r.evidenceDropped).toEqual(['photo 1 was left out: expected a JPEG data URL (data:image/jpeg;base64,…); got "data:image/png;base64,iVBORw0KGgo="']);
  });

  it('a photo too large, sizes that are not whole pixels, and a latitude out of range are each named', () => {
    const big = { ...photo(0), dataUrl: `${JPEG}${'A'.repeat(MAX_PHOTO_DATA_URL_CHARS)}` };
    const r = readSiteEvidence({ photos: [big, { ...photo(4), widthPx: 12.5 }], location: { ...evidence().location, latitudeDeg: 91 } });
    expect(r.evidence).toEqual({ photos: [], location: null });
    expect(r.dropped).toEqual([
      `photo 1 was left out: expected a photo data URL of at most 700000 characters; got ${MAX_PHOTO_DATA_URL_CHARS + JPEG.length}`,
      'photo 2 was left out: expected widthPx and heightPx to be whole numbers from 1 to 10000; widthPx got 12.5, heightPx got 1200',
      'the location was left out: expected latitudeDeg from −90 to 90; got 91',
    ]);
  });

  it(`more than ${MAX_FILE_PHOTOS} photos keep the first ${MAX_FILE_PHOTOS} and say the rest were left out`, () => {
    const many = Array.from({ length: MAX_FILE_PHOTOS + 2 }, (_, i) => photo(i + 1));
    const r = readSiteEvidence({ photos: many });
    expect(r.evidence.photos).toEqual(many.slice(0, MAX_FILE_PHOTOS));
    expect(r.dropped).toEqual(['photos 13 to 14 were left out: a case file carries at most 12 photos']);
  });

  it('evidence of the wrong shape is dropped whole and the case opens without it', () => {
    const r = caseFromFileText(fileWith('photos'));
    expect(r).toEqual({ ok: true, value: demoCase(), evidenceDropped: ['the site evidence was left out: expected an object with photos and location; got "photos"'] });
    const list = caseFromFileText(fileWith({ photos: { first: JPEG } }));
    expect(list.ok && list.evidenceDropped).toEqual(['the photos were left out: expected a list of photos; got an object']);
  });

  it('a bad case is still refused with its own message when the file also carries evidence', () => {
    const r = caseFromFileText(JSON.stringify({ format: 'spreadsheet', siteEvidence: evidence() }));
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message.startsWith('this file is not a usable Wetmode case:')).toBe(true);
  });
});
