/** Flow-speed map: values against the exact circle flow, masks, caller buffers and argument checks. */
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../helpers/expect-close';
import { flowField, flowFieldInto } from '../../../src/physics/section/index';
import { alone } from './helpers';

describe('flow-speed map', () => {
  test('a translating circle gives |∇φ| = U R²/r² and φ = −U R² x / r² (classical dipole, Lamb)', () => {
    const R = 0.5;
    const input = alone({ shape: 'circle', diameterM: 2 * R });
    const grid = { x0: -2, y0: -2, x1: 2, y1: 2, nx: 9, ny: 9 };
    const speed = new Float64Array(81);
    const phi = new Float64Array(81);
    const out = flowFieldInto(input, 0, 'x', grid, speed, phi);
    expect(out.ok).toBe(true);
    for (let iy = 0; iy < 9; iy++) {
      for (let ix = 0; ix < 9; ix++) {
        const x = -2 + 0.5 * ix, y = -2 + 0.5 * iy;
        const r2 = x * x + y * y;
        const k = iy * 9 + ix;
        if (r2 < R * R) {
          expect(speed[k]).toBeNaN();
          continue;
        }
        if (r2 === R * R) continue; // on the outline: either value is acceptable
        // Discretisation error of the field at ≥ one radius from the outline: ~1e-5 (default panels);
        // 1e-3 relative to the surface speed U bounds it.
        expectClose(speed[k], (R * R) / r2, { atol: 1e-3, label: `speed at (${x}, ${y})` });
        expectClose(phi[k], (-R * R * x) / r2, { atol: 1e-3, label: `potential at (${x}, ${y})` });
      }
    }
  });

  test('points outside the liquid are NaN: dry side, inside an enclosure wall, inside a body', () => {
    const input = alone({ shape: 'circle', diameterM: 0.4, centerM: [0, -0.5] }, [
      { kind: 'enclosure', shape: 'circle', diameterM: 2 },
      { kind: 'free-surface', pointM: [0, 0], normal: [0, -1] },
    ]);
    const { result, speed } = flowField(input, 0, 'y', { x0: -1.5, y0: -1.5, x1: 1.5, y1: 1.5, nx: 31, ny: 31 });
    expect(result.ok).toBe(true);
    const at = (x: number, y: number) => speed[Math.round((y + 1.5) / 0.1) * 31 + Math.round((x + 1.5) / 0.1)];
    expect(at(0, 0.5)).toBeNaN(); // above the free surface
    expect(at(1.4, -1.4)).toBeNaN(); // outside the enclosure
    expect(at(0, -0.5)).toBeNaN(); // inside the body
    expect(at(0.5, -0.5)).toBeGreaterThan(0);
    if (result.ok) expect(result.maxSpeed).toBeGreaterThan(0);
  });

  test('the map is written into the caller’s buffer', () => {
    const speed = new Float64Array(16).fill(-1);
    const out = flowFieldInto(alone({ shape: 'ellipse', widthM: 1, heightM: 0.5 }), 0, 'rotation', { x0: 1, y0: 1, x1: 2, y1: 2, nx: 4, ny: 4 }, speed);
    expect(out.ok && out.liquidPoints).toBe(16);
    expect(Array.from(speed).every((v) => v > 0)).toBe(true);
  });

  test('bad arguments are rejected with clear messages', () => {
    const input = alone({ shape: 'circle', diameterM: 1 });
    const g = { x0: 0, y0: 0, x1: 1, y1: 1, nx: 4, ny: 4 };
    expect(() => flowFieldInto(input, 1, 'x', g, new Float64Array(16))).toThrow('body must be an integer from 0 to 0, got 1');
    expect(() => flowFieldInto(input, 0, 'z' as never, g, new Float64Array(16))).toThrow('motion must be one of x, y, rotation, got z');
    expect(() => flowFieldInto(input, 0, 'x', { ...g, nx: 1 }, new Float64Array(16))).toThrow('grid.nx and grid.ny must be integers ≥ 2, got 1 × 4');
    expect(() => flowFieldInto(input, 0, 'x', { ...g, x1: NaN }, new Float64Array(16))).toThrow('grid.x1 must be a finite number, got NaN');
    expect(() => flowFieldInto(input, 0, 'x', g, new Float64Array(3))).toThrow('speed must hold nx·ny = 16 values, got 3');
  });
});
