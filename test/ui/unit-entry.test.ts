/** Unit entry on a numeric keypad: the unit chip's options and picks, and the SI/US switch pinning bare numbers. */
import { describe, expect, it } from 'vitest';
import { pinFieldUnits, pinUnit } from '../../src/forms/pin-units';
import { unitInText, unitOptions, withPickedUnit } from '../../src/ui/controls/unit-chip';
import { FORMS } from '../../src/kinds/registry';

describe('the unit chip', () => {
  it('offers mm, m, in and ft for a length, and knots as well as m/s and ft/s for a speed', () => {
    expect(unitOptions('length').map((o) => o.label)).toEqual(['mm', 'm', 'in', 'ft']);
    expect(unitOptions('speed').map((o) => o.text)).toEqual(['m/s', 'ft/s', 'kt']);
    expect(unitOptions('speed').find((o) => o.text === 'kt')?.label).toBe('kn');
  });

  it('shows the unit the text names, in any of its spellings, and none for a bare number or a sum', () => {
    const speed = unitOptions('speed');
    expect(unitInText('1.5 kts', speed)).toEqual({ number: '1.5', unit: 'kt' });
    expect(unitInText('1.5knot', speed)).toEqual({ number: '1.5', unit: 'kt' });
    expect(unitInText('24"', unitOptions('length'))).toEqual({ number: '24', unit: 'in' });
    expect(unitInText('610', unitOptions('length'))).toEqual({ number: '610', unit: null });
    expect(unitInText(`2' 6"`, unitOptions('length'))).toBeNull();
  });

  it('a pick keeps the digits and puts or replaces the unit, and leaves a sum alone', () => {
    const length = unitOptions('length');
    expect(withPickedUnit('24', 'in', length)).toBe('24 in');
    expect(withPickedUnit('24 mm', 'in', length)).toBe('24 in');
    expect(withPickedUnit('2 ft + 6 in', 'm', length)).toBeNull();
  });
});

describe('switching SI and US pins the unit of bare numbers and rewrites no digits', () => {
  it('a bare number gets the unit it was typed in; text with a unit, empty text and lists with units stay as typed', () => {
    expect(pinUnit('610', 'mm', false)).toBe('610 mm');
    expect(pinUnit('29.52756 ft', 'm', false)).toBe('29.52756 ft');
    expect(pinUnit('', 'mm', false)).toBe('');
    expect(pinUnit('1, 2.5; 4', 'm', true)).toBe('1 m, 2.5 m; 4 m');
    expect(pinUnit('1 m, 2', 'm', true)).toBe('1 m, 2');
    expect(pinUnit('20', '', false)).toBe('20');
  });

  it('the pile form keeps every entered digit after a switch', () => {
    const values = { ...FORMS.pile.defaults('si'), outerDiameter: '762', waterDepth: '9 m' };
    const pinned = pinFieldUnits(FORMS.pile.fields, values, 'si');
    expect(pinned.outerDiameter).toBe('762 mm');
    expect(pinned.waterDepth).toBe('9 m');
    // The same case read in US units after the pin gives the same SI values as before, read in SI.
    const before = FORMS.pile.build(values, 'si');
    const after = FORMS.pile.build(pinned, 'us');
    if (!before.ok || !after.ok) throw new Error('the pile did not build');
    expect(after.input).toEqual(before.input);
  });
});
