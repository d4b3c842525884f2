/** Added mass of bodies moving together, in opposition or alone, from the full added-mass matrix. */
import { describe, expect, it } from 'vitest';
import { patternAddedMass } from '../../../src/ui/section/motion-pattern';

// Two bodies, 6 × 6: own sway terms 800 and 600 kg/m, sway coupling −150 kg/m (as for two cylinders side by side,
// where moving one drags the liquid back past the other); heave terms and rotation set apart so they cannot leak in.
const M = [
  [800, 0, 0, -150, 0, 0],
  [0, 900, 0, 0, 40, 0],
  [0, 0, 5, 0, 0, 0],
  [-150, 0, 0, 600, 0, 0],
  [0, 40, 0, 0, 700, 0],
  [0, 0, 0, 0, 0, 5],
];

describe('added mass in a motion pattern', () => {
  it('together, each body feels its own term plus the coupling, and the total is the sum of all sway terms (cross-check by hand)', () => {
    const r = patternAddedMass(M, 'together', 'x');
    expect(r.perBody).toEqual([650, 450]);
    expect(r.total).toBe(800 + 600 - 2 * 150);
  });

  it('in opposition the coupling changes sign (cross-check by hand)', () => {
    const r = patternAddedMass(M, 'opposition', 'x');
    expect(r.perBody).toEqual([950, 750]);
    expect(r.total).toBe(800 + 600 + 2 * 150);
  });

  it('one at a time, each body feels only its own diagonal term; heave reads the y terms', () => {
    expect(patternAddedMass(M, 'alone', 'x').perBody).toEqual([800, 600]);
    expect(patternAddedMass(M, 'together', 'y').perBody).toEqual([940, 740]);
  });
});
