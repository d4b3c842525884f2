/** Which uncertain inputs a verdict rests on at their defaults, and when a case is still a demo. */
import { describe, expect, it } from 'vitest';
import { blankCase, caseFromDemo } from '../../src/app/create-case';
import { DEMO_CASES } from '../../src/kinds/registry';
import { defaultsInUse, defaultsWords, demoOf } from '../../src/ui/member/defaults-in-use';

describe('defaults a verdict rests on', () => {
  it('a new pile rests on its default fixity depth and marine growth, each with its source', () => {
    const list = defaultsInUse(blankCase('pile', 'si'));
    const keys = list.map((d) => d.key);
    expect(keys).toContain('fixityDepth');
    expect(keys).toContain('growthThickness');
    expect(list.find((d) => d.key === 'growthThickness')?.source).toMatch(/NORSOK N-003/);
    expect(defaultsWords(list)).toMatch(/^Fixity depth below mudline, .*marine growth thickness/);
  });

  it('a value typed over a default, even the same number with its unit, counts as entered', () => {
    const c = blankCase('pile', 'si');
    const typed = { ...c, inputs: { ...c.inputs, fixityDepth: '4 m', growthThickness: '50 mm' } };
    const keys = defaultsInUse(typed).map((d) => d.key);
    expect(keys).not.toContain('fixityDepth');
    expect(keys).not.toContain('growthThickness');
  });

  it('a demo is a demo until it is saved as the user’s own case', () => {
    const demo = caseFromDemo(DEMO_CASES[0]);
    expect(demoOf(demo, false)).toBe(DEMO_CASES[0].name);
    expect(demoOf(demo, true)).toBeNull();
    expect(demoOf(blankCase('pile', 'si'), false)).toBeNull();
  });
});
