/**
 * Nothing lost across tabs: saves carry a revision and a save over a newer one is refused as a conflict; drafts
 * are kept per tab and case; other tabs are told of saves and deletes.
 */
import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case';
import { revisionOf, type StoreChange } from '../../src/store';
import { demoCase } from '../case/fixtures';
import { harness, idNumber, unwrap } from './helpers';

describe('saves carry a revision', () => {
  it('a new case is revision 1 and each save, rename or restore adds one', async () => {
    const store = await harness().open();
    const first = unwrap(await store.saveCase(demoCase(), { baseRevision: null }));
    expect(revisionOf(first)).toBe(1);
    const second = unwrap(await store.saveCase({ ...first, note: 'checked' }, { baseRevision: 1 }));
    expect(revisionOf(second)).toBe(2);
    expect(revisionOf(unwrap(await store.renameCase(first.id, 'Pile P7')))).toBe(3);
    expect(revisionOf(unwrap(await store.getCase(first.id)))).toBe(3);
    expect(revisionOf(unwrap(await store.listCases()).cases[0])).toBe(3);
    const token = unwrap(await store.deleteCase(first.id));
    expect(revisionOf(unwrap(await store.undoDelete(token))!)).toBe(4);
  });

  it('two tabs save the same case: the second save is refused with the version of the first, never written over', async () => {
    const h = harness();
    const tabA = await h.open({ tabId: 'A' });
    const tabB = await h.open({ tabId: 'B' });
    const saved = unwrap(await tabA.saveCase(demoCase(), { baseRevision: null }));
    // Both tabs open revision 1; A renames and thickens the wall and saves; B changes the note and saves.
    const a: Case = { ...saved, name: 'Renamed in A', inputs: { ...saved.inputs, wallThickness: '20 mm' } };
    const b: Case = { ...saved, note: 'note from B' };
    unwrap(await tabA.saveCase(a, { baseRevision: 1 }));
    const r = await tabB.saveCase(b, { baseRevision: 1 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.kind).toBe('conflict');
    expect(r.message).toMatch(/saved in another tab or window since you opened it/);
    expect(r.theirs?.revision).toBe(2);
    expect(r.theirs?.case).toMatchObject({ name: 'Renamed in A', inputs: { wallThickness: '20 mm' } });
    // Nothing was overwritten.
    expect(unwrap(await tabB.getCase(saved.id))).toMatchObject({ name: 'Renamed in A', note: saved.note });
    // "Keep mine" overwrites on purpose (no base); "keep both" saves a copy under a new id.
    expect(revisionOf(unwrap(await tabB.saveCase(b)))).toBe(3);
  });

  it('a case never saved here, saved meanwhile by another tab, is a conflict too', async () => {
    const h = harness();
    const tabA = await h.open({ tabId: 'A' });
    unwrap(await tabA.saveCase(demoCase(), { baseRevision: null }));
    expect(await tabA.saveCase({ ...demoCase(), note: 'x' }, { baseRevision: null })).toMatchObject({ ok: false, kind: 'conflict' });
  });

  it('a case deleted elsewhere is saved again (nothing is overwritten)', async () => {
    const store = await harness().open();
    const saved = unwrap(await store.saveCase(demoCase(), { baseRevision: null }));
    unwrap(await store.deleteCase(saved.id));
    expect(revisionOf(unwrap(await store.saveCase(saved, { baseRevision: 1 })))).toBe(1);
  });
});

describe('drafts by tab and case', () => {
  it('each tab keeps its own draft; one tab closing does not replace the draft of another', async () => {
    const h = harness();
    const tabA = await h.open({ tabId: 'A' });
    const tabB = await h.open({ tabId: 'B' });
    unwrap(await tabA.saveDraft({ ...demoCase(), name: 'A edit' }, 1));
    unwrap(await tabB.saveDraft({ ...demoCase(), name: 'B rename' }, 1));
    tabA.close();
    expect(unwrap(await tabB.loadDraft())?.case.name).toBe('B rename');
    const reopenedA = await h.open({ tabId: 'A' });
    expect(unwrap(await reopenedA.loadDraft())).toMatchObject({ tab: 'A', baseRevision: 1, case: { name: 'A edit' } });
  });

  it('a tab keeps one draft: moving on to another case sets the earlier unsaved draft aside, and drops one already saved', async () => {
    const h = harness();
    const store = await h.open({ tabId: 'A' });
    unwrap(await store.saveDraft({ ...demoCase(), name: 'unsaved work' }));
    unwrap(await store.saveDraft({ ...demoCase(), id: idNumber(9) }));
    expect(unwrap(await store.loadDraft())?.case.id).toBe(idNumber(9));
    expect(unwrap(await store.listDrafts()).drafts.map((d) => [d.tab, d.case.name])).toEqual([
      ['A', demoCase().name],
      ['set-aside', 'unsaved work'],
    ]);
    // A draft holding exactly the saved case is not worth keeping once the tab moves on.
    unwrap(await store.saveCase({ ...demoCase(), id: idNumber(9) }));
    h.clock.now = new Date(h.clock.now.getTime() + 1000);
    unwrap(await store.saveDraft({ ...demoCase(), id: idNumber(10) }));
    expect(unwrap(await store.listDrafts()).drafts.map((d) => [d.tab, d.case.id])).toEqual([
      ['A', idNumber(10)],
      ['set-aside', demoCase().id],
    ]);
  });

  it('the draft of a closed tab can be adopted once: the second tab to try is told it is gone', async () => {
    const h = harness();
    const old = await h.open({ tabId: 'closed' });
    const kept = unwrap(await old.saveDraft({ ...demoCase(), name: 'left behind' }));
    old.close();
    const one = await h.open({ tabId: 'one' });
    const two = await h.open({ tabId: 'two' });
    expect(unwrap(await one.adoptDraft(kept.key))).toMatchObject({ tab: 'one', case: { name: 'left behind' } });
    expect(await two.adoptDraft(kept.key)).toMatchObject({ ok: false, kind: 'not-found' });
  });

  it('merging the copy a tab left in localStorage: the newer of the two wins', async () => {
    const h = harness();
    const store = await h.open({ tabId: 'A' });
    unwrap(await store.saveDraft({ ...demoCase(), name: 'older in the database' }));
    // The localStorage copy was written 100 ms later (the last keystroke before a reload).
    const later = new Date(Date.parse('2026-12-01T12:00:00.000Z') + 100).toISOString();
    expect(unwrap(await store.mergeDraft('A', { ...demoCase(), name: 'typed before reload' }, later, null))).toBe(true);
    expect(unwrap(await store.loadDraft())?.case.name).toBe('typed before reload');
    // An older copy does not replace a newer draft.
    expect(unwrap(await store.mergeDraft('A', { ...demoCase(), name: 'stale' }, '2026-11-01T00:00:00.000Z', null))).toBe(false);
    expect(unwrap(await store.loadDraft())?.case.name).toBe('typed before reload');
  });

  it('an older copy of another case does not replace the newer draft the tab moved on to', async () => {
    const h = harness();
    const store = await h.open({ tabId: 'A' });
    unwrap(await store.saveDraft({ ...demoCase(), id: idNumber(5), name: 'the case the tab moved on to' }));
    expect(unwrap(await store.mergeDraft('A', { ...demoCase(), name: 'left behind earlier' }, '2026-12-01T11:59:00.000Z', null))).toBe(false);
    expect(unwrap(await store.loadDraft())?.case.name).toBe('the case the tab moved on to');
  });
});

describe('other tabs are told of changes', () => {
  it('saves, deletes and restores reach the other tab over BroadcastChannel, not the tab that made them', async () => {
    const name = `test-${Math.random()}`;
    const channel = (n: string) => new BroadcastChannel(`${n}-${name}`);
    const h = harness();
    const tabA = await h.open({ tabId: 'A', channel });
    const tabB = await h.open({ tabId: 'B', channel });
    const seenA: StoreChange[] = [];
    const seenB: StoreChange[] = [];
    tabA.onChange((c) => seenA.push(c));
    tabB.onChange((c) => seenB.push(c));
    const saved = unwrap(await tabA.saveCase(demoCase(), { baseRevision: null }));
    const token = unwrap(await tabA.deleteCase(saved.id));
    unwrap(await tabA.undoDelete(token));
    await new Promise((r) => setTimeout(r, 50));
    expect(seenB).toEqual([
      { type: 'saved', id: saved.id, revision: 1, from: 'A' },
      { type: 'deleted', id: saved.id, from: 'A' },
      { type: 'saved', id: saved.id, revision: 2, from: 'A' },
    ]);
    expect(seenA).toEqual([]);
    tabA.close();
    tabB.close();
  });

  it('without BroadcastChannel the store still works (changes are simply not announced)', async () => {
    const store = await harness().open({ channel: null });
    expect(revisionOf(unwrap(await store.saveCase(demoCase())))).toBe(1);
  });
});
