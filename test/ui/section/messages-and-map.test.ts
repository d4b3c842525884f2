import { describe, expect, it } from 'vitest';
import type { SectionInput } from '../../../src/physics/section';
import type { SectionField } from '../../../src/app/solve-section';
import { humanise, locate } from '../../../src/ui/section/messages';
import { mapDisplay, nearestPoint, valueAt } from '../../../src/ui/section/map-values';
import { expectClose } from '../../helpers/expect-close';

describe('solver messages in the editor’s words', () => {
  const names = ['the wall below', 'the enclosure'];
  it('names bodies and boundaries as the screen does, counting from 1', () => {
    expect(humanise('bodies[1] lies entirely on the dry side of boundaries[0] (its normal points into the liquid)', names)).toBe(
      'Body 2 lies entirely on the dry side of the wall below (its normal points into the liquid)',
    );
    expect(humanise('bodies[0].diameterM must be a finite number > 0, got -2', names)).toBe('The diameter of body 1 must be a finite number > 0, got -2');
    expect(humanise('the enclosure boundaries[1] lies entirely on the dry side of boundaries[0]', names)).toBe(
      'The enclosure lies entirely on the dry side of the wall below',
    );
    expect(humanise('bodies[2].pointsM has a zero-length edge: points 3 and 0 coincide at [0, 0]', names)).toBe(
      'The outline of body 3 has a zero-length edge: points 4 and 1 coincide at [0, 0]',
    );
  });

  it('places a message at the first body it names, else the first boundary', () => {
    expect(locate('bodies[0] and bodies[1] overlap')).toEqual({ body: 0 });
    expect(locate('bodies[2] lies outside boundaries[1]')).toEqual({ body: 2 });
    expect(locate('boundaries[0] and boundaries[1] are not perpendicular')).toEqual({ boundary: 0 });
    expect(locate('at most one enclosure')).toBeNull();
  });
});

const input: SectionInput = { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'rectangle', widthM: 2, heightM: 2 }] };
const field = (motion: SectionField['motion']): SectionField => ({
  body: 0,
  motion,
  grid: { x0: -2, y0: -2, x1: 2, y1: 2, nx: 5, ny: 5 },
  speed: Array.from({ length: 25 }, (_, k) => k / 10),
  potential: Array.from({ length: 25 }, (_, k) => (k - 12) / 10),
  maxSpeed: 2.4,
  liquidPoints: 25,
});
const mm = (m: number) => `${m * 1000} mm`;

describe('flow map values relative to the body’s motion', () => {
  it('shows translation speeds as they are (per unit body speed)', () => {
    const d = mapDisplay(field('x'), input, 'speed', mm);
    expect(d.factor).toBe(1);
    expect(d.max).toBe(2.4);
    expect(d.basis).toBe('U = the body speed');
  });

  it('divides rotation speeds by the edge speed Ω r, r the farthest point from the centre', () => {
    const d = mapDisplay(field('rotation'), input, 'speed', (m) => m.toFixed(3) + ' m');
    // A 2 m square: r = half its diagonal, √2 m.
    expectClose(d.factor, 1 / Math.SQRT2, { rtol: 1e-12, label: 'rotation speed factor' });
    expectClose(d.max, 2.4 / Math.SQRT2, { rtol: 1e-12, label: 'largest speed ratio' });
    expect(d.basis).toBe("U = Ω r, the body's edge speed (r = 1.414 m, the farthest point of body 1 from its centre)");
  });

  it('makes the potential dimensionless with L = r, and sizes its bands to the largest value', () => {
    const d = mapDisplay(field('y'), input, 'potential', mm);
    expectClose(d.factor, 1 / Math.SQRT2, { rtol: 1e-12, label: 'potential factor' });
    // Largest |φ| = 1.2; ×1/√2 = 0.849; bands of 0.2 (the round step at or above 0.849 / 5).
    expectClose(d.max, 1.2 / Math.SQRT2, { rtol: 1e-12, label: 'largest potential' });
    expect(d.scale.edges[6]).toBe(0.2);
  });

  it('reads the value nearest a tapped point, none outside the grid', () => {
    const f = field('x');
    // (1.1, -0.9) is nearest grid point (ix 3, iy 1): k = 8, speed 0.8.
    expect(valueAt(f, f.speed, 1, 1.1, -0.9)).toBe(0.8);
    expect(valueAt(f, f.speed, 2, 1.1, -0.9)).toBe(1.6);
    expect(valueAt(f, f.speed, 1, 3, 0)).toBeNaN();
    expect(nearestPoint(f, 1.1, -0.9)).toEqual({ k: 8, x: 1, y: -1 });
    expect(nearestPoint(f, -2.6, 0)).toBeNull();
  });
});

import { answerProblem, inputKey } from '../../../src/ui/section/section-solves';

describe('what the view says when a solve gives no numbers', () => {
  it('words a timeout, a crash and a solver failure; says nothing for a superseded request', () => {
    // The same sentences as the Member and Results screens (ui/state/solver-words.ts), with the Section screen's advice.
    expect(answerProblem({ status: 'timeout', afterMs: 60000 })).toBe('The solver took longer than 60 s and was stopped. Try fewer bodies.');
    expect(answerProblem({ status: 'crashed', message: 'out of memory' })).toBe(
      'The solver stopped unexpectedly (out of memory). Your section is kept; change a value to try again.',
    );
    expect(answerProblem({ status: 'superseded' })).toBeNull();
    expect(answerProblem({ status: 'done', value: { ok: false, reason: 'singular-system', message: 'the boundary-element system is singular' } })).toBe(
      'No numbers for this section: the boundary-element system is singular.',
    );
  });

  it('keys an input by its content, and no input by the empty key', () => {
    const a = { liquidDensityKgPerM3: 1025, bodies: [{ shape: 'circle' as const, diameterM: 1 }] };
    expect(inputKey(a)).toBe(inputKey(JSON.parse(JSON.stringify(a))));
    expect(inputKey({ ...a, liquidDensityKgPerM3: 998 })).not.toBe(inputKey(a));
    expect(inputKey(null)).toBe('');
  });
});
