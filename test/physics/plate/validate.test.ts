import { describe, it, expect } from 'vitest';
import { parsePlateInput, sloshingFrequencyHz } from '../../../src/physics/plate';
import { expectClose } from '../../helpers/expect-close';

const good = {
  widthM: 2, heightM: 1, thicknessM: 0.01, youngsModulusPa: 2.1e11, poissonRatio: 0.3, densityKgPerM3: 7850,
  edges: { left: 'clamped', right: 'clamped', bottom: 'clamped', top: 'free' },
  liquid: { setting: 'across-tank', densityKgPerM3: 1000, sides: 2, depthM: 2, reachM: 3 },
  modes: 4,
};

describe('plate input validation names the field, what was expected and what was got', () => {
  it('a complete input passes through unchanged', () => {
    expect(parsePlateInput(good)).toEqual(good);
  });
  it('each bad field is named in the message', () => {
    const bad = (patch: object) => () => parsePlateInput({ ...good, ...patch });
    expect(bad({ edges: { ...good.edges, top: 'hinged' } })).toThrow('edges.top must be one of "clamped", "simply-supported", "free" or { "rotationalSpringNmPerRadPerM": k }, got "hinged"');
    expect(bad({ edges: { ...good.edges, top: { rotationalSpringNmPerRadPerM: -1 } } })).toThrow('edges.top.rotationalSpringNmPerRadPerM must be a finite number ≥ 0');
    expect(bad({ widthM: -1 })).toThrow('widthM must be a finite number > 0, got -1');
    expect(bad({ poissonRatio: 0.5 })).toThrow('poissonRatio must be a finite number from 0 to below 0.5, got 0.5');
    expect(bad({ thicknessM: 0.5 })).toThrow(/thicknessM must be at most a fifth of the shorter side \(0\.2 m\)/);
    expect(bad({ modes: 2.5 })).toThrow('modes must be a whole number from 1 to 20, got 2.5');
    expect(bad({ colour: 'red' })).toThrow('colour is not a known field');
    expect(bad({ liquid: { ...good.liquid, setting: 'pond' } })).toThrow('liquid.setting must be one of "wall-panel", "across-tank", got "pond"');
    expect(bad({ liquid: { ...good.liquid, sides: 3 } })).toThrow('liquid.sides must be 1 or 2');
    expect(bad({ liquid: { ...good.liquid, depthM: undefined } })).toThrow('liquid.depthM must be a finite number > 0');
    expect(bad({ liquid: { ...good.liquid, sides: 1 } })).toThrow(/liquid\.depthM must be at most heightM = 1 m when sides is 1/);
    expect(bad({ liquid: { setting: 'wall-panel', densityKgPerM3: 1000, sides: 1, depthM: 1 } })).toThrow(/liquid\.depthM must be absent for "wall-panel"/);
    expect(bad({ liquid: { ...good.liquid, reachM: 0 } })).toThrow(/liquid\.reachM must be a finite number > 0/);
  });
  it('edges that let the plate move as a rigid body are refused', () => {
    expect(() => parsePlateInput({ ...good, edges: { left: 'simply-supported', right: 'free', bottom: 'free', top: 'free' } })).toThrow(/edges must hold the plate/);
    expect(() => parsePlateInput({ ...good, edges: { left: 'simply-supported', right: 'free', bottom: 'simply-supported', top: 'free' } })).not.toThrow();
  });
});

describe('sloshing frequencies of a rectangular tank', () => {
  it('follow f = (1/2π)√(g k tanh(k h)) with its deep- and shallow-water limits', () => {
    // Classical linear sloshing (H.N. Abramson (ed.), The Dynamic Behavior of Liquids in Moving Containers, NASA SP-106, 1966).
    const g = 9.80665;
    // Deep water, tanh → 1: f = √(g π / L) / 2π.
    expectClose(sloshingFrequencyHz(2, 100, 1), Math.sqrt((g * Math.PI) / 2) / (2 * Math.PI), { rtol: 1e-12, label: 'deep' });
    // Shallow water, k h ≪ 1: f ≈ (1/2L)√(g h) (long-wave speed; classical): 0.1 % at k h = π/2000.
    expectClose(sloshingFrequencyHz(10, 0.005, 1), Math.sqrt(g * 0.005) / 20, { rtol: 1e-3, label: 'shallow' });
  });
});
