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
});
