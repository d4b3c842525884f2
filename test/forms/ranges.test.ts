import { describe, expect, it } from 'vitest';
import { convertRangeTexts, defaultRangeText, readRanges, valuesAt } from '../../src/forms/ranges';
import { FORMS, DEMO_CASES } from '../../src/kinds/registry';
import { rangesOf } from '../../src/kinds/ranges-registry';
import { KIND_IDS } from '../../src/kinds/registry-pure';
import { expectClose } from '../helpers/expect-close';

const pile = FORMS.pile;
const demo = DEMO_CASES.find((d) => d.kind === 'pile')!;
const values = { ...pile.defaults('si'), ...demo.values };
const defs = rangesOf('pile');
const read = (ranges: Record<string, { low: string; high: string; on: boolean }>, v = values, system: 'si' | 'us' = 'si') => readRanges(pile.fields, defs, v, ranges, system);

describe('reading ranges typed beside the likely value', () => {
  it('reads ends in the field unit or as typed, in SI, with the likely value from the field', () => {
    const r = read({ topMass: { low: '9', high: '15000 kg', on: true }, growthThickness: { low: '0', high: '0.1 m', on: true } });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.ranges.map((x) => [x.key, x.low, x.likely, x.high, x.unit])).toEqual([
      ['topMass', 9000, 12000, 15000, 't'],
      ['growthThickness', 0, 0.075, 0.1, 'mm'],
    ]);
  });

  it('refuses text that does not read, naming the field and the end', () => {
    const r = read({ topMass: { low: 'nine', high: '15', on: true } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.topMass).toMatch(/^low end of the range of top mass: /);
    const wrong = read({ topMass: { low: '9 m', high: '15', on: true } });
    if (wrong.ok) throw new Error('a length for a mass must be refused');
    expect(wrong.errors.topMass).toContain('top mass');
    const empty = read({ topMass: { low: '9', high: ' ', on: true } });
    if (empty.ok) throw new Error('an empty end must be refused');
    expect(empty.errors.topMass).toBe('enter the high end of the range of top mass');
  });

  it('refuses a low end above the high end, in the user units', () => {
    const r = read({ topMass: { low: '16', high: '15', on: true } });
    if (r.ok) throw new Error('must be refused');
    expect(r.errors.topMass).toBe('the range of top mass runs from 16 t to 15 t: the low end must not be above the high end');
  });

  it('refuses a likely value outside its range, naming the field', () => {
    const r = read({ topMass: { low: '13', high: '15', on: true } });
    if (r.ok) throw new Error('must be refused');
    expect(r.errors.topMass).toBe('top mass (12 t) lies outside its range 13 t to 15 t: the likely value must lie within the range');
  });

  it('takes an empty fixity depth as the 6 diameters it stands for, and skips ranges that are off or on hidden fields', () => {
    const r = read({ fixityDepth: { low: '2.667', high: '6.096', on: true }, topMass: { low: '1', high: '2', on: false } });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    // 6 × 0.762 m: the builder's default fixity depth (common practice, the help text of the field).
    expectClose(r.ranges[0].likely, 6 * 0.762, { rtol: 1e-12, label: 'likely fixity depth' });
    expect(r.ranges).toHaveLength(1);
    const springs = read({ fixityDepth: { low: '2.667', high: '6.096', on: true } }, { ...values, foundation: 'soil-springs' });
    expect(springs).toEqual({ ok: true, ranges: [] });
  });

  it('refuses a range on a field that is not a single quantity', () => {
    const r = read({ flooded: { low: '1', high: '2', on: true }, nothing: { low: '1', high: '2', on: true } });
    if (r.ok) throw new Error('must be refused');
    expect(r.errors.flooded).toBe('inside cannot take a range: only single quantities can');
    expect(r.errors.nothing).toContain('not a field of this form');
  });

  it('offers the trade default for fixity, 3.5 to 8 diameters, in the user units', () => {
    const fix = defs.find((d) => d.key === 'fixityDepth')!;
    // 3.5 × 762 mm = 2.667 m; 8 × 762 mm = 6.096 m (common practice range of effective fixity).
    expect(defaultRangeText(pile.fields, fix, values, 'si')).toEqual({ low: '2.667', high: '6.096', on: true });
    const us = pile.convertValues(values, 'si', 'us');
    // 2.667 m = 8.75 ft; 6.096 m = 20 ft exactly.
    expect(defaultRangeText(pile.fields, fix, us, 'us')).toEqual({ low: '8.75', high: '20', on: true });
    const none = defs.find((d) => d.key === 'topMass')!;
    expect(defaultRangeText(pile.fields, none, { ...values, topMass: '0' }, 'si')).toBeNull();
  });

  it('converts range texts with the unit toggle and back', () => {
    const t = { growthThickness: { low: '0', high: '100', on: true }, topMass: { low: '9', high: '15', on: false } };
    const us = convertRangeTexts(pile.fields, t, 'si', 'us');
    // 100 mm = 3.937008 in, written with as few figures as keep it within one part in a million.
    expect(us.growthThickness).toEqual({ low: '0', high: '3.93701', on: true });
    expect(convertRangeTexts(pile.fields, us, 'us', 'si')).toEqual(t);
  });

  it('writes SI values back into the form so the kind builds the member there', () => {
    const r = read({ topMass: { low: '9', high: '15', on: true } });
    if (!r.ok) throw new Error('reads');
    const v = valuesAt(pile.fields, values, r.ranges, [14250], 'si');
    expect(v.topMass).toBe('14.25');
    const b = pile.build(v, 'si');
    if (!b.ok) throw new Error('builds');
    expect(b.build.model.masses?.[0].massKg).toBe(14250);
  });

  it('every kind offers ranges only on quantity fields of its own form', () => {
    for (const k of KIND_IDS) {
      for (const d of rangesOf(k)) {
        const f = FORMS[k].fields.find((x) => x.key === d.key);
        expect(f?.type, `${k}.${d.key}`).toBe('quantity');
      }
    }
  });
});
