import { describe, expect, it } from 'vitest';
import { ScreeningInputError } from '../../../src/physics/excitation/input-error';
import { screenResonance } from '../../../src/physics/excitation/screen';
import type { ScreeningInput } from '../../../src/physics/excitation/types';
import { pileCase } from './fixtures';

// Every message names the field, what was expected and what was got (common.md). `any` lets the tests feed
// the malformed values a form, a link or a hand-edited file could produce.
type Loose = any;

const cases: [string, (x: Loose) => void, string][] = [
  ['input not an object', (x) => { x.__replace = 42; }, 'input must be an object, got 42'],
  ['modes missing', (x) => { delete x.modes; }, 'modes must be an array with at least 1 entry, got undefined'],
  ['modes empty', (x) => { x.modes = []; }, 'modes must be an array with at least 1 entry, got an array of length 0'],
  ['mode not an object', (x) => { x.modes[0] = 3; }, 'modes[0] must be an object, got 3'],
  ['wet frequency zero', (x) => { x.modes[0].wetFrequencyHz = 0; }, 'modes[0].wetFrequencyHz must be a finite number > 0, got 0'],
  ['wet frequency NaN', (x) => { x.modes[0].wetFrequencyHz = NaN; }, 'modes[0].wetFrequencyHz must be a finite number > 0, got NaN'],
  ['wet frequency text', (x) => { x.modes[0].wetFrequencyHz = '5'; }, 'modes[0].wetFrequencyHz must be a finite number > 0, got "5"'],
  ['dry frequency negative', (x) => { x.modes[0].dryFrequencyHz = -1; }, 'modes[0].dryFrequencyHz must be a finite number > 0, got -1'],
  ['mode mass zero', (x) => { x.modes[0].effectiveMassKgPerM = 0; }, 'modes[0].effectiveMassKgPerM must be a finite number > 0, got 0'],
  ['zM too short', (x) => { x.modes[0].zM = [0]; }, 'modes[0].zM must be an array with at least 2 entries, got an array of length 1'],
  ['zM not finite', (x) => { x.modes[0].zM[3] = Infinity; }, 'modes[0].zM[3] must be a finite number, got Infinity'],
  ['zM not increasing', (x) => { x.modes[0].zM[3] = 1; }, 'modes[0].zM[3] must be greater than modes[0].zM[2] = 2 (strictly increasing), got 1'],
  ['displacement length', (x) => { x.modes[0].displacement = [0, 1]; }, 'modes[0].displacement must be an array of the same length as modes[0].zM (21), got an array of length 2'],
  ['displacement not finite', (x) => { x.modes[0].displacement[5] = NaN; }, 'modes[0].displacement[5] must be a finite number, got NaN'],
  ['displacement all zero', (x) => { x.modes[0].displacement = new Float64Array(21); }, 'modes[0].displacement must be a mode shape with at least one non-zero value, got "all zeros"'],
  ['zones not array', (x) => { x.zones = 'all'; }, 'zones must be an array, got "all"'],
  ['zone not object', (x) => { x.zones[0] = null; }, 'zones[0] must be an object, got null'],
  ['zone from not finite', (x) => { x.zones[0].fromM = undefined; }, 'zones[0].fromM must be a finite number, got undefined'],
  ['zone to not above from', (x) => { x.zones[0].toM = 0; }, 'zones[0].toM must be greater than zones[0].fromM = 0, got 0'],
  ['section missing', (x) => { delete x.zones[0].section; }, 'zones[0].section must be an object, got undefined'],
  ['section kind', (x) => { x.zones[0].section = { kind: 'hexagon' }; }, 'zones[0].section.kind must be "circle" or "rectangle", got "hexagon"'],
  ['circle diameter', (x) => { x.zones[0].section.outerDiameterM = -2; }, 'zones[0].section.outerDiameterM must be a finite number > 0, got -2'],
  ['rectangle width', (x) => { x.zones[0].section = { kind: 'rectangle', widthAcrossFlowM: 0, depthAlongFlowM: 1 }; }, 'zones[0].section.widthAcrossFlowM must be a finite number > 0, got 0'],
  ['rectangle depth', (x) => { x.zones[0].section = { kind: 'rectangle', widthAcrossFlowM: 1 }; }, 'zones[0].section.depthAlongFlowM must be a finite number > 0, got undefined'],
  ['zones overlap', (x) => { x.zones.push({ fromM: 14, toM: 18, section: { kind: 'circle', outerDiameterM: 1 } }); }, 'zones[1].fromM must be ≥ zones[0].toM = 15 (zones must not overlap), got 14'],
  ['flow negative', (x) => { x.flowSpeedMPerS = -0.1; }, 'flowSpeedMPerS must be a finite number ≥ 0, got -0.1'],
  ['flow wrong type', (x) => { x.flowSpeedMPerS = 'fast'; }, 'flowSpeedMPerS must be a finite number ≥ 0 or an array of { zM, speedMPerS } points, got "fast"'],
  ['flow profile empty', (x) => { x.flowSpeedMPerS = []; }, 'flowSpeedMPerS must be an array with at least 1 entry, got an array of length 0'],
  ['flow point not object', (x) => { x.flowSpeedMPerS = [1]; }, 'flowSpeedMPerS[0] must be an object { zM, speedMPerS }, got 1'],
  ['flow point z', (x) => { x.flowSpeedMPerS = [{ zM: NaN, speedMPerS: 1 }]; }, 'flowSpeedMPerS[0].zM must be a finite number, got NaN'],
  ['flow point speed', (x) => { x.flowSpeedMPerS = [{ zM: 0, speedMPerS: -1 }]; }, 'flowSpeedMPerS[0].speedMPerS must be a finite number ≥ 0, got -1'],
  ['flow points order', (x) => { x.flowSpeedMPerS = [{ zM: 5, speedMPerS: 1 }, { zM: 3, speedMPerS: 1 }]; }, 'flowSpeedMPerS[1].zM must be greater than flowSpeedMPerS[0].zM = 5 (points in increasing z), got 3'],
  ['effective mass', (x) => { delete x.effectiveMassKgPerM; }, 'effectiveMassKgPerM must be a finite number > 0, got undefined'],
  ['liquid not object', (x) => { x.liquid = 'seawater'; }, 'liquid must be an object, got "seawater"'],
  ['liquid density', (x) => { x.liquid = { densityKgPerM3: 0, kinematicViscosityM2PerS: 1e-6 }; }, 'liquid.densityKgPerM3 must be a finite number > 0, got 0'],
  ['liquid viscosity', (x) => { x.liquid = { densityKgPerM3: 1000 }; }, 'liquid.kinematicViscosityM2PerS must be a finite number > 0, got undefined'],
  ['damping', (x) => { x.dampingRatio = 1.5; }, 'dampingRatio must be a fraction of critical 0 ≤ ζ < 1, got 1.5'],
  ['stem flag', (x) => { x.stemFrequencyRatioScreen = 'yes'; }, 'stemFrequencyRatioScreen must be true or false, got "yes"'],
  ['strouhal not object', (x) => { x.strouhal = 0.2; }, 'strouhal must be an object { value, source }, got 0.2'],
  ['strouhal value', (x) => { x.strouhal = { value: 0, source: 'x' }; }, 'strouhal.value must be a finite number > 0, got 0'],
  ['strouhal source', (x) => { x.strouhal = { value: 0.2, source: ' ' }; }, 'strouhal.source must be a non-empty text naming where the value comes from, got " "'],
  ['waves not object', (x) => { x.waves = [4, 12]; }, 'waves must be an object { periodMinS, periodMaxS }, got an array of length 2'],
  ['wave min period', (x) => { x.waves = { periodMinS: 0, periodMaxS: 12 }; }, 'waves.periodMinS must be a finite number > 0, got 0'],
  ['wave max period', (x) => { x.waves = { periodMinS: 8, periodMaxS: 4 }; }, 'waves.periodMaxS must be ≥ waves.periodMinS = 8, got 4'],
  ['machinery not array', (x) => { x.machinery = { shaftSpeedHz: 10 }; }, 'machinery must be an array, got an object'],
  ['machine not object', (x) => { x.machinery = [600]; }, 'machinery[0] must be an object, got 600'],
  ['shaft speed', (x) => { x.machinery = [{ shaftSpeedHz: -10 }]; }, 'machinery[0].shaftSpeedHz must be a finite number > 0, got -10'],
  ['max shaft speed', (x) => { x.machinery = [{ shaftSpeedHz: 10, shaftSpeedMaxHz: 8 }]; }, 'machinery[0].shaftSpeedMaxHz must be ≥ machinery[0].shaftSpeedHz = 10, got 8'],
  ['blade count', (x) => { x.machinery = [{ shaftSpeedHz: 10, bladeCount: 2.5 }]; }, 'machinery[0].bladeCount must be a whole number ≥ 1, got 2.5'],
  ['shaft order', (x) => { x.machinery = [{ shaftSpeedHz: 10, shaftOrders: [1, 0] }]; }, 'machinery[0].shaftOrders[1] must be a finite number > 0, got 0'],
  ['blade pass without blades', (x) => { x.machinery = [{ shaftSpeedHz: 10, bladePassOrders: [1] }]; }, 'machinery[0].bladeCount must be given when bladePassOrders is given, got undefined'],
  ['blade pass order', (x) => { x.machinery = [{ shaftSpeedHz: 10, bladeCount: 4, bladePassOrders: [-1] }]; }, 'machinery[0].bladePassOrders[0] must be a finite number > 0, got -1'],
  ['machinery against', (x) => { x.machineryAgainst = 'dry'; }, 'machineryAgainst must be "wet" or "wet-and-dry", got "dry"'],
  ['limits not object', (x) => { x.limits = 1; }, 'limits must be an object, got 1'],
  ['range not object', (x) => { x.limits = { inLineReducedVelocity: 4.5 }; }, 'limits.inLineReducedVelocity must be an object { min, max, source? }, got 4.5'],
  ['range min', (x) => { x.limits = { crossFlowReducedVelocity: { min: 0, max: 16 } }; }, 'limits.crossFlowReducedVelocity.min must be a finite number > 0, got 0'],
  ['range max', (x) => { x.limits = { inLineReducedVelocity: { min: 4, max: 2 } }; }, 'limits.inLineReducedVelocity.max must be greater than limits.inLineReducedVelocity.min = 4, got 2'],
  ['K_S limit', (x) => { x.limits = { inLineStabilityMax: { value: -1 } }; }, 'limits.inLineStabilityMax.value must be a finite number > 0, got -1'],
  ['stem ratio limit', (x) => { x.limits = { stemFrequencyRatioMax: {} }; }, 'limits.stemFrequencyRatioMax.value must be a finite number > 0, got undefined'],
  ['separation margin', (x) => { x.limits = { separationMargin: { value: 20 } }; }, 'limits.separationMargin.value must be a fraction 0 ≤ value < 1 (0.2 = ±20 %), got 20'],
];

describe('input validation at the public entry', () => {
  it.each(cases)('rejects %s with a message naming field, expectation and value', (_name, mutate, message) => {
    const input: Loose = pileCase(0.5, 1.0, { waves: { periodMinS: 4, periodMaxS: 12 } });
    mutate(input);
    const arg = '__replace' in input ? input.__replace : input;
    let caught: unknown;
    try {
      screenResonance(arg as ScreeningInput);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ScreeningInputError);
    expect(caught).toBeInstanceOf(RangeError);
    expect((caught as Error).message).toBe(message);
    expect((caught as ScreeningInputError).field).toBe(message.split(' must ')[0]);
  });

  it('accepts the standard case and typed arrays for the mode shape', () => {
    const input = pileCase(0.5, 1.0);
    input.modes[0] = { ...input.modes[0], zM: Float64Array.from(input.modes[0].zM), displacement: Float64Array.from(input.modes[0].displacement) };
    expect(() => screenResonance(input)).not.toThrow();
  });
});
