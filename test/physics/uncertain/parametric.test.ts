import { describe, expect, it } from 'vitest';
import { memberBand, parametricBand, withNumbersAt } from '../../../src/physics/uncertain';
import { expectClose } from '../../helpers/expect-close';
import { beamFrequency, uniformMember, uniformProps } from '../beam/fixtures';
import { tipMassLambdas } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();

describe('band over inputs that rebuild the member (parametric band)', () => {
  it('gives the same band as the path form when the builder sets the same number', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 3, masses: [{ atM: L, massKg: m * L }] });
    const byPath = memberBand(model, [{ path: 'masses.0.massKg', low: 0.2 * m * L, high: 2 * m * L }]);
    const built = parametricBand(model, [{ path: 'tip mass', low: 0.2 * m * L, likely: m * L, high: 2 * m * L }], (x) => withNumbersAt(model, ['masses.0.massKg'], x));
    if (!byPath.ok || !built.ok) throw new Error('both solve');
    // Cross-check by two routes through the same solves: identical numbers.
    expect(built.band.dry.lowHz).toEqual(byPath.band.dry.lowHz);
    expect(built.band.dry.highHz).toEqual(byPath.band.dry.highHz);
    expect(built.band.sensitivity[0].path).toBe('tip mass');
    // Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-8 (tip mass μ = 2), solved by scan and
    // bisection; 1e-4 as in the path-form test (mesh tolerance 0.05 % between doublings).
    expectClose(built.band.dry.lowHz[0], beamFrequency(tipMassLambdas(2, 1)[0], L, ei, m), { rtol: 1e-4, label: 'low end, μ = 2' });
  });

  it('moves several model numbers together: a length range rebuilds the cantilever, whose f1 scales as 1/L² (classical)', () => {
    const at = (x: ArrayLike<number>) => uniformMember(x[0], [{ atM: 0, kind: 'clamped' }], { modes: 2 });
    const out = parametricBand(at([L]), [{ path: 'length', low: 9, likely: L, high: 12 }], at);
    if (!out.ok) throw new Error(out.message);
    // Euler–Bernoulli cantilever: f1 ∝ 1/L² (Blevins Table 8-1, λ1 = 1.875104); fixed element count, so 1e-4.
    expectClose(out.band.dry.highHz[0], beamFrequency(1.875104, 9, ei, m), { rtol: 1e-4, label: 'f1 at 9 m' });
    expectClose(out.band.dry.lowHz[0], beamFrequency(1.875104, 12, ei, m), { rtol: 1e-4, label: 'f1 at 12 m' });
    expect(out.band.method).toBe('corners');
  });

  it('refuses inputs with a message naming them', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 2 });
    const at = () => model;
    expect(() => parametricBand(model, [{ path: 'depth', low: 3, likely: 2, high: 4 }], at)).toThrow('ranges[0] (depth): the likely value 2 lies outside [3, 4]');
    expect(() => parametricBand(model, [{ path: 'depth', low: 5, likely: 4.5, high: 4 }], at)).toThrow('ranges[0] (depth): low 5 is above high 4');
    const bad = (x: ArrayLike<number>) => uniformMember(x[0], [{ atM: 0, kind: 'clamped' }], { modes: 2 });
    expect(() => parametricBand(model, [{ path: 'length', low: -1, likely: L, high: 12 }], bad)).toThrow(/ranges\[0\] \(length\) low -1 makes the member invalid/);
  });
});
