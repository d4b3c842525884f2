/** Site photos and location kept on the device per case, in their own small database; downscaling sizes. */
import { describe, expect, it } from 'vitest';
import { IDBFactory } from 'fake-indexeddb';
import 'fake-indexeddb/auto';
import { addPhoto, deletePhoto, locationOf, photosOf, setLocation } from '../../src/attachments/photo-store';
import { fitWithin } from '../../src/attachments/downscale';

const photo = (id: string, caseId: string, takenAt: string) => ({ id, caseId, takenAt, dataUrl: 'data:image/jpeg;base64,AAAA', widthPx: 4, heightPx: 3 });

describe('site evidence on the device', () => {
  it('keeps photos per case, oldest first, and removes one', async () => {
    const f = new IDBFactory();
    expect((await addPhoto(photo('b', 'case-1', '2026-12-03T09:02:00Z'), f)).ok).toBe(true);
    await addPhoto(photo('a', 'case-1', '2026-12-03T09:01:00Z'), f);
    await addPhoto(photo('c', 'case-2', '2026-12-03T09:00:00Z'), f);
    const one = await photosOf('case-1', f);
    expect(one.ok && one.value.map((p) => p.id)).toEqual(['a', 'b']);
    await deletePhoto('a', f);
    const after = await photosOf('case-1', f);
    expect(after.ok && after.value.map((p) => p.id)).toEqual(['b']);
  });

  it('keeps one location per case, the latest', async () => {
    const f = new IDBFactory();
    expect(await locationOf('case-1', f)).toEqual({ ok: true, value: null });
    await setLocation({ caseId: 'case-1', latitudeDeg: 57.1, longitudeDeg: -2.1, accuracyM: 12, at: '2026-12-03T09:00:00Z' }, f);
    await setLocation({ caseId: 'case-1', latitudeDeg: 57.2, longitudeDeg: -2.2, accuracyM: 8, at: '2026-12-03T09:05:00Z' }, f);
    const l = await locationOf('case-1', f);
    expect(l.ok && l.value?.latitudeDeg).toBe(57.2);
  });

  it('a 4032 × 3024 photo is drawn at 1600 × 1200, and a small one is left as it is', () => {
    expect(fitWithin(4032, 3024)).toEqual({ w: 1600, h: 1200 });
    expect(fitWithin(3024, 4032)).toEqual({ w: 1200, h: 1600 });
    expect(fitWithin(800, 600)).toEqual({ w: 800, h: 600 });
  });
});
