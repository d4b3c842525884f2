/**
 * `extremeSamples` picks, from the dense samples of an outline, the few that can be farthest along a
 * direction; the model takes a body's extents and its clip test from them. Cross-check: the largest
 * projection over those candidates is the very same number as over every sample of `sampleChain`.
 */
import { describe, expect, test } from 'vitest';
import { extremeSamples, sampleChain } from '../../../src/physics/section/pieces';
import { bodyOutline, reverseChain } from '../../../src/physics/section/shapes';
import type { BodySpec } from '../../../src/physics/section/types';

// Invented outlines: smooth, rotated, with rounded and sharp corners, and a polygon.
const bodies: [string, BodySpec][] = [
  ['a circle off the origin', { shape: 'circle', diameterM: 0.61, centerM: [2, -1] }],
  ['an ellipse turned 25°', { shape: 'ellipse', widthM: 1, heightM: 0.4, angleDeg: 25, centerM: [0.3, 0.2] }],
  ['a rounded rectangle turned 30°', { shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.02, angleDeg: 30 }],
  ['a thin plate turned 90°', { shape: 'plate', widthM: 0.25, thicknessM: 0.012, angleDeg: 90 }],
  ['a polygon', { shape: 'polygon', pointsM: [[0, 0], [0.5, 0.1], [0.4, 0.6], [-0.2, 0.3]] }],
];

describe('extreme samples of an outline', () => {
  for (const [name, body] of bodies) {
    test(`give the same largest projection as all samples for ${name}, in 24 directions and both orientations`, () => {
      const outline = bodyOutline(body).pieces;
      for (const pieces of [outline, reverseChain(outline.slice())]) {
        for (const perTurn of [256, 4096]) {
          const all = sampleChain(pieces, perTurn);
          for (let k = 0; k < 24; k++) {
            const dx = Math.cos((k * Math.PI) / 12 + 0.1);
            const dy = Math.sin((k * Math.PI) / 12 + 0.1);
            let best = -Infinity;
            for (let q = 0; q < all.length; q += 2) best = Math.max(best, dx * all[q] + dy * all[q + 1]);
            const cand: number[] = [];
            extremeSamples(pieces, perTurn, dx, dy, cand);
            let got = -Infinity;
            for (let q = 0; q < cand.length; q += 2) got = Math.max(got, dx * cand[q] + dy * cand[q + 1]);
            expect(got, `${name}, ${perTurn} per turn, direction ${k}`).toBe(best);
            expect(cand.length).toBeLessThanOrEqual(all.length);
          }
        }
      }
    });
  }
});
