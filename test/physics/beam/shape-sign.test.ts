import { describe, expect, it } from 'vitest';
import type { MemberSystem } from '../../../src/physics/beam/assemble';
import { modeResult } from '../../../src/physics/beam/modes';
import { SHAPE_PEAK_TIE } from '../../../src/physics/linalg/shape-sign';

/** Just what modeResult reads: node positions and the DOF map (node i: w at 2i, rotation at 2i + 1), nothing fixed. */
function freeSystem(nodes: number): MemberSystem {
  const dofMap = Int32Array.from({ length: 2 * nodes }, (_, k) => k);
  return { mesh: { z: Float64Array.from({ length: nodes }, (_, i) => i) }, dofMap, n: 2 * nodes } as unknown as MemberSystem;
}

/** A reduced eigenvector with the given lateral displacements at the nodes (rotations 0). */
function vectorOf(w: number[]): Float64Array {
  const x = new Float64Array(2 * w.length);
  w.forEach((v, i) => (x[2 * i] = v));
  return x;
}

describe('the sign of a reported beam mode shape', () => {
  it('puts +1 at the first of two equal and opposite peaks, whichever rounds larger', () => {
    // An antisymmetric shape: −p near z = 0, +p further on. The first peak must come out +1 whether the later
    // one is larger by rounding (1e-12 relative, far inside the 1e-6 tie) or smaller.
    for (const later of [1 + 1e-12, 1, 1 - 1e-12]) {
      const x = vectorOf([0, -0.5, -1, 0, 1 * later, 0.5, 0]);
      const shape = modeResult(freeSystem(7), 1, x, 1, null).shape.displacement;
      expect(shape[2]).toBeGreaterThan(0);
      expect(shape[4]).toBeLessThan(0);
      // Scaled by the larger |value|: nothing exceeds 1 in magnitude, and the peaks are ±1 to the rounding difference.
      expect(Math.max(...shape.map(Math.abs))).toBe(1);
      expect(Math.abs(shape[2] - 1)).toBeLessThan(2e-12);
    }
  });

  it('still follows the larger peak when the two differ by more than the tie tolerance', () => {
    // The later peak is larger by 10× the tolerance: it is the peak, and it is made positive.
    const x = vectorOf([0, -1, 0, 1 + 10 * SHAPE_PEAK_TIE, 0]);
    const shape = modeResult(freeSystem(5), 1, x, 1, null).shape.displacement;
    expect(shape[3]).toBe(1);
    expect(shape[1]).toBeLessThan(0);
  });

  it('gives the same shape for a vector and its negative', () => {
    const w = [0, 0.3, -0.7, 0.7, -0.2];
    const a = modeResult(freeSystem(5), 1, vectorOf(w), 1, null).shape.displacement;
    const b = modeResult(freeSystem(5), 1, vectorOf(w.map((v) => -v)), 1, null).shape.displacement;
    expect(b).toEqual(a);
    expect(a[2]).toBe(1);
  });
});
