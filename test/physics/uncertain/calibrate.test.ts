import { describe, expect, it } from 'vitest';
import { parseMemberModel } from '../../../src/physics/beam';
import { calibrate } from '../../../src/physics/uncertain/calibrate';
import { withNumberAt } from '../../../src/physics/uncertain/paths';
import { expectClose } from '../../helpers/expect-close';
import { beamFrequency, uniformMember, uniformProps } from '../beam/fixtures';
import { freqs, tipMassLambdas } from './fixtures';
import pile from '../../../examples/member-fender-pile-port-halloran.json';

const L = 10;
const { ei, m } = uniformProps();

describe('calibration against a measured frequency', () => {
  it('recovers the tip mass of a cantilever from the tip-mass frequency equation', () => {
    // "Measured" f1 for μ = 0.7 from 1 + cos λ cosh λ + μλ(cos λ sinh λ − sin λ cosh λ) = 0 (R.D. Blevins,
    // Formulas for Natural Frequency and Mode Shape, Table 8-8; solved in the test: a cross-check of the equation).
    const mu = 0.7;
    const f1 = beamFrequency(tipMassLambdas(mu, 1)[0], L, ei, m);
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 2, masses: [{ atM: L, massKg: 0 }] });
    const out = calibrate(model, { frequencyHz: f1, uncertaintyHz: 0.01 * f1, mode: 1, state: 'dry' }, { path: 'masses.0.massKg', low: 0, high: 5 * m * L });
    if (!out.ok) throw new Error(out.message);
    // 1e-6: the converged mesh's error in f1 is below 1e-7 here and is amplified about 3× in the mass,
    // since f ∝ 1/√(M + 0.24 mL) (classical Rayleigh estimate).
    expectClose(out.value, mu * m * L, { rtol: 1e-6, label: 'recovered tip mass' });
    expectClose(out.modelFrequencyHz, f1, { rtol: 1e-5, label: 're-solved f1' });
    // ±1 % in frequency: heavier mass gives the lower frequency, so the interval brackets the value.
    expect(out.interval[0]).toBeLessThan(out.value);
    expect(out.interval[1]).toBeGreaterThan(out.value);
    const at = (M: number) => freqs(withNumberAt(model, 'masses.0.massKg', M), 'dry')[0];
    // The interval ends reproduce f ∓ u (cross-check by solving there); 1e-5: mesh difference between solves.
    expectClose(at(out.interval[0]), 1.01 * f1, { rtol: 1e-5, label: 'f at the light end' });
    expectClose(at(out.interval[1]), 0.99 * f1, { rtol: 1e-5, label: 'f at the heavy end' });
  });

  it('recovers the water level of a partly submerged cantilever (round trip)', () => {
    // Round trip: the "measured" wet f1 is made by the model itself with the water at 6.3 m.
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 2, liquid: { densityKgPerM3: 1025, fromM: 0, toM: 4 } }, { contentsDensityKgPerM3: 1025 });
    const f = freqs(withNumberAt(model, 'liquid.toM', 6.3), 'wet')[0];
    const out = calibrate(model, { frequencyHz: f, uncertaintyHz: 0, mode: 1, state: 'wet' }, { path: 'liquid.toM', low: 1, high: 10 });
    if (!out.ok) throw new Error(out.message);
    // 1e-5 m: the search's fixed mesh and the adaptive mesh that made the measurement differ by far less.
    expectClose(out.value, 6.3, { atol: 1e-5, label: 'water level' });
    expect(out.interval).toEqual([out.value, out.value]);
  });

  it('recovers a scour-like loss of soil support at the Port Halloran fender pile (round trip)', () => {
    // Scour lowers the top of the soil springs from the mudline (6 m above the toe) to 4.6 m; the measured
    // wet f1 is made by the model there (round trip), and the search runs over 3–6 m.
    const model = parseMemberModel(pile);
    const f = freqs(withNumberAt(model, 'soilSprings.0.toM', 4.6), 'wet')[0];
    const out = calibrate(model, { frequencyHz: f, uncertaintyHz: 0.005, mode: 1, state: 'wet' }, { path: 'soilSprings.0.toM', low: 3, high: 6 });
    if (!out.ok) throw new Error(out.message);
    // 1e-5 m: same reason as for the water level.
    expectClose(out.value, 4.6, { atol: 1e-5, label: 'top of soil after scour' });
    expect(out.interval[0]).toBeLessThan(4.6);
    expect(out.interval[1]).toBeGreaterThan(4.6);
    // Scour lowers the frequency (Prendergast et al., J. Sound Vib. 332 (2013) 6685): the reachable range
    // runs from deep scour (low) to none (high).
    expect(out.reachableHz[0]).toBeLessThan(f);
    expect(out.reachableHz[1]).toBeGreaterThan(f);
  });

  it('refuses a measurement no value in the range can give, with the reachable frequencies as the reason', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 1, masses: [{ atM: L, massKg: 0 }] });
    const fBare = beamFrequency(1.875104, L, ei, m); // Blevins Table 8-1, cantilever λ1
    const out = calibrate(model, { frequencyHz: 1.2 * fBare, uncertaintyHz: 0, mode: 1, state: 'dry' }, { path: 'masses.0.massKg', low: 0, high: m * L });
    expect(out.ok).toBe(false);
    if (out.ok || out.reason !== 'no-fit') throw new Error('expected no fit');
    expect(out.message).toContain('no value of masses.0.massKg in [0, ');
    // The highest reachable is the bare cantilever (no tip mass); 1e-5 mesh.
    expectClose(out.reachableHz[1], fBare, { rtol: 1e-5, label: 'highest reachable' });
  });

  it('reports every root when more than one value fits', () => {
    // A pin moving over [2, 8] m in a pinned–pinned beam: f1 is symmetric about mid-span (classical symmetry),
    // so a frequency between its end and peak values is met at a and at L − a.
    const model = uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: 3, kind: 'pinned' }, { atM: L, kind: 'pinned' }], { modes: 1 });
    const f = freqs(model, 'dry')[0];
    const out = calibrate(model, { frequencyHz: f, uncertaintyHz: 0, mode: 1, state: 'dry' }, { path: 'supports.1.atM', low: 2, high: 8 });
    if (out.ok || out.reason !== 'more-than-one-fits') throw new Error('expected several roots');
    expect(out.roots).toHaveLength(2);
    expectClose(out.roots[0], 3, { atol: 1e-3, label: 'first root' });
    expectClose(out.roots[1], 7, { atol: 1e-3, label: 'mirror root' });
  });

  it('refuses bad input naming the field', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }]);
    const meas = { frequencyHz: 1, uncertaintyHz: 0, mode: 1, state: 'wet' as const };
    expect(() => calibrate(model, meas, { path: 'tensionN', low: 0, high: 1 })).toThrow('no liquid');
    const dry = { ...meas, state: 'dry' as const };
    expect(() => calibrate(model, dry, { path: 'masses.0.massKg', low: 0, high: 1 })).toThrow('no such key "masses"');
    expect(() => calibrate(model, dry, { path: 'segments.0.densityKgPerM3', low: 9000, high: 7000 })).toThrow('low 9000 must be below high 7000');
    expect(() => calibrate(model, { ...dry, frequencyHz: -1 }, { path: 'segments.0.densityKgPerM3', low: 7000, high: 9000 })).toThrow('measured.frequencyHz');
  });
});
