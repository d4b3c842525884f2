import { describe, it, expect } from 'vitest';
import { AppModel, type Solver } from '../../src/ui/state/app-model';
import { caseFromDemo } from '../../src/app/create-case';

import { inlineSolver } from './cases/solve';
import { DEMO_CASES } from '../../src/kinds/registry';

const settle = () => new Promise((r) => setTimeout(r, 0));

describe('the open-case model', () => {
  it('a case opened as saved is not unsaved until an edit, and saving makes it saved again', async () => {
    const model = new AppModel(inlineSolver);
    const doc = caseFromDemo(DEMO_CASES[0]);
    model.open(doc, 'editing', true);
    expect(model.get().saved).toBe(doc);
    expect(model.unsaved()).toBe(false);
    model.setField('topMass', '9 t');
    expect(model.unsaved()).toBe(true);
    model.markSaved(model.get().doc!);
    expect(model.unsaved()).toBe(false);
    await settle();
  });

  it('a solver that times out leaves a message in words for the screens, and the inputs as they were', async () => {
    const slow: Solver = { request: async () => ({ status: 'timeout', afterMs: 10_000 }) };
    const model = new AppModel(slow);
    const doc = caseFromDemo(DEMO_CASES[0]);
    model.open(doc, 'editing', false);
    await settle();
    expect(model.get().solverMessage).toBe('This input could not be solved: the solver took longer than 10 s and was stopped. Check the inputs for extreme values.');
    expect(model.get().computing).toBe(false);
    expect(model.get().doc!.inputs).toEqual(doc.inputs);
  });

  it('a liquid density of 1200 kg/m³ around the pile is accepted with a warning by the field and in the results warnings', async () => {
    const model = new AppModel(inlineSolver);
    model.open(caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!), 'editing', false);
    model.setField('liquidDensity', '1200');
    await new Promise((r) => setTimeout(r, 50));
    for (let i = 0; i < 100 && model.get().computing; i++) await new Promise((r) => setTimeout(r, 20));
    expect(model.get().errors).toEqual({});
    expect(model.get().warnings.liquidDensity).toMatch(/^liquid density 1200 kg\/m³ is outside the usual 950 kg\/m³ to 1100 kg\/m³/);
    expect(model.get().results?.inputWarnings?.[0]).toMatch(/^Input check: Liquid density 1200 kg\/m³ is outside/);
  });

  it('closing the open case (the early demo the store replaced by the Cases list) keeps no draft and ignores the answer still on its way', async () => {
    let answer: (() => void) | null = null;
    const held: Solver = { request: (req) => new Promise((resolve) => (answer = () => void inlineSolver.request(req).then(resolve))) };
    const written: string[] = [];
    const model = new AppModel(held, { saveDraft: async (c) => (written.push(c.name), { ok: true }) }, 0);
    model.open(caseFromDemo(DEMO_CASES[0]), 'editing', false);
    model.setField('topMass', '9 t'); // a draft is scheduled
    model.close();
    expect(model.get()).toMatchObject({ doc: null, results: null, computing: false, errors: {}, solverMessage: null });
    answer!();
    await new Promise((r) => setTimeout(r, 50));
    expect(model.get().results).toBeNull();
    expect(model.get().doc).toBeNull();
    expect(written).toEqual([]); // the draft scheduled before the close was not written
  });
});
