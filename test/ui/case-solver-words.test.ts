/**
 * A case whose solve runs past the worker's time limit: the message says the input could not be solved and names
 * the field holding the most extreme number; the last good results stay, marked out of date.
 */
import { describe, expect, it } from 'vitest';
import { caseFromDemo } from '../../src/app/create-case';
import { DEMO_CASES } from '../../src/kinds/registry';
import { AppModel, type Solver } from '../../src/ui/state/app-model';
import { caseSolverWords, likelyField } from '../../src/ui/state/case-solver-words';
import { inlineSolver } from './cases/solve';

const settle = () => new Promise((r) => setTimeout(r, 0));
const timeout = { status: 'timeout', afterMs: 10_000 } as const;

describe('words for a case the solver could not finish', () => {
  it('names the field with the most extreme entry, in its own words and as entered', () => {
    const doc = caseFromDemo(DEMO_CASES[0]);
    expect(doc.kind).toBe('pile');
    const huge = { ...doc, inputs: { ...doc.inputs, outerDiameter: '1e12 m' } };
    expect(likelyField(huge)).toEqual({ label: 'Outer diameter', entry: '1e12 m' });
    expect(caseSolverWords(timeout, huge)).toBe(
      'This input could not be solved: the solver took longer than 10 s and was stopped. The likely cause is outer diameter ("1e12 m"): check it for a stray exponent or a wrong unit.',
    );
    // A tiny entry counts as extreme too; the more extreme of two wins.
    const both = { ...huge, inputs: { ...huge.inputs, wallThickness: '1e-30 mm' } };
    expect(likelyField(both)?.label).toBe('Wall thickness');
  });

  it('names no field when every entry is ordinary, and says nothing for an answer or a replaced request', () => {
    const doc = caseFromDemo(DEMO_CASES[0]);
    expect(likelyField(doc)).toBeNull();
    expect(caseSolverWords(timeout, doc)).toBe('This input could not be solved: the solver took longer than 10 s and was stopped. Check the inputs for extreme values.');
    expect(caseSolverWords({ status: 'crashed', message: 'out of memory' }, doc)).toBe(
      'This input could not be solved: the solver stopped unexpectedly (out of memory). Your inputs are kept; change a value to try again.',
    );
    expect(caseSolverWords({ status: 'superseded' }, doc)).toBeNull();
  });

  it('after a time-out the last good results stay on screen, marked out of date', async () => {
    let calls = 0;
    const solver: Solver = {
      request: async (req) => (++calls === 1 ? inlineSolver.request(req) : timeout),
    };
    const model = new AppModel(solver);
    model.open(caseFromDemo(DEMO_CASES[0]), 'editing', false);
    await settle();
    const good = model.get().results;
    expect(good).not.toBeNull();
    expect(model.resultsCurrent()).toBe(true);
    // An ordinary edit (so the form's own range checks pass it on to the solver), which the solver then cannot finish.
    model.setField('topMass', '9 t');
    await settle();
    expect(model.get().results).toBe(good);
    expect(model.resultsCurrent()).toBe(false);
    expect(model.get().solverMessage).toMatch(/^This input could not be solved: the solver took longer than 10 s/);
  });
});
