import { describe, expect, it } from 'vitest';
import { echoQuantity, parseQuantity, type QuantityOptions } from '../../src/units';
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
  it('knots echo in metres per second and metres per second echo in knots (1 kn = 1852/3600 m/s)', () => {
    expect(echoQuantity(1.5 * 1852 / 3600, 'speed', '1.5 kt', 'm/s')).toBe('= 0.7717 m/s');
    expect(echoQuantity(1, 'speed', '1', 'm/s')).toBe('= 1.944 knot');
  });

  it('inches echo in millimetres, millimetres in inches, a bare number by the shown unit', () => {
    expect(echoQuantity(0.6096, 'length', '24"', 'mm')).toBe('= 609.6 mm');
    expect(echoQuantity(0.61, 'length', '610 mm', 'in')).toBe('= 24.02 in');
    expect(echoQuantity(0.61, 'length', '610', 'mm')).toBe('= 24.02 in');
    expect(echoQuantity(0.6096, 'length', '24', 'in')).toBe('= 609.6 mm');
  });

  it('quantities that read the same in both systems have no echo', () => {
    expect(echoQuantity(8, 'time', '8 s', 's')).toBe('');
    expect(echoQuantity(0.2, 'ratio', '20 %', '%')).toBe('');
  });
});
