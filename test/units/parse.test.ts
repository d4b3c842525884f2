import { describe, expect, it } from 'vitest';
import { parseQuantity, parseQuantityList, type QuantityOptions } from '../../src/units';
import { expectClose } from '../helpers/expect-close';

// Conversion factors: NIST Special Publication 811 (2008), Appendix B — exact by definition: in = 0.0254 m,
// ft = 0.3048 m, lb = 0.45359237 kg; lbf = 4.4482216152605 N (from the pound and standard gravity 9.80665 m/s²);
// psi = lbf/in² = 6894.757293168 Pa. International knot = 1852 m/h (exact). Tonne = 1000 kg.
// Tolerance: these are exact products of a few floating-point operations, so rtol 1e-12 leaves room for rounding;
// mathjs stores the kip as 4448.2216 N (four decimals), so checks through the kip use rtol 1e-8; its psi is
// 6894.75729276459 Pa, 6e-11 below the exact value, so checks through the psi use rtol 1e-9.

const LENGTH_MM: QuantityOptions = { dimension: 'length', unit: 'mm' };

function value(text: string, options: QuantityOptions): number {
  const r = parseQuantity(text, options);
  if (!r.ok) throw new Error(`"${text}" did not parse: ${r.message}`);
  return r.valueSI;
}

function message(text: string, options: QuantityOptions): string {
  const r = parseQuantity(text, options);
  if (r.ok) throw new Error(`"${text}" parsed to ${r.valueSI} but should have failed`);
  return r.message;
}

describe('parseQuantity reads the units on drawings into SI', () => {
  it.each([
    ['610 mm', 0.61],
    ['24 in', 24 * 0.0254],
    ['24in', 24 * 0.0254],
    ['2 ft', 2 * 0.3048],
    ['0.6 m', 0.6],
    ['1e3 mm', 1],
  ])('length %s is %f m (NIST SP 811)', (text, expected) => {
    expectClose(value(text, LENGTH_MM), expected, { rtol: 1e-12, label: text });
  });

  it('densities, moduli and masses in metric and US units convert exactly (NIST SP 811)', () => {
    expectClose(value('7.85 t/m^3', { dimension: 'density', unit: 'kg/m^3' }), 7850, { rtol: 1e-12, label: 't/m^3' });
    expectClose(value('7850 kg/m³', { dimension: 'density', unit: 'kg/m^3' }), 7850, { rtol: 1e-12, label: 'superscript ³' });
    // 64 lb/ft³ = 64 × 0.45359237 / 0.3048³ = 1025.1841 kg/m³ (hand calculation).
    expectClose(value('64 lb/ft^3', { dimension: 'density', unit: 'kg/m^3' }), (64 * 0.45359237) / 0.3048 ** 3, { rtol: 1e-12, label: 'lb/ft^3' });
    expectClose(value('64 pcf', { dimension: 'density', unit: 'kg/m^3' }), (64 * 0.45359237) / 0.3048 ** 3, { rtol: 1e-12, label: 'pcf' });
    expectClose(value('210 GPa', { dimension: 'modulus', unit: 'GPa' }), 210e9, { rtol: 1e-12, label: 'GPa' });
    // 29000 ksi = 29 000 000 psi × 6894.757293168 Pa = 199.948 GPa.
    expectClose(value('29000 ksi', { dimension: 'modulus', unit: 'GPa' }), 29e6 * (4.4482216152605 / 0.0254 ** 2), { rtol: 1e-9, label: 'ksi (mathjs psi)' });
    expectClose(value('5 t', { dimension: 'mass', unit: 'kg' }), 5000, { rtol: 1e-12, label: 'tonne' });
    expectClose(value('550 lb', { dimension: 'mass', unit: 'kg' }), 550 * 0.45359237, { rtol: 1e-12, label: 'lb' });
    expectClose(value('110 kip', { dimension: 'force', unit: 'kN' }), 110 * 4448.2216152605, { rtol: 1e-8, label: 'kip (mathjs: 4448.2216 N)' });
  });

  it('frequencies, speeds, soil moduli, inertias, angles and rotational stiffness read their units', () => {
    expectClose(value('1200 rpm', { dimension: 'frequency', unit: 'Hz' }), 20, { rtol: 1e-12, label: 'rpm' });
    expectClose(value('3 knot', { dimension: 'speed', unit: 'm/s' }), (3 * 1852) / 3600, { rtol: 1e-12, label: 'knot' });
    expectClose(value('3 kn', { dimension: 'speed', unit: 'm/s' }), (3 * 1852) / 3600, { rtol: 1e-12, label: 'kn' });
    expectClose(value('5 MN/m^2', { dimension: 'soil-modulus', unit: 'MN/m^2' }), 5e6, { rtol: 1e-12, label: 'MN/m^2' });
    // 16 pci = 16 × 4.4482216152605 N / 0.0254³ m³ = 4.3432 MN/m³.
    // pci is defined here from lbf and in, not from mathjs's psi, so it is exact to rounding.
    expectClose(value('16 pci', { dimension: 'soil-modulus-gradient', unit: 'MN/m^3' }), (16 * 4.4482216152605) / 0.0254 ** 3, { rtol: 1e-12, label: 'pci' });
    expectClose(value('2 t m^2', { dimension: 'rotary-inertia', unit: 'kg m^2' }), 2000, { rtol: 1e-12, label: 't m^2' });
    expectClose(value('50 kN m/rad', { dimension: 'rotational-stiffness', unit: 'kN m/rad' }), 5e4, { rtol: 1e-12, label: 'kN m/rad' });
    expectClose(value('50 kN·m', { dimension: 'rotational-stiffness', unit: 'kN m/rad' }), 5e4, { rtol: 1e-12, label: 'kN·m (radian implied)' });
    // Per degree: 1 N·m/deg = 180/π N·m/rad (classical).
    expectClose(value('1 N m/deg', { dimension: 'rotational-stiffness', unit: 'kN m/rad' }), 180 / Math.PI, { rtol: 1e-12, label: 'N m/deg' });
    expectClose(value('30°', { dimension: 'angle', unit: 'deg' }), Math.PI / 6, { rtol: 1e-12, label: 'degree sign' });
  });

  it('a bare number takes the field’s shown unit', () => {
    // Unit definitions, exact: 1 in = 25.4 mm (international inch, 1959), 1 GPa = 1e9 Pa, 20 % = 0.2 (SI brochure).
    expectClose(value('610', LENGTH_MM), 0.61, { rtol: 1e-12, label: 'mm' });
    expectClose(value('24', { dimension: 'length', unit: 'in' }), 0.6096, { rtol: 1e-12, label: 'in' });
    expectClose(value('210', { dimension: 'modulus', unit: 'GPa' }), 210e9, { rtol: 1e-12, label: 'GPa' });
    expectClose(value('20', { dimension: 'ratio', unit: '%' }), 0.2, { rtol: 1e-12, label: '% field' });
    expectClose(value('0.2', { dimension: 'ratio', unit: '' }), 0.2, { rtol: 1e-12, label: 'plain ratio' });
    expectClose(value('20 %', { dimension: 'ratio', unit: '' }), 0.2, { rtol: 1e-12, label: 'explicit % on a plain field' });
    expectClose(value('20%', { dimension: 'ratio', unit: '%' }), 0.2, { rtol: 1e-12, label: 'explicit % on a % field' });
    // Units that cancel make a plain ratio, not a number in the field's unit: 5 mm/m = 0.005.
    expectClose(value('5 mm/m', { dimension: 'ratio', unit: '%' }), 0.005, { rtol: 1e-12, label: 'mm/m' });
  });

  it('every arithmetic operator the parser needs is present in the trimmed mathjs instance', () => {
    expectClose(value('2 ft + 6 in', LENGTH_MM), 0.762, { rtol: 1e-12, label: 'add' });
    expectClose(value('3 m - 10 cm', LENGTH_MM), 2.9, { rtol: 1e-12, label: 'subtract' });
    expectClose(value('2 * 3 m', LENGTH_MM), 6, { rtol: 1e-12, label: 'multiply' });
    expectClose(value('6 m / 4', LENGTH_MM), 1.5, { rtol: 1e-12, label: 'divide' });
    expectClose(value('1/2 in', LENGTH_MM), 0.0127, { rtol: 1e-12, label: 'divide before a unit' });
    expectClose(value('(2 m)^2 / 4 m', LENGTH_MM), 1, { rtol: 1e-12, label: 'pow' });
    expectClose(value('-2 m', LENGTH_MM), -2, { rtol: 1e-12, label: 'unary minus' });
    expectClose(value('−2 m', LENGTH_MM), -2, { rtol: 1e-12, label: 'unicode minus sign' });
    expectClose(value('+2 m', LENGTH_MM), 2, { rtol: 1e-12, label: 'unary plus' });
  });

  it('a decimal comma is read as a decimal point when it is unambiguous', () => {
    // Decimal comma as in ISO 80000-1 §7.1.4 (either sign is allowed as the decimal marker); values exact.
    expectClose(value('0,6 m', LENGTH_MM), 0.6, { rtol: 1e-12, label: '0,6 m' });
    expectClose(value('12,5', LENGTH_MM), 0.0125, { rtol: 1e-12, label: '12,5 mm' });
    expectClose(value('0,125 m', LENGTH_MM), 0.125, { rtol: 1e-12, label: '0,125 m (whole part 0)' });
    expectClose(value('1,2345 m', LENGTH_MM), 1.2345, { rtol: 1e-12, label: 'four decimals' });
  });
});

describe('parseQuantity explains what it could not read', () => {
  it('a unit of the wrong kind says what was expected and what was got', () => {
    expect(message('5 kg', LENGTH_MM)).toBe('expected a length such as 610 mm or 24 in, got a mass (5 kg)');
    expect(message('210 GPa', { dimension: 'density', unit: 'kg/m^3' })).toBe(
      'expected a density such as 1025 kg/m^3 or 64 lb/ft^3, got a pressure, stress or modulus (210 GPa)',
    );
    expect(message('10 rad/s', { dimension: 'frequency', unit: 'Hz' })).toBe('expected a frequency such as 12 Hz or 720 rpm, got an angular speed (10 rad/s)');
    expect(message('5 mm/m', LENGTH_MM)).toBe('expected a length such as 610 mm or 24 in, got a plain number (5 mm/m)');
  });

  it('feet times inches is an area, with a hint to add them', () => {
    expect(message('2 ft * 6 in', LENGTH_MM)).toBe('expected a length such as 610 mm or 24 in, got an area (2 ft * 6 in) (to add lengths write 2 ft + 6 in)');
  });

  it('empty, unknown, unavailable, malformed, mixed and infinite inputs each get their message', () => {
    expect(message('  ', LENGTH_MM)).toBe('enter a length such as 610 mm or 24 in');
    expect(message('610 mn', LENGTH_MM)).toBe('"mn" is not a unit Wetmode knows; expected a length such as 610 mm or 24 in');
    expect(message('sqrt(4) m', LENGTH_MM)).toBe('"sqrt" is not available here: type a number and a unit, such as 610 mm');
    expect(message('1 m to ft', LENGTH_MM)).toBe('"to" is not available here: type a number and a unit, such as 610 mm');
    expect(message('610 mm)', LENGTH_MM)).toBe('could not read "610 mm)"; expected a length such as 610 mm or 24 in');
    expect(message('2 m + 3 kg', LENGTH_MM)).toBe('"2 m + 3 kg" adds or subtracts quantities of different kinds; expected a length such as 610 mm or 24 in');
    expect(message('mm', LENGTH_MM)).toBe('"mm" has no number; expected a length such as 610 mm or 24 in');
    expect(message('1/0 m', LENGTH_MM)).toBe('"1/0 m" is not a finite number; expected a length such as 610 mm or 24 in');
    expect(message('20 % 3', { dimension: 'ratio', unit: '' })).toBe('"20 % 3": put % only at the end of a ratio, such as 20 %');
  });

  it('ambiguous commas are refused rather than guessed', () => {
    expect(message('1,200 mm', LENGTH_MM)).toBe('"1,200" is ambiguous: write 1200 or 1.200 (use a point for decimals, no thousands separators)');
    expect(message('1,200.5 mm', LENGTH_MM)).toBe('"1,200.5 mm" mixes a comma and a point: write the number without thousands separators, e.g. 1200.5');
    expect(message('1,2,3', LENGTH_MM)).toBe('"1,2,3" has more than one comma: write one number with a point for decimals');
  });
});

describe('parseQuantityList reads lists such as guide elevations', () => {
  const M: QuantityOptions = { dimension: 'length', unit: 'm' };

  it('commas separate items, bare numbers take the shown unit, empty text is an empty list', () => {
    const r = parseQuantityList('3 m, 12, 70 ft', M);
    expect(r.ok && r.valuesSI).toEqual([3, 12, 70 * 0.3048]);
    expect(parseQuantityList('  ', M)).toEqual({ ok: true, valuesSI: [] });
    expect(parseQuantityList('3, 12,', M)).toEqual({ ok: true, valuesSI: [3, 12] });
  });

  it('with semicolons as separators, commas are decimal commas', () => {
    const r = parseQuantityList('3,5 m; 12; 21,25', M);
    expect(r.ok && r.valuesSI).toEqual([3.5, 12, 21.25]);
  });

  it('a bad item is named by its position', () => {
    const r = parseQuantityList('3 m, 5 kg, 21 m', M);
    expect(r).toEqual({ ok: false, message: 'item 2 ("5 kg"): expected a length such as 610 mm or 24 in, got a mass (5 kg)' });
  });
});
