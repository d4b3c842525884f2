import { describe, expect, it } from 'vitest';
import { axisValues, crossedModes, directionOf, mac } from '../../../src/physics/uncertain/monotone';
import { SHAPE_GRID } from '../../../src/physics/uncertain/evaluate';

/** sin(nπx) sampled on the shape grid for each n in `order`: mode-major, as `gridShapes` lays them out. */
function sines(order: number[]): Float64Array {
  const out = new Float64Array(order.length * SHAPE_GRID);
  order.forEach((n, j) => {
    for (let g = 0; g < SHAPE_GRID; g++) out[j * SHAPE_GRID + g] = Math.sin((n * Math.PI * g) / (SHAPE_GRID - 1));
  });
  return out;
}

describe('monotonicity checks', () => {
  it('axis settings are low, thirds, high and the likely value, without repeats', () => {
    expect(axisValues(0, 4, 9)).toEqual([0, 3, 4, 6, 9]);
    expect(axisValues(0, 0, 9)).toEqual([0, 3, 6, 9]);
  });

  it('a series that rises then falls is non-monotone; changes below the flat tolerance are flat', () => {
    expect(directionOf([1, 2, 3])).toBe('up');
    expect(directionOf([3, 2, 2])).toBe('down');
    expect(directionOf([1, 2, 1])).toBe('non-monotone');
    expect(directionOf([1, 1 + 1e-7, 1])).toBe('flat');
  });

  it('the modal assurance criterion is 1 for a shape with itself and 0 for orthogonal sines', () => {
    const s = sines([1, 2]);
    // Discrete sines on an equally spaced grid including both ends are exactly orthogonal (classical).
    expect(mac(s, 0, s, 0)).toBeCloseTo(1, 12);
    expect(mac(s, 0, s, 1)).toBeLessThan(1e-20);
  });

  it('two modes swapping order between settings are flagged, the others are not', () => {
    const before = sines([1, 2, 3]);
    const after = sines([1, 3, 2]);
    expect(crossedModes(before, after, 3)).toEqual([false, true, true]);
    expect(crossedModes(before, before, 3)).toEqual([false, false, false]);
  });
});
