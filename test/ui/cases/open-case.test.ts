import { afterEach, describe, expect, it } from 'vitest';

import { AppModel } from '../../../src/ui/state/app-model';
import { caseFromDemo } from '../../../src/app/create-case';
import { afterDeleted, afterRenamed, afterRestored, docForSaving, saveOpenCase } from '../../../src/ui/cases/open-case';
import { askPersistenceOnce, persistenceAnswer, resetPersistenceForTests } from '../../../src/ui/cases/persistence';
import { harness, unwrap } from '../../store/helpers';
import { inlineSolver } from './solve';
import { DEMO_CASES } from '../../../src/kinds/registry';

const pileDemo = DEMO_CASES.find((d) => d.kind === 'pile')!;

/** Waits until the model's results belong to its inputs (the in-process solver answers within a tick or two). */
async function settle(model: AppModel): Promise<void> {
  for (let i = 0; i < 200 && !model.resultsCurrent(); i++) await new Promise((r) => setTimeout(r, 5));
  if (!model.resultsCurrent()) throw new Error(`results did not arrive: ${model.get().solverMessage ?? 'no message'}`);
}

async function setup() {
  const h = harness();
  const store = await h.open();
  const model = new AppModel(inlineSolver);
  return { h, store, model };
}

afterEach(() => resetPersistenceForTests());

describe('saving the open case', () => {
  it('keeps the key result of its current results, marks it saved and clears the draft', async () => {
    const { store, model } = await setup();
    model.open(caseFromDemo(pileDemo), 'editing', false);
    await settle(model);
    unwrap(await store.saveDraft(model.get().doc!));
    const r = await saveOpenCase(store, model);
    expect(r.ok && r.text).toBe(`Saved “${pileDemo.name}”.`);
    const answer = model.get().results!.answer;
    if (!answer.ok || answer.engine === 'plate') throw new Error('the demo pile should solve by the beam engine');
    const [saved] = unwrap(await store.listCases()).cases;
    expect(saved.keyResult).toEqual({ lowestWetFrequencyHz: answer.member.wet!.frequenciesHz[0], verdict: answer.screening!.verdict });
    expect(model.unsaved()).toBe(false);
    expect(unwrap(await store.loadDraft())).toBeNull();
    // Asked once for persistent storage after the first save (this harness has no storage API).
    await Promise.resolve();
    expect(persistenceAnswer()).toBe('unsupported');
  });

  it('does not keep a key result that belongs to earlier inputs', async () => {
    const { model } = await setup();
    model.open(caseFromDemo(pileDemo), 'editing', false);
    await settle(model);
    expect(docForSaving(model)?.keyResult).toBeDefined();
    model.setField('outerDiameter', '900 mm');
    expect(docForSaving(model)?.keyResult).toBeUndefined();
    await settle(model);
    expect(docForSaving(model)?.keyResult).toBeDefined();
  });

  it('leaves an edit made while the store was saving in the open case, unsaved', async () => {
    const { store, model } = await setup();
    model.open(caseFromDemo(pileDemo), 'editing', false);
    const saving = saveOpenCase(store, model);
    model.setField('wallThickness', '20 mm');
    expect((await saving).ok).toBe(true);
    expect(model.get().doc!.inputs.wallThickness).toBe('20 mm');
    expect(model.unsaved()).toBe(true);
  });

  it('of a received case never overwrites: a changed version is saved as a copy and both are kept', async () => {
    const { store, model } = await setup();
    const mine = unwrap(await store.saveCase({ ...caseFromDemo(pileDemo), name: 'Pile P7' }));
    model.open({ ...mine, note: 'changed by the office' }, 'received', false);
    const r = await saveOpenCase(store, model);
    expect(r.ok && r.text).toMatch(/^Saved as a copy: “Pile P7 \(received \d{4}-\d{2}-\d{2}\)”\. Your other version is kept as it was\.$/);
    const list = unwrap(await store.listCases()).cases;
    expect(list).toHaveLength(2);
    expect(list.find((c) => c.id === mine.id)).toEqual(mine);
    expect(model.get().mode).toBe('editing');
    expect(model.get().doc!.id).not.toBe(mine.id);
    expect(model.unsaved()).toBe(false);
  });

  it('of a received case already here unchanged says so and writes nothing', async () => {
    const { store, model } = await setup();
    const mine = unwrap(await store.saveCase(caseFromDemo(pileDemo)));
    model.open({ ...mine, updatedAt: '2027-01-01T00:00:00.000Z' }, 'received', false);
    const r = await saveOpenCase(store, model);
    expect(r.ok && r.text).toBe(`Already saved: “${pileDemo.name}” is in your cases unchanged.`);
    expect(unwrap(await store.listCases()).cases).toEqual([mine]);
  });

  it('says what the store said when it refuses, and changes nothing in the model', async () => {
    const { store, model } = await setup();
    model.open(caseFromDemo(pileDemo), 'editing', false);
    store.close();
    const r = await saveOpenCase(store, model);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.kind).toBe('closed');
    expect(!r.ok && /^[A-Z].*\.$/.test(r.text)).toBe(true);
    expect(model.unsaved()).toBe(true);
  });
});

describe('the open case follows changes to its saved copy', () => {
  it('becomes unsaved when its saved copy is deleted, and saved again when the delete is undone', async () => {
    const { store, model } = await setup();
    const saved = unwrap(await store.saveCase(caseFromDemo(pileDemo)));
    model.open(saved, 'editing', true);
    const token = unwrap(await store.deleteCase(saved.id));
    afterDeleted(model, saved.id);
    expect(model.unsaved()).toBe(true);
    const restored = unwrap(await store.undoDelete(token))!;
    afterRestored(model, restored);
    expect(model.unsaved()).toBe(false);
  });

  it('takes the new name when its saved copy is renamed, and stays saved', async () => {
    const { store, model } = await setup();
    const saved = unwrap(await store.saveCase(caseFromDemo(pileDemo)));
    model.open(saved, 'editing', true);
    afterRenamed(model, unwrap(await store.renameCase(saved.id, 'Pile P7, rechecked')));
    expect(model.get().doc!.name).toBe('Pile P7, rechecked');
    expect(model.unsaved()).toBe(false);
  });

  it('keeps its own unsaved edits when renamed, taking only the name', async () => {
    const { store, model } = await setup();
    const saved = unwrap(await store.saveCase(caseFromDemo(pileDemo)));
    model.open(saved, 'editing', true);
    model.setField('wallThickness', '20 mm');
    afterRenamed(model, unwrap(await store.renameCase(saved.id, 'Renamed')));
    expect(model.get().doc!).toMatchObject({ name: 'Renamed', inputs: { wallThickness: '20 mm' } });
    expect(model.unsaved()).toBe(true);
  });

  it('is left alone when another case, or a received case, is changed in the list', async () => {
    const { store, model } = await setup();
    const saved = unwrap(await store.saveCase(caseFromDemo(pileDemo)));
    model.open(saved, 'received', false);
    afterRenamed(model, { ...saved, name: 'Other' });
    afterDeleted(model, saved.id);
    expect(model.get()).toMatchObject({ mode: 'received', doc: saved });
  });
});

describe('persistent storage', () => {
  it('is asked for once however many saves follow', async () => {
    let asked = 0;
    const asker = { requestPersistence: async () => (asked++, 'granted' as const) };
    expect(persistenceAnswer()).toBeNull();
    await Promise.all([askPersistenceOnce(asker), askPersistenceOnce(asker)]);
    await askPersistenceOnce(asker);
    expect(asked).toBe(1);
    expect(persistenceAnswer()).toBe('granted');
  });
});
