/**
 * The light saved list (database version 4, store `list`): rows in the database's index order, kept in step with
 * every write, searched without reading full cases. The orders are cross-checked against `sortCases` and
 * `searchCases`, which work on full cases in memory.
 */
import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case';
import { searchCases, searchSummaries, sortCases, type CaseSort } from '../../src/store';
import { baffleCase, demoCase } from '../case/fixtures';
import { harness, idNumber, openRaw, req, unwrap } from './helpers';

const cases: Case[] = [
  demoCase(),
  baffleCase(),
  { ...demoCase(), id: idNumber(110), name: 'Pile 10', tag: '', note: '' },
  { ...demoCase(), id: idNumber(109), name: 'Pile 9', tag: 'A-1', note: 'Übergang zone' },
  { ...demoCase(), id: idNumber(111), name: '', tag: 'Z-9', note: '' },
];

async function filled() {
  const h = harness();
  const store = await h.open();
  // One minute apart, so "last change" has one answer.
  for (const [i, c] of cases.entries()) {
    h.clock.now = new Date(Date.parse('2026-12-01T12:00:00.000Z') + i * 60_000);
    unwrap(await store.saveCase(c));
  }
  return { h, store };
}

describe('the saved list from the list store', () => {
  it('gives the same order for every sort as sorting the full cases in memory (cross-check)', async () => {
    const { store } = await filled();
    const full = unwrap(await store.listCases()).cases;
    for (const sort of ['updated', 'name', 'tag', 'kind'] as CaseSort[]) {
      const rows = unwrap(await store.listRows(sort)).rows;
      expect(rows.map((r) => r.id), sort).toEqual(sortCases(full, sort).map((c) => c.id));
    }
    // Natural order by name, the unnamed case last.
    expect(unwrap(await store.listRows('name')).rows.map((r) => r.name)).toEqual(['Baffle 2, day tank', 'Pile 9', 'Pile 10', 'Pile B7 — east berth', '']);
  });

  it('with a limit, reads only the first rows of the order and says how many there are in all', async () => {
    const { store } = await filled();
    const page = unwrap(await store.listRows('name', 2));
    expect([page.rows.map((r) => r.name), page.total, page.complete]).toEqual([['Baffle 2, day tank', 'Pile 9'], 5, false]);
    const whole = unwrap(await store.listRows('name'));
    expect([whole.rows.length, whole.total, whole.complete]).toEqual([5, 5, true]);
  });

  it('finds by every word of the search text, ignoring case and accents, as searchCases does (cross-check)', async () => {
    const { store } = await filled();
    const rows = unwrap(await store.listRows('updated')).rows;
    const full = unwrap(await store.listCases()).cases;
    for (const q of ['berth b7', 'UBERGANG', 'tank', 'grv-tk', 'pile', '  ', 'riser']) {
      expect(searchSummaries(rows, q).map((r) => r.id).sort(), q).toEqual(searchCases(full, q).map((c) => c.id).sort());
    }
  });

  it('follows every change: save, rename, duplicate, delete and undo, received copies', async () => {
    const { h, store } = await filled();
    const names = async () => unwrap(await store.listRows('name')).rows.map((r) => r.name);
    unwrap(await store.renameCase(demoCase().id, 'Pile 11'));
    expect(await names()).toEqual(['Baffle 2, day tank', 'Pile 9', 'Pile 10', 'Pile 11', '']);
    const copy = unwrap(await store.duplicateCase(baffleCase().id, 'Baffle 3'));
    expect(await names()).toContain('Baffle 3');
    const token = unwrap(await store.deleteCase(copy.id));
    expect(await names()).not.toContain('Baffle 3');
    unwrap(await store.undoDelete(token));
    expect(await names()).toContain('Baffle 3');
    const received = unwrap(await store.saveReceived({ ...demoCase(), note: 'changed elsewhere' }));
    expect(received.status).toBe('saved-copy');
    expect(await names()).toContain(received.case.name);
    const row = unwrap(await store.listRows('updated')).rows.find((r) => r.id === received.case.id);
    expect([row?.name, row?.revision, row?.keyResult]).toEqual([received.case.name, 1, received.case.keyResult]);
    expect(h.ids).toContain(received.case.id);
  });

  it('a record written behind the store is listed too: the list is rebuilt, an unreadable one reported', async () => {
    const { h, store } = await filled();
    store.close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    const tx = db.transaction(['cases'], 'readwrite');
    await req(tx.objectStore('cases').put({ ...demoCase(), id: idNumber(120), name: 'Written behind' }));
    await req(tx.objectStore('cases').put({ id: 'junk-1', name: 42 }));
    db.close();
    const again = await h.open();
    const listed = unwrap(await again.listRows('name'));
    expect(listed.rows.map((r) => r.name)).toContain('Written behind');
    expect(listed.unreadable.map((u) => u.key)).toEqual(['junk-1']);
    // Deleting the unreadable record removes it from the list as well.
    unwrap(await again.deleteCase('junk-1'));
    expect(unwrap(await again.listRows('name')).unreadable).toEqual([]);
  });

  it('reads a list longer than one chunk whole and in order, even when 600 cases (more than a chunk) share one sort key', async () => {
    const h = harness();
    (await h.open()).close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    const tx = db.transaction(['cases'], 'readwrite');
    const same = '2026-05-01T00:00:00.000Z';
    for (let i = 0; i < 1100; i++) {
      const name = i < 600 ? 'Same name' : `Pile ${i}`;
      tx.objectStore('cases').put({ ...demoCase(), id: idNumber(1000 + i), name, updatedAt: i < 600 ? same : demoCase().updatedAt, revision: 1 });
    }
    await new Promise((resolve) => (tx.oncomplete = resolve));
    db.close();
    const store = await h.open();
    const byName = unwrap(await store.listRows('name')).rows;
    expect(byName).toHaveLength(1100);
    expect(new Set(byName.map((r) => r.id)).size).toBe(1100);
    // Cross-check against sorting the full cases in memory (ties in any order: compare the names).
    const full = unwrap(await store.listCases()).cases;
    expect(byName.map((r) => r.name)).toEqual(sortCases(full, 'name').map((c) => c.name));
    expect(unwrap(await store.listRows('updated')).rows).toHaveLength(1100);
  });
});
