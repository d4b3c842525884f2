import { describe, expect, it } from 'vitest';
import { solveMember } from '../../../src/physics/beam';
import { memberBand } from '../../../src/physics/uncertain/band';
import { lineMinimum, SEARCH_RTOL } from '../../../src/physics/uncertain/search';
import { expectClose } from '../../helpers/expect-close';
import { uniformMember, uniformProps } from '../beam/fixtures';

/** f counted: how many evaluations a line search spends. */
function counted(f: (x: number) => number) {
  const calls: number[] = [];
  return { calls, f: (x: number) => (calls.push(x), f(x)) };
}

const OPTS = { xTolerance: 1e-4, fTolerance: 1e-12, maxEvaluations: 30 };

describe('bounded line search with the range ends evaluated', () => {
  it('a function least at a range end is answered at that end in three evaluations, not by creeping towards it', () => {
    // f(x) = x on [1, 2], started mid-way: least at x = 1 exactly (classical).
    const c = counted((x) => x);
    const m = lineMinimum(c.f, 1, 2, 1.5, 1.5, OPTS);
    expect(m.x).toBe(1);
    expect(m.fx).toBe(1);
    // The two ends and the inward step from the better end.
    expect(c.calls.length).toBe(3);
  });

  it('started at an end, one inward step settles it when the slope points out of the range; otherwise the search goes on inside', () => {
    const c = counted((x) => (x - 0.2) ** 2);
    const m = lineMinimum(c.f, 0, 1, 1, 0.64, OPTS);
    expectClose(m.x, 0.2, { rtol: 1e-3, label: 'interior minimum reached from the far end' });
    const d = counted((x) => x * x);
    const e = lineMinimum(d.f, 0, 1, 0, 0, OPTS);
    expect(e.x).toBe(0);
    expect(d.calls.length).toBe(1);
  });

  it('an interior minimum is found by Brent steps and beats both ends', () => {
    // (x − 0.3)² + 1 on [0, 1]: least value 1 at 0.3 (classical); an x error of 1e-4 leaves 1e-8 in f.
    const m = lineMinimum((x) => (x - 0.3) ** 2 + 1, 0, 1, 0.9, 1.36, OPTS);
    expectClose(m.x, 0.3, { rtol: 1e-3, label: 'place of the minimum' });
    expectClose(m.fx, 1, { rtol: 1e-8, label: 'least value' });
  });

  it('an end lower than an interior dip is preferred to the dip', () => {
    // Dip to 0.5 at x = 0.6, but f(0) = 0: the bounded minimum is the end (cross-check by inspection).
    const f = (x: number) => (x < 0.2 ? 5 * x : 1 - 0.5 * Math.exp(-200 * (x - 0.6) ** 2));
    const m = lineMinimum(f, 0, 1, 0.55, f(0.55), OPTS);
    expect(m.x).toBe(0);
  });
});

describe('band bracket against a dense grid (cross-check)', () => {
  it('a beam with a moving middle pin and a ranged mass at 2 m holds every point of a 31 × 31 grid, with its interior peak found', () => {
    // Pinned–pinned 10 m beam with a third pin over [3, 7] m and a point mass at 2 m over [0, 300] kg: the
    // lowest frequency peaks inside the pin's range (near mid-span, the node of the second pinned–pinned mode),
    // so the band needs the sampled search. The grid is solved on the same fixed mesh as the band, so the only
    // gap is how far the search stops short of the true extreme.
    const L = 10;
    const { m } = uniformProps();
    const mesh = { initialElements: 40, refine: false };
    const model = uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: 4, kind: 'pinned' }, { atM: L, kind: 'pinned' }], {
      modes: 3,
      mesh,
      masses: [{ atM: 2, massKg: 0.5 * m }],
    });
    const ranges = [
      { path: 'supports.1.atM', low: 3, high: 7 },
      { path: 'masses.0.massKg', low: 0, high: 3 * m },
    ];
    const out = memberBand(model, ranges, { maxSolves: 200 });
    if (!out.ok) throw new Error(out.message);
    const band = out.band;
    expect(band.dry.modes[0].method).toBe('sampled');
    expect(band.budgetExhausted).toBe(false);
    const n = 31;
    const lo = [Infinity, Infinity, Infinity];
    const hi = [-Infinity, -Infinity, -Infinity];
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const at = 3 + (4 * i) / (n - 1);
        const mass = (3 * m * j) / (n - 1);
        const r = solveMember({ ...model, supports: [model.supports[0], { atM: at, kind: 'pinned' }, model.supports[2]], masses: [{ atM: 2, massKg: mass }] });
        if (!r.ok) throw new Error(r.message);
        r.result.dry.frequenciesHz.forEach((f, k) => {
          lo[k] = Math.min(lo[k], f);
          hi[k] = Math.max(hi[k], f);
        });
      }
    }
    for (let k = 0; k < 3; k++) {
      // Every grid value lies within the band, up to the search's stopping precision SEARCH_RTOL (the band's
      // ends are values actually solved, so they cannot lie beyond the true extremes).
      expect(lo[k], `mode ${k + 1} low`).toBeGreaterThanOrEqual(band.dry.lowHz[k] * (1 - SEARCH_RTOL));
      expect(hi[k], `mode ${k + 1} high`).toBeLessThanOrEqual(band.dry.highHz[k] * (1 + SEARCH_RTOL));
      // And the band is no wider than the grid by more than the grid's coarseness can hide (1 %: a 31-point
      // grid misses a smooth peak by well under that).
      expectClose(band.dry.lowHz[k], lo[k], { rtol: 1e-2, label: `mode ${k + 1} low against the grid` });
      expectClose(band.dry.highHz[k], hi[k], { rtol: 1e-2, label: `mode ${k + 1} high against the grid` });
    }
    // The peak is inside the pin's range, not at a corner.
    const peakAt = band.dry.modes[0].highAt[0];
    expect(peakAt).toBeGreaterThan(3.1);
    expect(peakAt).toBeLessThan(6.9);
  });
});
