import { describe, expect, it } from 'vitest';
import type { SectionInput } from '../../../src/physics/section';
import { bodyOutline, bodyReference, boxOf, clearance, dryPart, farthestRadius, lineInBox, polygonCentroid } from '../../../src/ui/section/geometry';
import { expectClose } from '../../helpers/expect-close';

describe('section geometry for drawing', () => {
  it('turns a rectangle about its centre, anticlockwise', () => {
    const out = bodyOutline({ shape: 'rectangle', widthM: 2, heightM: 1, centerM: [1, 1], angleDeg: 90 });
    const [x0, y0, x1, y1] = boxOf(out);
    // After a quarter turn the 2 m width runs along y (round-off tolerance).
    expectClose(x1 - x0, 1, { atol: 1e-12, label: 'width after turning' });
    expectClose(y1 - y0, 2, { atol: 1e-12, label: 'height after turning' });
    expectClose(x0, 0.5, { atol: 1e-12, label: 'left edge' });
    expectClose(y0, 0, { atol: 1e-12, label: 'bottom edge' });
  });

  it('keeps a rounded corner inside the sharp rectangle and touches its sides', () => {
    const [x0, y0, x1, y1] = boxOf(bodyOutline({ shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.05 }));
    expect([x0, y0, x1, y1].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([-0.2, -0.1, 0.2, 0.1]);
  });

  it('takes the area centroid of a polygon as its reference point, unless a centre is given', () => {
    // A right triangle's centroid is the mean of its corners (classical).
    const c = polygonCentroid([[0, 0], [3, 0], [0, 3]]);
    expectClose(c[0], 1, { atol: 1e-12, label: 'centroid x' });
    expectClose(c[1], 1, { atol: 1e-12, label: 'centroid y' });
    expect(bodyReference({ shape: 'polygon', pointsM: [[0, 0], [3, 0], [0, 3]], centerM: [2, 2] })).toEqual([2, 2]);
  });

  it('measures the farthest point from the centre: the radius of a circle, half the diagonal of a square', () => {
    // Classical geometry: circle radius D/2; unit square half-diagonal √2/2.
    expectClose(farthestRadius({ shape: 'circle', diameterM: 0.5, centerM: [3, -1] }), 0.25, { rtol: 1e-12, label: 'circle' });
    expectClose(farthestRadius({ shape: 'rectangle', widthM: 1, heightM: 1 }), Math.SQRT1_2, { rtol: 1e-12, label: 'square' });
  });

  it('clips a wall line to the box and finds its dry side', () => {
    const wall = { kind: 'wall' as const, pointM: [0, -1] as const, normal: [0, 1] as const };
    const seg = lineInBox(wall, [-2, -2, 2, 2])!;
    // Either direction along the line.
    expect([Math.min(seg[0], seg[2]), seg[1], Math.max(seg[0], seg[2]), seg[3]]).toEqual([-2, -1, 2, -1]);
    expect(lineInBox(wall, [-2, 0, 2, 2])).toBeNull();
    expect(dryPart(wall, [-2, -2, 2, 2])).toEqual([-2, -2, 2, -2, 2, -1, -2, -1]);
    expect(dryPart(wall, [-2, 0, 2, 2])).toEqual([]);
  });

  it('gives the clear gap between the bodies and a boundary, negative when a body crosses it', () => {
    const input: SectionInput = { liquidDensityKgPerM3: 1025, bodies: [{ shape: 'circle', diameterM: 0.9 }] };
    const bed = { kind: 'wall' as const, pointM: [0, -0.9] as const, normal: [0, 1] as const };
    // Sampled outline: the lowest sample sits exactly at the bottom of the circle (256 samples per turn).
    expectClose(clearance(input, bed), 0.45, { rtol: 1e-12, label: 'gap to the seabed' });
    const surface = { kind: 'free-surface' as const, pointM: [0, 0] as const, normal: [0, -1] as const };
    expectClose(clearance(input, surface), -0.45, { rtol: 1e-12, label: 'float crossing the surface' });
  });
});
