/** Results follow the speed unit the currents were typed in. */
import { describe, expect, it } from 'vitest';
import { displayUnitsAsTyped, qty } from '../../src/ui/results/display-units';

describe('display units as typed', () => {
  it('speeds follow knots when every current was typed in knots, and the system otherwise', () => {
    expect(displayUnitsAsTyped('si', ['1.5 kt', '1 kts']).speed).toBe('knot');
    expect(displayUnitsAsTyped('us', ['0.8 m/s']).speed).toBe('m/s');
    expect(displayUnitsAsTyped('si', ['1.5 kt', '0.5 m/s']).speed).toBe('m/s');
    expect(displayUnitsAsTyped('us', ['1.2']).speed).toBe('ft/s');
    expect(displayUnitsAsTyped('si', ['1.5 kt']).length).toBe('m');
  });

  it('a critical speed of 0.7717 m/s reads as 1.5 kn (international knot = 1852 m/h, exact by definition)', () => {
    expect(qty((1.5 * 1852) / 3600, 'knot')).toBe('1.5 kn');
  });
});
