import { describe, expect, it } from 'vitest';
import { parseCase, type Case } from '../../src/case';
import { TRASH_DAYS } from '../../src/store';
import { baffleCase, demoCase } from '../case/fixtures';
import { harness, idNumber, openRaw, rawRecords, req, unwrap } from './helpers';

const NOW = '2026-12-01T12:00:00.000Z';

describe('saving and reading cases', () => {
  it('a new database lists no cases', async () => {
    const store = await harness().open();
    expect(unwrap(await store.listCases())).toEqual({ cases: [], unreadable: [] });
  });

  it('saveCase writes the case with updatedAt = now and this app version, and getCase reads it back', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase()));
    expect(saved).toEqual({ ...demoCase(), updatedAt: NOW, appVersion: '0.2.0' });
    expect(unwrap(await store.getCase(demoCase().id))).toEqual(saved);
  });

  it('saved cases survive closing and reopening the database (a reload)', async () => {
    const h = harness();
    const first = await h.open();
    unwrap(await first.saveCase(demoCase()));
    first.close();
    const again = await h.open();
    expect(unwrap(await again.listCases()).cases.map((c) => c.id)).toEqual([demoCase().id]);
  });

  it('lists the most recently changed first', async () => {
    const h = harness();
    const store = await h.open();
    unwrap(await store.saveCase(demoCase()));
    h.clock.now = new Date('2026-12-02T08:00:00.000Z');
    unwrap(await store.saveCase(baffleCase()));
    expect(unwrap(await store.listCases()).cases.map((c) => c.name)).toEqual(['Baffle 2, day tank', 'Pile B7 — east berth']);
  });

  it('refuses to save a case that does not pass parseCase, and writes nothing', async () => {
    const store = await harness().open();
    const r = await store.saveCase({ ...demoCase(), name: 'x'.repeat(201) });
    expect(r).toEqual({ ok: false, kind: 'invalid-case', message: `Could not save the case: name must be a string of at most 200 characters, got "${'x'.repeat(40)}"… (201 characters)` });
    expect(unwrap(await store.listCases()).cases).toEqual([]);
  });

  it('answers not-found for an unknown id', async () => {
    const store = await harness().open();
    expect(await store.getCase(idNumber(99))).toEqual({
      ok: false,
      kind: 'not-found',
      message: `Could not open the case: no saved case has the id "${idNumber(99)}" (it may have been deleted).`,
    });
  });

  it('finds a case whatever the case of the id letters', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    expect(unwrap(await store.getCase(demoCase().id.toUpperCase())).id).toBe(demoCase().id);
  });
});

describe('duplicate and rename', () => {
  it('duplicateCase makes a copy with a new id, the new name and new times; the original is unchanged', async () => {
    const h = harness('2026-12-03T09:00:00.000Z');
    const store = await h.open();
    const original = unwrap(await store.saveCase(demoCase()));
    const copy = unwrap(await store.duplicateCase(demoCase().id, 'Pile B8'));
    expect(copy).toEqual({ ...original, id: idNumber(1), name: 'Pile B8', createdAt: '2026-12-03T09:00:00.000Z', updatedAt: '2026-12-03T09:00:00.000Z' });
    expect(unwrap(await store.getCase(original.id))).toEqual(original);
    expect(unwrap(await store.listCases()).cases).toHaveLength(2);
  });

  it('renameCase changes the name and updatedAt only', async () => {
    const h = harness();
    const store = await h.open();
    const saved = unwrap(await store.saveCase(demoCase()));
    h.clock.now = new Date('2026-12-05T07:30:00.000Z');
    const renamed = unwrap(await store.renameCase(saved.id, 'Pile B7 (north face)'));
    expect(renamed).toEqual({ ...saved, name: 'Pile B7 (north face)', updatedAt: '2026-12-05T07:30:00.000Z' });
  });

  it('a rename that breaks a limit is refused and the stored case is unchanged', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase()));
    const r = await store.renameCase(saved.id, 'line\nbreak');
    expect(r).toEqual({ ok: false, kind: 'invalid-case', message: 'Could not rename the case: name must be a string on one line, without control characters other than tabs, got "line\\nbreak"' });
    expect(unwrap(await store.getCase(saved.id))).toEqual(saved);
  });

  it('duplicate and rename of an unknown id answer not-found', async () => {
    const store = await harness().open();
    expect(await store.duplicateCase(idNumber(5), 'x')).toMatchObject({ ok: false, kind: 'not-found' });
    expect(await store.renameCase(idNumber(5), 'x')).toMatchObject({ ok: false, kind: 'not-found' });
  });
});

describe('delete with undo', () => {
  it('deleteCase removes the case and undoDelete brings it back exactly', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase()));
    const token = unwrap(await store.deleteCase(saved.id));
    expect(unwrap(await store.listCases()).cases).toEqual([]);
    expect(unwrap(await store.undoDelete(token))).toEqual(saved);
    expect(unwrap(await store.listCases()).cases).toEqual([saved]);
  });

  it('the undo token still works after a reload', async () => {
    const h = harness();
    const first = await h.open();
    unwrap(await first.saveCase(demoCase()));
    const token = unwrap(await first.deleteCase(demoCase().id));
    first.close();
    const again = await h.open();
    expect(unwrap(await again.undoDelete(token))?.id).toBe(demoCase().id);
  });

  it('an undo token works once', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    const token = unwrap(await store.deleteCase(demoCase().id));
    unwrap(await store.undoDelete(token));
    expect(await store.undoDelete(token)).toEqual({
      ok: false,
      kind: 'not-found',
      message: `Could not undo the delete: it is no longer available (already undone, or deleted more than ${TRASH_DAYS} days ago).`,
    });
  });

  it(`deleted cases are purged after ${TRASH_DAYS} days`, async () => {
    const h = harness();
    const store = await h.open();
    unwrap(await store.saveCase(demoCase()));
    unwrap(await store.saveCase(baffleCase()));
    const old = unwrap(await store.deleteCase(demoCase().id));
    h.clock.now = new Date(Date.parse(NOW) + (TRASH_DAYS + 1) * 86_400_000);
    const recent = unwrap(await store.deleteCase(baffleCase().id));
    expect((await store.undoDelete(old)).ok).toBe(false);
    expect(unwrap(await store.undoDelete(recent))?.id).toBe(baffleCase().id);
  });

  it('undo never overwrites: if the id was taken meanwhile, the case comes back as a "(restored)" copy', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase()));
    const token = unwrap(await store.deleteCase(saved.id));
    const received = unwrap(await store.saveReceived({ ...demoCase(), note: 'newer note' }));
    expect(received.status).toBe('saved');
    const restored = unwrap(await store.undoDelete(token));
    expect(restored).toEqual({ ...saved, id: idNumber(2), name: 'Pile B7 — east berth (restored)' });
    expect(unwrap(await store.getCase(saved.id)).note).toBe('newer note');
  });

  it('deleting an unknown id answers not-found and changes nothing', async () => {
    const store = await harness().open();
    unwrap(await store.saveCase(demoCase()));
    expect(await store.deleteCase(idNumber(7))).toMatchObject({ ok: false, kind: 'not-found' });
    expect(unwrap(await store.listCases()).cases).toHaveLength(1);
  });
});

describe('the draft', () => {
  it('is null until one is kept, then loads as kept, across a reload, until cleared', async () => {
    const h = harness();
    const store = await h.open();
    expect(unwrap(await store.loadDraft())).toBeNull();
    const draft: Case = { ...demoCase(), name: '', inputs: { outerDiameter: '61' } };
    const kept = { key: `tab\n${draft.id}`, tab: 'tab', case: draft, savedAt: NOW, baseRevision: null };
    expect(unwrap(await store.saveDraft(draft))).toEqual(kept);
    store.close();
    const again = await h.open();
    expect(unwrap(await again.loadDraft())).toEqual(kept);
    unwrap(await again.clearDraft());
    expect(unwrap(await again.loadDraft())).toBeNull();
  });

  it('keeping a draft does not touch the saved cases', async () => {
    const store = await harness().open();
    unwrap(await store.saveDraft(demoCase()));
    expect(unwrap(await store.listCases()).cases).toEqual([]);
  });

  it('refuses a draft that does not pass parseCase', async () => {
    const store = await harness().open();
    const r = await store.saveDraft({ ...demoCase(), inputs: { length: 24 } } as unknown as Case);
    expect(r).toEqual({ ok: false, kind: 'invalid-case', message: 'Could not keep the draft: inputs.length must be a string such as "610 mm" of at most 200 characters, got 24' });
  });
});

describe('records that cannot be read are reported, never dropped', () => {
  async function withJunk() {
    const h = harness();
    const store = await h.open();
    unwrap(await store.saveCase(demoCase()));
    store.close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    const tx = db.transaction(['cases', 'drafts'], 'readwrite');
    await req(tx.objectStore('cases').put({ id: 'junk-1', name: 42 }));
    await req(tx.objectStore('drafts').put({ key: 'tab\njunk', tab: 'tab', caseId: 'junk', savedAt: NOW, baseRevision: null, case: { format: 'wetmode-case', schemaVersion: 3 } }));
    db.close();
    return { h, store: await h.open() };
  }

  it('the list holds the readable cases and names the unreadable record with its reason', async () => {
    const { store } = await withJunk();
    const list = unwrap(await store.listCases());
    expect(list.cases.map((c) => c.id)).toEqual([demoCase().id]);
    expect(list.unreadable).toEqual([{ key: 'junk-1', message: 'This saved case cannot be read: format must be "wetmode-case" (this is not a Wetmode case), got nothing' }]);
  });

  it('opening it gives an unreadable error; deleting and undoing gives it back untouched', async () => {
    const { h, store } = await withJunk();
    expect(await store.getCase('junk-1')).toEqual({
      ok: false,
      kind: 'unreadable',
      message: 'Could not open the case: the saved case "junk-1" cannot be read (format must be "wetmode-case" (this is not a Wetmode case), got nothing).',
    });
    const token = unwrap(await store.deleteCase('junk-1'));
    expect(unwrap(await store.listCases()).unreadable).toEqual([]);
    expect(unwrap(await store.undoDelete(token))).toBeNull();
    store.close();
    const raw = await rawRecords(h.factory, 'cases');
    expect(raw.values).toContainEqual({ id: 'junk-1', name: 42 });
  });

  it('an unreadable draft is set aside: never loaded as the tab draft, listed with its reason, and can be discarded', async () => {
    const { store } = await withJunk();
    expect(unwrap(await store.loadDraft())).toBeNull();
    expect(unwrap(await store.listDrafts())).toEqual({
      drafts: [],
      unreadable: [{ key: 'tab\njunk', tab: 'tab', message: 'this kept draft cannot be read (id must be a UUID such as "3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81", got nothing)' }],
    });
    unwrap(await store.discardDraft('tab\njunk'));
    expect(unwrap(await store.listDrafts()).unreadable).toEqual([]);
  });

  it('every case the list returns passes parseCase', async () => {
    const { store } = await withJunk();
    for (const c of unwrap(await store.listCases()).cases) expect(parseCase(c)).toEqual({ ok: true, value: c });
  });
});
