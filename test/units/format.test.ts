import { describe, expect, it } from 'vitest';
import { DIMENSIONS, type Dimension, formatForEntry, formatNumber, formatQuantity, parseQuantity, unitFactor, unitLabel } from '../../src/units';
import { seeded } from '../bench/timing';
import { expectClose } from '../helpers/expect-close';

describe('formatting SI values for people', () => {
  it('formatNumber keeps significant figures and drops trailing zeros and negative zero', () => {
    expect(formatNumber(304.8, 3)).toBe('305');
    expect(formatNumber(0.0254, 4)).toBe('0.0254');
    expect(formatNumber(7850, 4)).toBe('7850');
    expect(formatNumber(1.5, 4)).toBe('1.5');
    expect(formatNumber(-0.00001, 2)).toBe('-0.00001');
    expect(formatNumber(-0, 3)).toBe('0');
  });

  it('formatQuantity shows a value in the chosen unit with a readable label', () => {
    expect(formatQuantity(0.305, 'mm')).toBe('305 mm');
    expect(formatQuantity(0.305, 'in', 3)).toBe('12 in');
    expect(formatQuantity(7850, 'kg/m^3')).toBe('7850 kg/m³');
    expect(formatQuantity(210e9, 'GPa')).toBe('210 GPa');
    expect(formatQuantity(0.2, '%')).toBe('20 %');
    expect(formatQuantity(0.25, '')).toBe('0.25');
    expect(formatQuantity(5e4, 'kN m/rad')).toBe('50 kN·m/rad');
    expect(unitLabel('lb ft^2')).toBe('lb·ft²');
  });

  it('formatForEntry writes as few figures as keep the value to one part in a million', () => {
    // 610 mm / 25.4 mm = 24.015748… in; 7 figures are the first within 1e-6 (24.0157 is 2e-6 off).
    expect(formatForEntry(0.61, 'in')).toBe('24.01575');
    expect(formatForEntry(0.6096, 'in')).toBe('24');
    expect(formatForEntry(0.61, 'mm')).toBe('610');
    expect(formatForEntry(0, 'mm')).toBe('0');
  });

  it('every display unit of every dimension is readable by the parser and has a positive factor', () => {
    for (const [dim, info] of Object.entries(DIMENSIONS) as [Dimension, (typeof DIMENSIONS)[Dimension]][]) {
      for (const unit of [...info.units.si, ...info.units.us]) {
        expect(unitFactor(unit), `${dim} ${unit}`).toBeGreaterThan(0);
        const r = parseQuantity(`1 ${unit}`, { dimension: dim, unit });
        // '' and '%' are not typed as units; a bare 1 takes them.
        if (unit !== '' && unit !== '%') expect(r.ok, `${dim}: "1 ${unit}"`).toBe(true);
      }
      expect(parseQuantity(info.examples.si, { dimension: dim, unit: info.units.si[0] }).ok, `${dim} SI example`).toBe(true);
      expect(parseQuantity(info.examples.us, { dimension: dim, unit: info.units.us[0] }).ok, `${dim} US example`).toBe(true);
    }
  });

  it('a value of up to five figures typed in one unit, written in another and read back, returns the text first typed (property)', () => {
    const pairs: [Dimension, string, string][] = [
      ['length', 'mm', 'in'],
      ['length', 'm', 'ft'],
      ['density', 'kg/m^3', 'lb/ft^3'],
      ['modulus', 'GPa', 'ksi'],
      ['mass', 'kg', 'lb'],
      ['force', 'kN', 'kip'],
      ['rotational-stiffness', 'kN m/rad', 'lbf ft/rad'],
    ];
    const rand = seeded(7);
    for (const [dimension, a, b] of pairs) {
      for (let i = 0; i < 200; i++) {
        const digits = 1 + Math.floor(rand() * 5);
        const typed = formatNumber((0.5 + 9.5 * rand()) * 10 ** Math.floor(rand() * 5 - 1), digits);
        const si = parseQuantity(typed, { dimension, unit: a });
        if (!si.ok) throw new Error(si.message);
        const there = formatForEntry(si.valueSI, b);
        const back = parseQuantity(there, { dimension, unit: b });
        if (!back.ok) throw new Error(back.message);
        expect(formatForEntry(back.valueSI, a), `${typed} ${a} → ${there} ${b} → ${a}`).toBe(formatNumber(Number(typed), 17));
        // The value itself is kept to the entry tolerance (1e-6) at each step.
        expectClose(back.valueSI, si.valueSI, { rtol: 1e-6, label: `${typed} ${a} via ${b}` });
      }
    }
  });
});
