/** Shared helpers for the band and calibration tests (invented members; common steel values). */
import { solveMember, type MemberModel } from '../../../src/physics/beam';
import type { InputRange } from '../../../src/physics/uncertain/ranges';

/** Roots of g on [a, b] by a fine scan and bisection (a simple root finder for cross-checks, kept apart from Brent's). */
export function scanRoots(g: (x: number) => number, a: number, b: number, steps = 4000): number[] {
  const roots: number[] = [];
  let x0 = a;
  let g0 = g(a);
  for (let i = 1; i <= steps; i++) {
    const x1 = a + ((b - a) * i) / steps;
    const g1 = g(x1);
    if (g0 === 0) roots.push(x0);
    else if (g0 * g1 < 0) {
      let lo = x0;
      let hi = x1;
      let glo = g0;
      for (let k = 0; k < 200; k++) {
        const mid = 0.5 * (lo + hi);
        const gm = g(mid);
        if (gm * glo <= 0) hi = mid;
        else {
          lo = mid;
          glo = gm;
        }
      }
      roots.push(0.5 * (lo + hi));
    }
    x0 = x1;
    g0 = g1;
  }
  return roots;
}

/**
 * λ_n of a uniform cantilever with a tip mass μ = M/(mL), no rotary inertia, from the frequency equation
 * 1 + cos λ cosh λ + μλ(cos λ sinh λ − sin λ cosh λ) = 0 (R.D. Blevins, Formulas for Natural Frequency and
 * Mode Shape, Table 8-8). The equation is divided by cosh λ so it stays of order one for large λ.
 */
export function tipMassLambdas(mu: number, count: number): number[] {
  const g = (l: number) => 1 / Math.cosh(l) + Math.cos(l) + mu * l * (Math.cos(l) * Math.tanh(l) - Math.sin(l));
  return scanRoots(g, 0.05, 4 * count, 4000 * count).slice(0, count);
}

/** Frequencies of a model solved directly (throws on failure, for tests). */
export function freqs(model: MemberModel, state: 'dry' | 'wet'): number[] {
  const out = solveMember(model);
  if (!out.ok) throw new Error(out.message);
  return state === 'dry' ? out.result.dry.frequenciesHz : out.result.wet!.frequenciesHz;
}

/** Six uncertain inputs of the Port Halloran fender pile example, of the size a surveyor would enter (invented). */
export const PILE_RANGES: InputRange[] = [
  { path: 'masses.0.massKg', low: 1500, high: 4000 },
  { path: 'liquid.toM', low: 14, high: 18 },
  { path: 'segments.1.coating.thicknessM', low: 0, high: 0.1 },
  { path: 'segments.1.coating.densityKgPerM3', low: 1000, high: 1400 },
  { path: 'soilSprings.0.modulusNPerM2', low: 3e6, high: 12e6 },
  { path: 'soilSprings.0.toM', low: 4.5, high: 6 },
];
