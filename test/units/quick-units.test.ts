import { describe, expect, it } from 'vitest';
import { evaluateText, isUnit } from '../../src/units/math';
import { QUICK_UNITS, quickEvaluate, QuickUnit } from '../../src/units/quick-units';
import { DIMENSIONS, normaliseText, splitList } from '../../src/units';
import { DEMO_CASES, FORMS, KINDS } from '../../src/kinds/registry';
import { excitationDefaults } from '../../src/forms/excitation';
import { expectClose } from '../helpers/expect-close';

// Cross-check: the quick reader (used before mathjs loads in the browser) against mathjs itself, the reader the
// command line uses. Tolerance 1e-14: the same factors multiplied in a different order may differ in the last bits.
const RTOL = 1e-14;

describe('the quick unit table agrees with mathjs', () => {
  it('knows every display unit a form offers', () => {
    const offered = Object.values(DIMENSIONS).flatMap((d) => [...d.units.si, ...d.units.us]).filter((u) => u !== '' && u !== '%');
    for (const u of offered) expect(QUICK_UNITS, `display unit ${u}`).toContain(u);
  });

  it.each(QUICK_UNITS.map((u) => [u]))('one %s has the SI value and dimensions mathjs gives it', (u) => {
    const q = quickEvaluate(`1 ${u}`);
    const m = evaluateText(`1 ${u}`);
    if (!q || !(q.value instanceof QuickUnit) || !isUnit(m)) throw new Error(`"1 ${u}" was not read as a unit`);
    expectClose(q.value.value, m.value!, { rtol: RTOL, label: u });
    expect([...q.value.dimensions]).toEqual([...m.dimensions]);
  });

  it('reads a bare number as a number and refuses what it does not know, leaving it to mathjs', () => {
    expect(quickEvaluate('12')).toEqual({ value: 12, namedUnits: false });
    expect(quickEvaluate('-1.5e3')).toEqual({ value: -1500, namedUnits: false });
    for (const t of ['2 ft + 6 kg', '2 ft + 6', '1/2 in', '3 furlong', '5 mm/m', '2 * 3 m', 'mm', '']) expect(quickEvaluate(t), t).toBeNull();
  });
});

describe('sums of feet and inches', () => {
  it('reads 2 ft + 6 in (what 2\' 6" and 2 ft 6 in are rewritten to) as 0.762 m, with the dimensions of a length', () => {
    const q = quickEvaluate('2 ft + 6 in');
    if (!q || !(q.value instanceof QuickUnit)) throw new Error('2 ft + 6 in was not read');
    // 30 in × 0.0254 m/in = 0.762 m (international inch, exact by definition); rtol for rounding only.
    expectClose(q.value.value, 0.762, { rtol: 1e-12, label: '2 ft + 6 in in m' });
    expect(q.value.dimensions).toEqual(DIMENSIONS.length.exponents);
  });
});

describe('every demo case opens without mathjs', () => {
  // The first answer on a fresh device is the demo: each of its entries, and each default it leaves in place,
  // must be readable by the quick reader, or the first load would have to fetch mathjs after all.
  it.each(DEMO_CASES.map((d) => [d.name, d] as const))('%s', (_name, demo) => {
    const texts = { ...FORMS[demo.kind].defaults(demo.system), ...demo.values, ...excitationDefaults(KINDS[demo.kind].resonance, demo.system), ...(demo.excitation ?? {}) };
    const unread: string[] = [];
    for (const [key, text] of Object.entries(texts)) {
      for (const item of splitList(text)) {
        if (/^[a-z][a-z0-9-]*$/.test(item)) continue; // a choice (material, end condition), not a quantity
        const norm = normaliseText(item);
        if (!norm.ok || !quickEvaluate(norm.text.replace(/%\s*$/, ''))) unread.push(`${key}: ${item}`);
      }
    }
    expect(unread).toEqual([]);
  });
});
