import { describe, expect, it } from 'vitest';
import { solveMember } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';
import { beamFrequency, uniformMember, uniformProps } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();
const k = 2e6; // subgrade modulus, N/m² (stiff clay order of magnitude)

describe('soil springs (Winkler foundation)', () => {
  it('pinned–pinned on a full-length foundation: ω² = (EI (nπ/L)⁴ + k) / m', () => {
    // Classical: M. Hetényi, Beams on Elastic Foundation (1946); sin(nπz/L) stays an exact mode shape.
    const out = solveMember(uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: L, kind: 'pinned' }], { modes: 4, soilSprings: [{ fromM: 0, toM: L, modulusNPerM2: k }] }));
    if (!out.ok) throw new Error(out.message);
    for (let n = 1; n <= 4; n++) {
      const omega2 = (ei * ((n * Math.PI) / L) ** 4 + k) / m;
      // 0.01 %: converged mesh, exact reference.
      expectClose(out.result.dry.frequenciesHz[n - 1], Math.sqrt(omega2) / (2 * Math.PI), { rtol: 1e-4, label: `mode ${n}` });
    }
  });

  it('free–free on a full-length foundation: two rigid modes at √(k/m), elastic modes shifted by k/m', () => {
    // Classical: a uniform foundation matrix is k/m times the consistent mass matrix, so every ω² gains k/m;
    // the free–free λ values are those of Thomson Table 9.5-1.
    const out = solveMember(uniformMember(L, [], { modes: 5, soilSprings: [{ fromM: 0, toM: L, modulusNPerM2: k }] }));
    if (!out.ok) throw new Error(out.message);
    const shift = k / m;
    const expected = [0, 0, 4.730041, 7.853205, 10.995608].map((lam) => {
      const f = lam === 0 ? 0 : beamFrequency(lam, L, ei, m);
      return Math.sqrt((2 * Math.PI * f) ** 2 + shift) / (2 * Math.PI);
    });
    // Two rigid modes coincide exactly: relative 1e-9 covers rounding; elastic ones 0.01 % (table precision + mesh).
    expectClose(out.result.dry.frequenciesHz[0], expected[0], { rtol: 1e-9, label: 'rigid translation' });
    expectClose(out.result.dry.frequenciesHz[1], expected[1], { rtol: 1e-9, label: 'rigid rotation' });
    for (let i = 2; i < 5; i++) expectClose(out.result.dry.frequenciesHz[i], expected[i], { rtol: 1e-4, label: `elastic mode ${i - 1}` });
  });

  it('a stiffer or longer embedment raises the first frequency of a pile', () => {
    const pile = (modulus: number, depth: number) => {
      const out = solveMember(uniformMember(20, [], { modes: 1, soilSprings: [{ fromM: 0, toM: depth, modulusNPerM2: modulus }] }));
      if (!out.ok) throw new Error(out.message);
      return out.result.dry.frequenciesHz[0];
    };
    const base = pile(5e6, 6);
    // Adding stiffness raises Rayleigh quotients (minimax, classical).
    expect(pile(1e7, 6)).toBeGreaterThan(base);
    expect(pile(5e6, 8)).toBeGreaterThan(base);
  });
});
