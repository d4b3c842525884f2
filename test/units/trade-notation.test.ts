import { describe, expect, it } from 'vitest';
import { echoQuantity, parseQuantity, unitTypedIn, type QuantityOptions } from '../../src/units';
import { expectClose } from '../helpers/expect-close';

// Conversion factors: NIST Special Publication 811 (2008), Appendix B — exact by definition: in = 0.0254 m,
// ft = 0.3048 m; international knot = 1852 m per hour. Tolerance 1e-12: a few floating-point operations.

const LENGTH: QuantityOptions = { dimension: 'length', unit: 'mm' };
const SPEED: QuantityOptions = { dimension: 'speed', unit: 'm/s' };

function value(text: string, options: QuantityOptions): number {
  const r = parseQuantity(text, options);
  if (!r.ok) throw new Error(`"${text}" did not parse: ${r.message}`);
  return r.valueSI;
}

describe('trade notation that a surveyor types is read as meant', () => {
  it.each([
    ['1.5 kt', 1.5 * 1852 / 3600],
    ['1.5kt', 1.5 * 1852 / 3600],
    ['3 kts', 3 * 1852 / 3600],
    ['2 kn', 2 * 1852 / 3600],
    ['1,5 kt', 1.5 * 1852 / 3600],
  ])('a current of %s is read in knots, not kilotonnes (NIST SP 811: knot = 1852 m/h)', (text, expected) => {
    expectClose(value(text, SPEED), expected, { rtol: 1e-12, label: text });
  });

  it.each([
    ['24"', 24 * 0.0254],
    ['24 "', 24 * 0.0254],
    ['24\u2033', 24 * 0.0254],
    ["6'", 6 * 0.3048],
    ['6\u2032', 6 * 0.3048],
    ['6\u2019', 6 * 0.3048],
    ["2' 6\"", 2 * 0.3048 + 6 * 0.0254],
    ["2'6\"", 2 * 0.3048 + 6 * 0.0254],
    ['2 ft 6 in', 2 * 0.3048 + 6 * 0.0254],
    ['2 ft 6.5 in', 2 * 0.3048 + 6.5 * 0.0254],
    ["1.5'", 1.5 * 0.3048],
  ])('length %s is read as feet and inches (NIST SP 811)', (text, expected) => {
    expectClose(value(text, LENGTH), expected, { rtol: 1e-12, label: text });
  });

  it('a lone quote mark with no number still gets a message, not a guess', () => {
    const r = parseQuantity('"', LENGTH);
    expect(r.ok).toBe(false);
  });
});

describe('the understood value is echoed in the other system', () => {
  const SPEED = { si: 'm/s', us: 'ft/s' };
  const DIAMETER = { si: 'mm', us: 'in' };
  const LENGTH_M = { si: 'm', us: 'ft' };

  it('knots echo in metres per second and metres per second echo in knots (1 kn = 1852/3600 m/s, exact by definition)', () => {
    expect(echoQuantity((1.5 * 1852) / 3600, 'speed', unitTypedIn('1.5 kt', 'm/s'), SPEED)).toBe('= 0.7717 m/s');
    expect(echoQuantity(1, 'speed', unitTypedIn('1', 'm/s'), SPEED)).toBe('= 1.944 kn');
  });

  it('inches echo in millimetres, millimetres in inches, a bare number by the shown unit (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(echoQuantity(0.6096, 'length', unitTypedIn('24"', 'mm'), DIAMETER)).toBe('= 609.6 mm');
    expect(echoQuantity(0.61, 'length', unitTypedIn('610 mm', 'in'), DIAMETER)).toBe('= 24.02 in');
    expect(echoQuantity(0.61, 'length', unitTypedIn('610', 'mm'), DIAMETER)).toBe('= 24.02 in');
    expect(echoQuantity(0.61, 'length', unitTypedIn('61 cm', 'in'), DIAMETER)).toBe('= 24.02 in');
    expect(echoQuantity(0.6096, 'length', unitTypedIn('24', 'in'), DIAMETER)).toBe('= 609.6 mm');
  });

  it('a length in metres echoes in the field\'s own US unit, feet, and feet and inches typed together echo in metres (1 ft = 0.3048 m exactly, NIST SP 811)', () => {
    expect(echoQuantity(9.5, 'length', unitTypedIn('9.5 m', 'ft'), LENGTH_M)).toBe('= 31.17 ft');
    expect(echoQuantity(0.762, 'length', unitTypedIn(`2' 6"`, 'm'), LENGTH_M)).toBe('= 0.762 m');
    expect(echoQuantity(0.762, 'length', unitTypedIn('2 ft 6 in', 'm'), LENGTH_M)).toBe('= 0.762 m');
  });

  it('the unit typed is the last unit expression of the text; an exponent is part of the number', () => {
    expect(unitTypedIn('1025 kg/m^3', 'lb/ft^3')).toBe('kg/m^3');
    expect(unitTypedIn('50 kN m/rad', 'lbf ft/rad')).toBe('kN m/rad');
    expect(unitTypedIn('3e5', 'mm')).toBe('mm');
    expect(unitTypedIn('3 kts', 'm/s')).toBe('knot');
  });

  it('quantities that read the same in both systems have no echo', () => {
    expect(echoQuantity(8, 'time', '8 s', { si: 's', us: 's' })).toBe('');
    expect(echoQuantity(0.2, 'ratio', '%', { si: '%', us: '%' })).toBe('');
  });
});
