/** Two tabs, one case: the second save offers keep mine / keep theirs / keep both, and loses nothing. */
import { describe, expect, it } from 'vitest';
import { DEMO_CASES } from '../../../src/kinds/registry';
import { revisionOf } from '../../../src/store';
import { conflictCopyName, resolveConflict, saveOpenCase } from '../../../src/ui/cases/open-case';
import { AppModel } from '../../../src/ui/state/app-model';
import { applyStoreChange, ELSEWHERE } from '../../../src/ui/state/remote-changes';
import { caseFromDemo } from '../../../src/app/create-case';
import { harness, unwrap } from '../../store/helpers';
import { inlineSolver } from './solve';

const pileDemo = DEMO_CASES.find((d) => d.kind === 'pile')!;

/** Two tabs on one device, both with the same saved case open (revision 1). */
async function twoTabs() {
  const h = harness();
  const storeA = await h.open({ tabId: 'A' });
  const storeB = await h.open({ tabId: 'B' });
  const saved = unwrap(await storeA.saveCase(caseFromDemo(pileDemo), { baseRevision: null }));
  const a = new AppModel(inlineSolver);
  const b = new AppModel(inlineSolver);
  a.open(unwrap(await storeA.getCase(saved.id)), 'editing', true);
  b.open(unwrap(await storeB.getCase(saved.id)), 'editing', true);
  a.setField('wallThickness', '20 mm');
  a.edit((d) => ({ ...d, name: 'Renamed in tab A' }));
  b.edit((d) => ({ ...d, note: 'checked from tab B' }));
  const first = await saveOpenCase(storeA, a);
  expect(first.ok).toBe(true);
  return { storeA, storeB, a, b, id: saved.id };
}

describe('saving over a newer revision is never silent', () => {
  it('the second tab to save gets the choice, and its edits stay on screen', async () => {
    const { storeB, b } = await twoTabs();
    const r = await saveOpenCase(storeB, b);
    expect(r.ok).toBe(false);
    expect(r.ok || r.kind).toBe('conflict');
    expect(b.get().conflict?.theirs).toMatchObject({ name: 'Renamed in tab A', inputs: { wallThickness: '20 mm' } });
    expect(b.get().doc?.note).toBe('checked from tab B');
    expect(b.unsaved()).toBe(true);
  });

  it('keep both: tab B is saved as a named copy and tab A is unchanged', async () => {
    const { storeB, b, id } = await twoTabs();
    await saveOpenCase(storeB, b);
    const r = await resolveConflict(storeB, b, 'both');
    expect(r.ok).toBe(true);
    const list = unwrap(await storeB.listCases()).cases;
    expect(list).toHaveLength(2);
    expect(list.find((c) => c.id === id)).toMatchObject({ name: 'Renamed in tab A', inputs: { wallThickness: '20 mm' } });
    const copy = list.find((c) => c.id !== id)!;
    expect(copy.note).toBe('checked from tab B');
    expect(copy.name.startsWith(`${pileDemo.name} (my version, `)).toBe(true);
    expect(b.get().doc?.id).toBe(copy.id);
    expect(b.get().conflict).toBeNull();
  });

  it('keep mine: saved over the other version on purpose; keep theirs: the other version is opened', async () => {
    const one = await twoTabs();
    await saveOpenCase(one.storeB, one.b);
    expect((await resolveConflict(one.storeB, one.b, 'mine')).ok).toBe(true);
    expect(unwrap(await one.storeB.getCase(one.id)).note).toBe('checked from tab B');
    expect(revisionOf(unwrap(await one.storeB.getCase(one.id)))).toBe(3);

    const two = await twoTabs();
    await saveOpenCase(two.storeB, two.b);
    expect((await resolveConflict(two.storeB, two.b, 'theirs')).ok).toBe(true);
    expect(two.b.get().doc).toMatchObject({ name: 'Renamed in tab A' });
    expect(two.b.unsaved()).toBe(false);
    // And a later save from B is based on the revision it now shows: no conflict.
    two.b.edit((d) => ({ ...d, tag: 'B7' }));
    expect((await saveOpenCase(two.storeB, two.b)).ok).toBe(true);
  });

  it('the copy name says whose version it is and stays within the name limit', () => {
    const at = new Date(2026, 11, 3, 9, 7);
    expect(conflictCopyName('Pile P7', at)).toBe('Pile P7 (my version, 2026-12-03 09:07)');
    expect(conflictCopyName('', at)).toBe('Case (my version, 2026-12-03 09:07)');
    expect(conflictCopyName('x'.repeat(500), at).length).toBeLessThanOrEqual(200);
  });
});

describe('an open case follows what other tabs do to it', () => {
  it('unchanged here: takes the newer version and says so; changed here: keeps the edits and says so', async () => {
    const h = harness();
    const storeA = await h.open({ tabId: 'A' });
    const saved = unwrap(await storeA.saveCase(caseFromDemo(pileDemo), { baseRevision: null }));
    const quiet = new AppModel(inlineSolver);
    quiet.open(saved, 'editing', true);
    const busy = new AppModel(inlineSolver);
    busy.open(saved, 'editing', true);
    busy.edit((d) => ({ ...d, note: 'typing here' }));
    const newer = unwrap(await storeA.saveCase({ ...saved, name: 'Saved in another tab' }, { baseRevision: 1 }));
    const change = { type: 'saved' as const, id: saved.id, revision: revisionOf(newer)!, from: 'A' };
    await applyStoreChange(storeA, quiet, change);
    await applyStoreChange(storeA, busy, change);
    expect(quiet.get()).toMatchObject({ doc: { name: 'Saved in another tab' }, elsewhere: ELSEWHERE.updated, baseRevision: 2 });
    expect(busy.get()).toMatchObject({ doc: { note: 'typing here' }, elsewhere: ELSEWHERE.changed, baseRevision: 1 });
    await applyStoreChange(storeA, quiet, { type: 'deleted', id: saved.id, from: 'A' });
    expect(quiet.get()).toMatchObject({ saved: null, elsewhere: ELSEWHERE.deleted });
  });
});
