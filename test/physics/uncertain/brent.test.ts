import { describe, expect, it } from 'vitest';
import { brentMinimum, brentZero } from '../../../src/physics/uncertain/brent';
import { expectClose } from '../../helpers/expect-close';

function root(f: (x: number) => number, a: number, b: number) {
  const r = brentZero(f, a, b);
  if (!r.ok) throw new Error(r.message);
  return r;
}

describe("Brent's root search", () => {
  it('finds √2 as the root of x² − 2 to machine precision', () => {
    // √2 = 1.4142135623730951 (classical).
    const r = root((x) => x * x - 2, 0, 2);
    expectClose(r.x, Math.SQRT2, { rtol: 4e-16, label: '√2' });
  });

  it("finds the root of Wallis's cubic x³ − 2x − 5", () => {
    // Root 2.0945514815423265 (classical; the example Newton's method was first shown on).
    const r = root((x) => x ** 3 - 2 * x - 5, 2, 3);
    expectClose(r.x, 2.0945514815423265, { rtol: 1e-15, label: 'Wallis cubic' });
    // Superlinear convergence: far fewer evaluations than the ~52 bisections to full precision.
    expect(r.evaluations).toBeLessThan(15);
  });

  it('finds the fixed point of cos x (the Dottie number)', () => {
    // 0.7390851332151607 (classical).
    expectClose(root((x) => Math.cos(x) - x, 0, 1).x, 0.7390851332151607, { rtol: 1e-15, label: 'cos x = x' });
  });

  it('returns an end that is itself a root, and converges to a jump where the sign changes', () => {
    expect(root((x) => x - 1, 1, 3).x).toBe(1);
    const step = root((x) => (x < 0.3 ? -1 : 1), 0, 1);
    expectClose(step.x, 0.3, { rtol: 1e-14, label: 'jump' });
  });

  it('keeps a flat multiple root within the tolerance asked for', () => {
    // (x − 1)^5: root 1 (classical); tolerance 1e-10 on x.
    const r = brentZero((x) => (x - 1) ** 5, 0, 3, { xTolerance: 1e-10 });
    if (!r.ok) throw new Error(r.message);
    expect(Math.abs(r.x - 1)).toBeLessThan(1e-3);
    expect(r.evaluations).toBeLessThan(200);
  });

  it('refuses a bracket with the same sign at both ends, and a non-finite value', () => {
    const r = brentZero((x) => x * x + 1, -1, 1);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe('not-bracketed');
    const n = brentZero(() => NaN, 0, 1);
    expect(n.ok).toBe(false);
    if (!n.ok) expect(n.reason).toBe('not-finite');
  });
});

describe("Brent's minimiser", () => {
  it('finds the minimum of (x − 2)² + 1 and of −sin x on [0, π]', () => {
    // Minima at 2 and at π/2 (classical); x is found to about √ε relative, as for any minimiser of a smooth function.
    const a = brentMinimum((x) => (x - 2) ** 2 + 1, -5, 10);
    expectClose(a.x, 2, { rtol: 1e-7, label: 'parabola' });
    expectClose(a.fx, 1, { rtol: 1e-14, label: 'parabola minimum' });
    const b = brentMinimum((x) => -Math.sin(x), 0, Math.PI);
    expectClose(b.x, Math.PI / 2, { rtol: 1e-7, label: '−sin' });
  });

  it('finds a minimum at the end of the interval for a monotone function', () => {
    const r = brentMinimum((x) => x, 1, 2, { xTolerance: 1e-9 });
    expect(r.x - 1).toBeLessThan(1e-6);
  });
});
