/**
 * The database ladder, from every past version. Each past layout is built here by hand with plain IndexedDB —
 * independently of src/store/db-schema.ts — filled with data as that version wrote it, then opened with the
 * current code; the data must all be there, readable or reported, and nothing dropped.
 */
import { describe, expect, it } from 'vitest';
import type { IDBFactory } from 'fake-indexeddb';
import { DB_VERSION, revisionOf } from '../../src/store';
import { demoCase, v0Case } from '../case/fixtures';
import { harness, openRaw, openV1Layout, rawRecords, req, unwrap } from './helpers';

interface PastLayout {
  /** Builds the database as that version's app left it. */
  build(factory: IDBFactory): Promise<void>;
  /** Checks it after opening with the current code. */
  check(h: ReturnType<typeof harness>): Promise<void>;
}

const junk = { id: 'junk-7', title: 'half-written record' };

/** Database version 1 (pre-release): `cases` (keyPath id) with schema-0 and -1 cases, `draft` with a bare case. */
const v1: PastLayout = {
  async build(factory) {
    const db = await openV1Layout(factory);
    const tx = db.transaction(['cases', 'draft'], 'readwrite');
    await req(tx.objectStore('cases').put(v0Case()));
    await req(tx.objectStore('cases').put(demoCase()));
    await req(tx.objectStore('cases').put(junk));
    await req(tx.objectStore('draft').put({ ...v0Case(), title: 'Draft probe' }, 'current'));
    db.close();
  },
  async check(h) {
    const store = await h.open();
    const list = unwrap(await store.listCases());
    const migratedId = (v0Case().id as string).toLowerCase();
    expect(list.cases.map((c) => c.id).sort()).toEqual([demoCase().id, migratedId].sort());
    expect(list.cases.find((c) => c.id === demoCase().id)).toEqual(demoCase());
    expect(list.cases.find((c) => c.id === migratedId)).toMatchObject({ schemaVersion: 3, name: 'Level probe, settling tank', kind: 'stem', unitSystem: 'us' });
    expect(list.unreadable.map((u) => u.key)).toEqual(['junk-7']);
    // The one draft of old versions is kept for the tab "earlier" (offered in the Cases screen, not this tab's own).
    expect(unwrap(await store.loadDraft())).toBeNull();
    const drafts = unwrap(await store.listDrafts());
    expect(drafts.drafts).toHaveLength(1);
    expect(drafts.drafts[0]).toMatchObject({ tab: 'earlier', savedAt: '2025-11-20T08:30:00Z', baseRevision: 0, case: { name: 'Draft probe', kind: 'stem' } });
    // Undo works on the upgraded database (the step added its store).
    const token = unwrap(await store.deleteCase(demoCase().id));
    expect(unwrap(await store.undoDelete(token))?.id).toBe(demoCase().id);
    store.close();
    // On disk: the old record was rewritten at the current case schema under the lower-case key; the unreadable one kept as it was.
    const raw = await rawRecords(h.factory, 'cases');
    expect(raw.keys).not.toContain(v0Case().id);
    expect(raw.values).toContainEqual(junk);
    expect(raw.values.find((v) => (v as { id: string }).id === migratedId)).toMatchObject({ schemaVersion: 3 });
  },
};

/** Database version 2: `cases`, `draft` (one `{ savedAt, case }` under "current"), `trash` (keyPath token). */
function openV2Layout(factory: IDBFactory): Promise<IDBDatabase> {
  return openRaw(factory, 'wetmode', 2, (d) => {
    d.createObjectStore('cases', { keyPath: 'id' });
    d.createObjectStore('draft');
    d.createObjectStore('trash', { keyPath: 'token' });
  });
}

const v2TrashEntry = { token: 'tok-1', deletedAt: '2026-11-30T10:00:00.000Z', record: { ...demoCase(), id: '00000000-0000-4000-8000-0000000000aa', name: 'Deleted pile' } };

const v2: PastLayout = {
  async build(factory) {
    const db = await openV2Layout(factory);
    const tx = db.transaction(['cases', 'draft', 'trash'], 'readwrite');
    await req(tx.objectStore('cases').put(demoCase()));
    await req(tx.objectStore('cases').put(junk));
    await req(tx.objectStore('draft').put({ savedAt: '2026-11-30T09:00:00.000Z', case: { ...demoCase(), name: 'Unsaved rename' } }, 'current'));
    await req(tx.objectStore('trash').put(v2TrashEntry));
    db.close();
  },
  async check(h) {
    const store = await h.open();
    const list = unwrap(await store.listCases());
    expect(list.cases).toEqual([demoCase()]);
    // A record written before revisions counts as revision 0; saving it based on 0 is no conflict.
    expect(revisionOf(list.cases[0])).toBe(0);
    expect(list.unreadable.map((u) => u.key)).toEqual(['junk-7']);
    const drafts = unwrap(await store.listDrafts());
    expect(drafts.drafts.map((d) => [d.tab, d.case.name, d.savedAt, d.baseRevision])).toEqual([['earlier', 'Unsaved rename', '2026-11-30T09:00:00.000Z', 0]]);
    // The closed tab's draft can be taken over by a tab, and is then its own.
    const adopted = unwrap(await store.adoptDraft(drafts.drafts[0].key));
    expect(unwrap(await store.loadDraft())).toEqual(adopted);
    // Saved from the revision it started at: no conflict.
    expect(unwrap(await store.saveCase(adopted.case, { baseRevision: adopted.baseRevision })).name).toBe('Unsaved rename');
    // The trash came through: undo still works.
    expect(unwrap(await store.undoDelete('tok-1'))?.name).toBe('Deleted pile');
    store.close();
    expect((await rawRecords(h.factory, 'cases')).values).toContainEqual(junk);
  },
};

/** Database version 3: `cases` (with `revision`), `drafts` (keyPath key, by tab and case), `trash`. */
function openV3Layout(factory: IDBFactory): Promise<IDBDatabase> {
  return openRaw(factory, 'wetmode', 3, (d) => {
    d.createObjectStore('cases', { keyPath: 'id' });
    d.createObjectStore('drafts', { keyPath: 'key' });
    d.createObjectStore('trash', { keyPath: 'token' });
  });
}

const v3Second = { ...demoCase(), id: '00000000-0000-4000-8000-0000000000b9', name: 'Pile 9', tag: '', updatedAt: '2020-01-01T00:00:00.000Z', revision: 2 };
const v3Draft = { key: 'tab-a\n' + demoCase().id, tab: 'tab-a', caseId: demoCase().id, savedAt: '2026-12-01T09:00:00.000Z', baseRevision: 4, case: { ...demoCase(), name: 'Edited in tab a' } };

const v3: PastLayout = {
  async build(factory) {
    const db = await openV3Layout(factory);
    const tx = db.transaction(['cases', 'drafts', 'trash'], 'readwrite');
    await req(tx.objectStore('cases').put({ ...demoCase(), revision: 4 }));
    await req(tx.objectStore('cases').put(v3Second));
    await req(tx.objectStore('cases').put(junk));
    await req(tx.objectStore('drafts').put(v3Draft));
    await req(tx.objectStore('trash').put(v2TrashEntry));
    db.close();
  },
  async check(h) {
    const store = await h.open();
    // The step built one list row per readable case, with its revision, and reported the unreadable record.
    const byName = unwrap(await store.listRows('name'));
    expect(byName.rows.map((r) => [r.name, r.revision])).toEqual([['Pile 9', 2], [demoCase().name, 4]]);
    expect(byName.unreadable.map((u) => u.key)).toEqual(['junk-7']);
    expect(unwrap(await store.listRows('updated')).rows.map((r) => r.id)).toEqual([demoCase().id, v3Second.id]);
    // The cases themselves and the drafts are as they were.
    const list = unwrap(await store.listCases());
    expect(list.cases.find((c) => c.id === demoCase().id)).toEqual(demoCase());
    expect(revisionOf(list.cases.find((c) => c.id === demoCase().id)!)).toBe(4);
    expect(unwrap(await store.listDrafts()).drafts.map((d) => [d.tab, d.case.name, d.baseRevision])).toEqual([['tab-a', 'Edited in tab a', 4]]);
    // Undo of a deletion made under version 3 puts its row back in the list.
    expect(unwrap(await store.undoDelete('tok-1'))?.name).toBe('Deleted pile');
    expect(unwrap(await store.listRows('name')).rows.map((r) => r.name)).toEqual(['Deleted pile', 'Pile 9', demoCase().name]);
    store.close();
    expect((await rawRecords(h.factory, 'cases')).values).toContainEqual(junk);
  },
};

/** One entry per past database version: adding a version to the ladder without a fixture here fails the first test. */
const PAST: Record<number, PastLayout> = { 1: v1, 2: v2, 3: v3 };

describe('database migration ladder', () => {
  it('has a hand-built fixture for every past version', () => {
    expect(Object.keys(PAST).map(Number)).toEqual(Array.from({ length: DB_VERSION - 1 }, (_, i) => i + 1));
  });

  it('a fresh install creates the current layout', async () => {
    const h = harness();
    (await h.open()).close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    expect([db.version, [...db.objectStoreNames].sort()]).toEqual([DB_VERSION, ['cases', 'drafts', 'list', 'trash']]);
    db.close();
  });

  for (const [version, layout] of Object.entries(PAST)) {
    it(`upgrades a version ${version} database with all its data intact`, async () => {
      const h = harness();
      await layout.build(h.factory);
      await layout.check(h);
    });
  }

  it('opening an up-to-date database again changes nothing', async () => {
    const h = harness();
    await v1.build(h.factory);
    (await h.open()).close();
    const before = await rawRecords(h.factory, 'cases');
    (await h.open()).close();
    expect(await rawRecords(h.factory, 'cases')).toEqual(before);
  });
});
