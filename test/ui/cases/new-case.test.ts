import { describe, expect, it } from 'vitest';
import { MEMBER_KINDS, parseCase } from '../../../src/case';

import { excitationDefaults } from '../../../src/forms/excitation';
import { readCase } from '../../../src/app/read-case';
import { isUntouchedStart } from '../../../src/ui/cases/new-case';

import { blankCase, caseFromDemo } from '../../../src/app/create-case';
import { DEMO_CASES, FORMS, kindOf } from '../../../src/kinds/registry';

describe('a new case from the big buttons', () => {
  it('of each kind and in each unit system is a valid case with the form\u2019s defaults that reads without errors', () => {
    for (const kind of MEMBER_KINDS) {
      for (const system of ['si', 'us'] as const) {
        const c = blankCase(kind, system);
        expect(parseCase(c)).toEqual({ ok: true, value: c });
        expect(c).toMatchObject({ kind, unitSystem: system, name: '', inputs: FORMS[kind].defaults(system), excitation: excitationDefaults(kindOf(kind).resonance, system) });
        const reading = readCase(c);
        expect(reading.ok, `${kind}/${system}: ${JSON.stringify(reading.ok ? null : reading.errors)}`).toBe(true);
      }
    }
  });
  it('gets a fresh id each time', () => {
    expect(blankCase('pile', 'si').id).not.toBe(blankCase('pile', 'si').id);
  });
});

describe('a case that holds no work of the user', () => {
  it('is a new case or a demo exactly as opened, so replacing it needs no question', () => {
    for (const kind of MEMBER_KINDS) expect(isUntouchedStart(blankCase(kind, 'us'))).toBe(true);
    for (const d of DEMO_CASES) expect(isUntouchedStart(caseFromDemo(d))).toBe(true);
  });
  it('is no longer one after any change to a value, the name or the note', () => {
    const demo = caseFromDemo(DEMO_CASES[0]);
    expect(isUntouchedStart({ ...demo, note: `${demo.note} Checked again.` })).toBe(false);
    expect(isUntouchedStart({ ...demo, inputs: { ...demo.inputs, outerDiameter: '800 mm' } })).toBe(false);
    expect(isUntouchedStart({ ...blankCase('stem', 'si'), name: 'Level probe' })).toBe(false);
    // The same values in the other unit system are a different case (bare numbers take other units).
    expect(isUntouchedStart({ ...blankCase('pile', 'si'), unitSystem: 'us' })).toBe(false);
  });
});
