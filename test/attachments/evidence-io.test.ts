/** Site evidence from the device into a case file and back into another device's store, never overwriting. */
import { describe, expect, it } from 'vitest';
import { IDBFactory } from 'fake-indexeddb';
import 'fake-indexeddb/auto';
import { addPhoto, locationOf, photosOf, setLocation } from '../../src/attachments/photo-store';
import { evidenceOf, restoreEvidence, restoredText } from '../../src/attachments/evidence-io';
import { caseFromFileText, caseToFileText } from '../../src/share';
import { demoCase } from '../case/fixtures';

const JPEG = 'data:image/jpeg;base64,/9j/4AAQSkZJRgABAQ';
const at = (m: number) => `2026-12-03T09:0${m}:00Z`;
const where = { latitudeDeg: 57.1, longitudeDeg: -2.1, accuracyM: 12, at: at(0) };

describe('site evidence through a case file', () => {
  it('photos and location kept for a case go into its file and come back under the same case id on another device', async () => {
    const here = new IDBFactory();
    const c = demoCase();
    await addPhoto({ id: 'p1', caseId: c.id, dataUrl: `${JPEG}AAAA`, takenAt: at(1), widthPx: 4, heightPx: 3 }, here);
    await addPhoto({ id: 'p2', caseId: c.id, dataUrl: `${JPEG}BBBB`, takenAt: at(2), widthPx: 3, heightPx: 4 }, here);
    await addPhoto({ id: 'p3', caseId: 'another-case', dataUrl: `${JPEG}CCCC`, takenAt: at(3), widthPx: 3, heightPx: 4 }, here);
    await setLocation({ caseId: c.id, ...where }, here);
    const e = await evidenceOf(c.id, here);
    if (!e.ok) throw new Error(e.message);
    const file = caseFromFileText(caseToFileText(c, e.value));
    if (!file.ok || !file.evidence) throw new Error('no evidence read');

    const there = new IDBFactory();
    const r = await restoreEvidence(file.value.id, file.evidence, there);
    expect(r).toEqual({ ok: true, value: { photosAdded: 2, photosAlreadyKept: 0, locationSet: true, locationKept: false } });
    const photos = await photosOf(c.id, there);
    expect(photos.ok && photos.value.map((p) => [p.dataUrl, p.takenAt, p.widthPx, p.heightPx])).toEqual([
      [`${JPEG}AAAA`, at(1), 4, 3],
      [`${JPEG}BBBB`, at(2), 3, 4],
    ]);
    expect(await locationOf(c.id, there)).toEqual({ ok: true, value: { caseId: c.id, ...where } });
    expect(restoredText(r.ok ? r.value : (null as never), [])).toBe('2 site photos kept on this device with the case; the site location kept.');
  });

  it('importing again adds no copies, and a location already kept on the device is left as it was', async () => {
    const f = new IDBFactory();
    const c = demoCase();
    await addPhoto({ id: 'mine', caseId: c.id, dataUrl: `${JPEG}AAAA`, takenAt: at(1), widthPx: 4, heightPx: 3 }, f);
    const mine = { caseId: c.id, latitudeDeg: 10, longitudeDeg: 20, accuracyM: 5, at: at(5) };
    await setLocation(mine, f);
    const incoming = { photos: [{ dataUrl: `${JPEG}AAAA`, takenAt: at(1), widthPx: 4, heightPx: 3 }, { dataUrl: `${JPEG}DDDD`, takenAt: at(4), widthPx: 4, heightPx: 3 }], location: where };
    const r = await restoreEvidence(c.id, incoming, f);
    expect(r).toEqual({ ok: true, value: { photosAdded: 1, photosAlreadyKept: 1, locationSet: false, locationKept: true } });
    const photos = await photosOf(c.id, f);
    expect(photos.ok && photos.value.map((p) => p.id).includes('mine')).toBe(true);
    expect(photos.ok && photos.value.length).toBe(2);
    expect(await locationOf(c.id, f)).toEqual({ ok: true, value: mine });
    expect(restoredText(r.ok ? r.value : (null as never), ['photo 3 was left out: expected a JPEG data URL (data:image/jpeg;base64,…); got "x"'])).toBe(
      '1 site photo kept on this device with the case; 1 photo was already kept; the location already kept on this device was left as it was. From the site evidence, photo 3 was left out: expected a JPEG data URL (data:image/jpeg;base64,…); got "x".',
    );
  });
});
