import { describe, expect, it } from 'vitest';
import { buildBaffleModel } from '../../src/kinds/baffle/build';
import type { MemberKind } from '../../src/kinds/common/types';
import { buildPileModel, type PileInput } from '../../src/kinds/pile/build';
import { buildMember } from '../../src/kinds/registry';
import { buildRiserModel } from '../../src/kinds/riser/build';
import { buildStemModel } from '../../src/kinds/stem/build';
import { BAFFLE, PILE, RISER, STEM } from './fixtures';

/** Lets a test pass deliberately wrong values through the typed builders. */
function bad<T>(base: T, patch: Record<string, unknown>): T {
  return { ...base, ...patch } as T;
}

describe('member inputs are checked once at the public entry, with the field, what was expected and what was got', () => {
  it.each([
    [{ outerDiameterM: -2 }, 'outerDiameterM must be a finite number > 0, got -2'],
    [{ wallThicknessM: 0.4 }, 'wallThicknessM must be less than half of outerDiameterM (0.305 m), got 0.4'],
    [{ youngsModulusPa: Number.NaN }, 'youngsModulusPa must be a finite number > 0, got NaN'],
    [{ waterDepthM: -1 }, 'waterDepthM must be a finite number ≥ 0, got -1'],
    [{ topAboveStillWaterM: -9 }, 'topAboveStillWaterM must be more than −waterDepthM (-8 m) so the top is above the mudline, got -9'],
    [{ flooded: 'yes' }, 'flooded must be true or false, got "yes"'],
    [{ foundation: { kind: 'piles' } }, 'foundation.kind must be one of "fixity", "fixity-soil", "soil-springs", "soil-springs-linear", got "piles"'],
    [{ foundation: { kind: 'soil-springs', embeddedLengthM: 10 } }, 'foundation.modulusNPerM2 must be a finite number > 0, got nothing'],
    [{ topMassKg: -5 }, 'topMassKg must be a finite number ≥ 0, got -5'],
    [
      { marineGrowth: { thicknessM: 0.05, densityKgPerM3: 1325, topAboveStillWaterM: -5, bottomBelowStillWaterM: 3 } },
      'marineGrowth.bottomBelowStillWaterM must be more than −topAboveStillWaterM (5 m) so the band has a height, got 3',
    ],
  ])('pile %j', (patch, message) => {
    expect(() => buildPileModel(bad(PILE, patch))).toThrow(new RangeError(message));
  });

  it.each([
    [{ lengthM: 0 }, 'lengthM must be a finite number > 0, got 0'],
    [{ guideElevationsM: [10, 31] }, 'guideElevationsM[1] must be between 0 and lengthM (30 m), ends excluded (set the end condition instead), got 31'],
    [{ guideElevationsM: [12, 12] }, 'guideElevationsM must be distinct heights, got 12 m twice'],
    [{ guideElevationsM: '10, 20' }, 'guideElevationsM must be an array of heights (possibly empty), got "10, 20"'],
    [{ bottom: 'fixed' }, 'bottom must be one of "clamped", "pinned", "sliding", "free", got "fixed"'],
    [{ liquidToM: -1 }, 'liquidToM must be more than liquidFromM (0 m), got -1'],
    [
      { caisson: { innerDiameterM: 0.4, offsetM: 0.05 } },
      "caisson.innerDiameterM must be more than the riser's outer diameter with coating and growth plus twice the offset (0.4299 m) so the riser fits with a gap, got 0.4",
    ],
    [
      { bottom: 'free', guideElevationsM: [10] },
      'bottom, top and guideElevationsM must be enough support to hold the riser: a clamped end, or two held points (guides or pinned ends), got bottom "free", top "free" and 1 guide(s)',
    ],
  ])('riser %j', (patch, message) => {
    expect(() => buildRiserModel(bad(RISER, patch))).toThrow(new RangeError(message));
  });

  it('a single pinned point with constant top tension is held like a pendulum, and accepted', () => {
    expect(() => buildRiserModel({ ...RISER, guideElevationsM: [], topTensionN: 1e5, tensionVariesWithWeight: false })).not.toThrow();
  });

  it.each([
    [{ thicknessM: 0.3 }, 'thicknessM must be less than widthM (0.3 m): the plate bends across its thickness, got 0.3'],
    [{ poissonRatio: 0.5 }, 'poissonRatio must be a finite number from 0 to below 0.5, got 0.5'],
    [{ perforationRatio: 0.6 }, 'perforationRatio must be at most 0.5 (the range of DNV-RP-H103 §4.6.4.3), got 0.6'],
    [{ lowerEnd: 'bolted', upperEnd: 'free' }, 'lowerEnd and upperEnd must be enough to hold the plate: one welded end, or both bolted, got "bolted" and "free"'],
    [{ upperEnd: 'glued' }, 'upperEnd must be one of "welded", "bolted", "free", got "glued"'],
    [{ wallGapM: 0 }, 'wallGapM must be a finite number > 0, got 0'],
  ])('baffle %j', (patch, message) => {
    expect(() => buildBaffleModel(bad(BAFFLE, patch))).toThrow(new RangeError(message));
  });

  it.each([
    [{ boreDiameterM: 0.022 }, 'boreDiameterM must be less than the smaller of rootDiameterM and tipDiameterM (0.022 m), got 0.022'],
    [{ surroundingInnerDiameterM: 0.028 }, "surroundingInnerDiameterM must be more than the stem's largest diameter (0.028 m), got 0.028"],
    [{ rootSupport: { kind: 'welded' } }, 'rootSupport.kind must be one of "rigid", "rotational-spring", got "welded"'],
    [{ rootSupport: { kind: 'rotational-spring', stiffnessNmPerRad: 0 } }, 'rootSupport.stiffnessNmPerRad must be a finite number > 0, got 0'],
    [{ insertionLengthM: undefined }, 'insertionLengthM must be a finite number > 0, got nothing'],
    [{ beamTheory: 'thick' }, 'beamTheory must be one of "auto", "euler-bernoulli", "timoshenko", got "thick"'],
  ])('stem %j', (patch, message) => {
    expect(() => buildStemModel(bad(STEM, patch))).toThrow(new RangeError(message));
  });

  it('buildMember dispatches by kind and names an unknown kind', () => {
    expect(buildMember('stem', STEM).kind).toBe('stem');
    expect(() => buildMember('mast' as MemberKind, STEM)).toThrow(new RangeError('kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "mast"'));
    expect(() => buildPileModel(null as unknown as PileInput)).toThrow(new RangeError('pile input must be an object, got null'));
  });
});
