import { describe, expect, it } from 'vitest';
import { solveMember } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';
import { uniformMember, uniformProps } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();
const omegaScale = Math.sqrt(ei / (m * L ** 4));

describe('cantilever with a tip mass', () => {
  it('μ = 1 matches the published λ² values of the first four modes', () => {
    // Frequency equation 1 + cos λ cosh λ + μλ(cos λ sinh λ − sin λ cosh λ) = 0; published λ² for μ = 1:
    // Mathematical Problems in Engineering 2017, article 1568019, Table 1, reference column.
    const published = [1.557298, 16.25009, 50.89584, 105.1983];
    const out = solveMember(uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 4, masses: [{ atM: L, massKg: m * L }] }));
    if (!out.ok) throw new Error(out.message);
    published.forEach((lam2, i) => {
      const omega = 2 * Math.PI * out.result.dry.frequenciesHz[i];
      // 0.01 %: the tolerance; the published values carry 7 significant figures.
      expectClose(omega / omegaScale, lam2, { rtol: 1e-4, label: `λ² mode ${i + 1}` });
    });
  });

  it('the Rayleigh estimate with 0.2357 m L of effective beam mass is close for μ = 1', () => {
    // Classical Rayleigh approximation f1 ≈ (1/2π) √(3EI / (L³ (M + 0.2357 m L))); for μ = 1 it is
    // within about 0.1 % of the exact value (the static-deflection shape is near the true first mode).
    const M = m * L;
    const out = solveMember(uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 1, masses: [{ atM: L, massKg: M }] }));
    if (!out.ok) throw new Error(out.message);
    const rayleigh = Math.sqrt((3 * ei) / (L ** 3 * (M + 0.2357 * m * L))) / (2 * Math.PI);
    expectClose(out.result.dry.frequenciesHz[0], rayleigh, { rtol: 2e-3, label: 'Rayleigh f1' });
    // Rayleigh's quotient is an upper bound of the first eigenvalue (classical).
    expect(rayleigh).toBeGreaterThan(out.result.dry.frequenciesHz[0]);
  });

  it('rotary inertia of the tip mass lowers every frequency', () => {
    const base = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 4, masses: [{ atM: L, massKg: m * L }] });
    const withJ = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 4, masses: [{ atM: L, massKg: m * L, rotaryInertiaKgM2: 0.05 * m * L ** 3 }] });
    const a = solveMember(base);
    const b = solveMember(withJ);
    if (!a.ok || !b.ok) throw new Error('solve failed');
    // Adding mass-matrix terms can only lower Rayleigh quotients (classical minimax argument).
    for (let i = 0; i < 4; i++) expect(b.result.dry.frequenciesHz[i]).toBeLessThan(a.result.dry.frequenciesHz[i]);
  });
});
