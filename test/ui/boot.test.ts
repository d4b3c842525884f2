/**
 * What a tab opens at start: its own draft wins; a new tab takes the newest draft of a closed tab, never one of a
 * tab still open; a draft that cannot be read, or whose inputs cannot be computed, never stops the start; the
 * copies left in localStorage are merged (newer wins).
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CASES } from '../../src/kinds/registry';
import { readCase } from '../../src/app/read-case';
import { firstCase, mergeFallbacks } from '../../src/ui/state/services';
import { caseFromDemo } from '../../src/app/create-case';
import { harness, req, openRaw, unwrap } from '../store/helpers';

const pile = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);

describe('the case a tab opens at start', () => {
  it('the own draft of the tab wins over newer drafts of other tabs', async () => {
    const h = harness();
    const other = await h.open({ tabId: 'other' });
    const mine = await h.open({ tabId: 'mine' });
    unwrap(await mine.saveDraft({ ...pile, name: 'my draft' }));
    h.clock.now = new Date(h.clock.now.getTime() + 60_000);
    unwrap(await other.saveDraft({ ...pile, name: 'newer, other tab' }));
    expect((await firstCase(mine, false, new Set(['other', 'mine'])))?.doc.name).toBe('my draft');
  });

  it('a new tab takes the newest draft of a closed tab, not that of a tab still open', async () => {
    const h = harness();
    const closed = await h.open({ tabId: 'closed' });
    unwrap(await closed.saveDraft({ ...pile, name: 'left in a closed tab' }));
    h.clock.now = new Date(h.clock.now.getTime() + 60_000);
    const open = await h.open({ tabId: 'open' });
    unwrap(await open.saveDraft({ ...pile, id: '00000000-0000-4000-8000-0000000000bb', name: 'open elsewhere' }));
    const fresh = await h.open({ tabId: 'fresh' });
    const first = await firstCase(fresh, true, new Set(['open', 'fresh']));
    expect(first).toMatchObject({ mode: 'editing', doc: { name: 'left in a closed tab' } });
    // It is now the new tab's own; the open tab's draft is untouched.
    expect(unwrap(await fresh.loadDraft())?.case.name).toBe('left in a closed tab');
    expect(unwrap(await open.loadDraft())?.case.name).toBe('open elsewhere');
    // A reload of a tab (not fresh) does not take the drafts of others: with no saved cases it gets the demo.
    const reloaded = await h.open({ tabId: 'another' });
    unwrap(await closed.saveDraft({ ...pile, name: 'closed again' }));
    expect((await firstCase(reloaded, false, new Set()))?.doc.name).toBe(pile.name);
  });

  it('an unreadable draft and a draft holding 1e308 m never stop the start', async () => {
    const h = harness();
    const s = await h.open({ tabId: 'T' });
    unwrap(await s.saveCase(pile));
    s.close();
    const db = await openRaw(h.factory, 'wetmode', undefined as unknown as number);
    const tx = db.transaction(['drafts'], 'readwrite');
    await req(tx.objectStore('drafts').put({ key: 'T\nbad', tab: 'T', caseId: 'bad', savedAt: '2026-12-01T12:00:00.000Z', baseRevision: null, case: { broken: true } }));
    db.close();
    const store = await h.open({ tabId: 'T' });
    expect(await firstCase(store, false, null)).toBeNull(); // the saved list opens
    unwrap(await store.saveDraft({ ...pile, inputs: { ...pile.inputs, outerDiameter: '1e308 m' } }));
    const first = await firstCase(store, false, null);
    expect(first?.doc.inputs.outerDiameter).toBe('1e308 m');
    const reading = readCase(first!.doc);
    expect(reading.ok).toBe(false);
    if (!reading.ok) expect(reading.errors.outerDiameter).toMatch(/^outer diameter must be at most 20000 mm/);
    expect(unwrap(await store.listCases()).cases).toHaveLength(1);
  });

  it('a saved case (no draft left) reopens as saved when it was the last case open, and a deleted one falls back to the list', async () => {
    const store = await harness().open({ tabId: 'T' });
    const other = { ...pile, id: '00000000-0000-4000-8000-0000000000cc', name: 'another saved pile' };
    unwrap(await store.saveCase(other));
    unwrap(await store.saveCase({ ...pile, name: 'saved, then reloaded' }));
    unwrap(await store.clearDraft());
    expect(await firstCase(store, false, null, null)).toBeNull();
    const first = await firstCase(store, false, null, pile.id);
    expect(first).toMatchObject({ mode: 'editing', saved: true, doc: { name: 'saved, then reloaded' } });
    expect(first?.baseRevision).not.toBeNull();
    expect(await firstCase(store, false, null, '00000000-0000-4000-8000-0000000000dd')).toBeNull();
  });

  it('a received case kept before an update reopens as received', async () => {
    const store = await harness().open({ tabId: 'T' });
    unwrap(await store.saveDraft({ ...pile, name: 'from a link' }, null, true));
    expect(await firstCase(store, false, null)).toMatchObject({ mode: 'received', saved: false, doc: { name: 'from a link' } });
  });
});

describe('merging the localStorage copies', () => {
  it('the copy written 100 ms before a reload replaces the older database draft, and is then cleared', async () => {
    const h = harness();
    const store = await h.open({ tabId: 'T' });
    unwrap(await store.saveDraft({ ...pile, name: 'before' }));
    const cleared: string[] = [];
    const later = new Date(h.clock.now.getTime() + 100).toISOString();
    await mergeFallbacks(store, [{ tab: 'T', case: { ...pile, name: 'typed just before reload' }, savedAt: later, baseRevision: null, received: false }], (t) => cleared.push(t));
    expect(unwrap(await store.loadDraft())?.case.name).toBe('typed just before reload');
    expect(cleared).toEqual(['T']);
  });
});
