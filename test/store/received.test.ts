import { describe, expect, it } from 'vitest';
import { CASE_LIMITS, type Case } from '../../src/case';
import { decodeCasePayload, encodeCasePayload } from '../../src/share';
import { receivedName } from '../../src/store/received-ops';
import { demoCase } from '../case/fixtures';
import { harness, idNumber, openRaw, req, unwrap } from './helpers';

const NOW = '2026-12-01T12:00:00.000Z';

async function received(c: Case): Promise<Case> {
  const r = await decodeCasePayload(await encodeCasePayload(c));
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe('findSameCase', () => {
  it('answers new, same or changed', async () => {
    const store = await harness().open();
    expect(unwrap(await store.findSameCase(demoCase()))).toEqual({ status: 'new' });
    const saved = unwrap(await store.saveCase(demoCase()));
    // Through a link: times and key result differ from what is stored, content does not.
    expect(unwrap(await store.findSameCase(await received(demoCase())))).toEqual({ status: 'same', saved });
    const changed = { ...demoCase(), inputs: { ...demoCase().inputs, length: '26 m' } };
    expect(unwrap(await store.findSameCase(changed))).toEqual({ status: 'changed', saved });
  });

  it('treats a stored record it cannot read as changed, so nothing is overwritten', async () => {
    const h = harness();
    (await h.open()).close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    await req(db.transaction('cases', 'readwrite').objectStore('cases').put({ id: demoCase().id, broken: true }));
    db.close();
    const store = await h.open();
    expect(unwrap(await store.findSameCase(demoCase()))).toEqual({ status: 'changed', saved: null });
    const out = unwrap(await store.saveReceived(demoCase()));
    expect(out.status).toBe('saved-copy');
    expect(unwrap(await store.listCases()).unreadable.map((u) => u.key)).toEqual([demoCase().id]);
  });
});

describe('saveReceived never overwrites', () => {
  it('the same changed link received twice is recognised the second time as the copy already saved', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    const changed = await received({ ...demoCase(), note: 'Re-measured wall thickness.' });
    const first = unwrap(await store.saveReceived(changed));
    expect(first.status).toBe('saved-copy');
    const second = unwrap(await store.saveReceived(await received({ ...demoCase(), note: 'Re-measured wall thickness.' })));
    expect(second).toEqual({ status: 'same', case: first.case });
    expect(unwrap(await store.listCases()).cases).toHaveLength(2);
  });

  it('a changed copy of a case whose long name ends in emoji is saved whole, never with half an emoji', async () => {
    const store = await harness().open();
    // The copy's name is cut to make room for " (received 2026-12-01)" (22 characters): put an emoji across the cut.
    const cut = CASE_LIMITS.nameChars - ' (received 2026-12-01)'.length;
    const name = 'x'.repeat(cut - 1) + '\u{1F30A}' + 'y'.repeat(CASE_LIMITS.nameChars - cut - 1);
    const base = { ...demoCase(), name };
    unwrap(await store.saveCase(base));
    const changed = await received({ ...base, note: 'changed on site' });
    const out = unwrap(await store.saveReceived(changed));
    expect(out.status).toBe('saved-copy');
    expect(out.case.name.length).toBeLessThanOrEqual(CASE_LIMITS.nameChars);
    expect(out.case.name).not.toMatch(/[\uD800-\uDBFF](?![\uDC00-\uDFFF])/); // no lone high surrogate
  });

  it('a case not saved before is saved under its own id, timed now', async () => {
    const store = await harness().open();
    const incoming = await received(demoCase());
    const out = unwrap(await store.saveReceived(incoming));
    expect(out).toEqual({ status: 'saved', case: { ...incoming, updatedAt: NOW, appVersion: '0.2.0' } });
    expect(unwrap(await store.getCase(incoming.id))).toEqual(out.case);
  });

  it('the same case unchanged: says so and writes nothing', async () => {
    const h = harness();
    const store = await h.open();
    const saved = unwrap(await store.saveCase(demoCase()));
    h.clock.now = new Date('2026-12-09T10:00:00.000Z');
    expect(unwrap(await store.saveReceived(await received(demoCase())))).toEqual({ status: 'same', case: saved });
    expect(unwrap(await store.listCases()).cases).toEqual([saved]);
  });

  it('a changed case is saved as a copy with a new id and a "(received <date>)" name; the saved one is untouched', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase()));
    const changed = await received({ ...demoCase(), note: 'Re-measured wall thickness.', inputs: { ...demoCase().inputs, wallThickness: '14 mm' } });
    const out = unwrap(await store.saveReceived(changed));
    expect(out).toEqual({
      status: 'saved-copy',
      case: { ...changed, id: idNumber(1), name: 'Pile B7 — east berth (received 2026-12-01)', createdAt: NOW, updatedAt: NOW, appVersion: '0.2.0' },
    });
    expect(unwrap(await store.getCase(saved.id))).toEqual(saved);
  });

  it('a second changed version the same day gets its own name', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    const a = unwrap(await store.saveReceived({ ...demoCase(), note: 'a' }));
    const b = unwrap(await store.saveReceived({ ...demoCase(), note: 'b' }));
    expect([a.case.name, b.case.name]).toEqual(['Pile B7 — east berth (received 2026-12-01)', 'Pile B7 — east berth (received 2026-12-01, 2)']);
    expect(unwrap(await store.listCases()).cases).toHaveLength(3);
  });

  it('refuses a case that does not pass parseCase, and writes nothing', async () => {
    const store = await harness().open();
    const r = await store.saveReceived({ ...demoCase(), kind: 'mast' } as unknown as Case);
    expect(r).toEqual({ ok: false, kind: 'invalid-case', message: 'Could not save the received case: kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "mast"' });
    expect(unwrap(await store.listCases()).cases).toEqual([]);
  });
});

describe('receivedName', () => {
  it('adds the date, then a number when taken', () => {
    expect(receivedName('Pile', '2026-12-01', new Set())).toBe('Pile (received 2026-12-01)');
    expect(receivedName('Pile', '2026-12-01', new Set(['Pile (received 2026-12-01)', 'Pile (received 2026-12-01, 2)']))).toBe('Pile (received 2026-12-01, 3)');
  });
  it('names an unnamed case "Case" and shortens a long name to stay within the limit', () => {
    expect(receivedName('', '2026-12-01', new Set())).toBe('Case (received 2026-12-01)');
    const long = receivedName('n'.repeat(CASE_LIMITS.nameChars), '2026-12-01', new Set());
    expect(long.length).toBe(CASE_LIMITS.nameChars);
    expect(long.endsWith(' (received 2026-12-01)')).toBe(true);
  });
});
