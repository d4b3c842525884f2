import { describe, expect, it } from 'vitest';
import { parseMemberModel, solveMember } from '../../../src/physics/beam';

/** A valid member as JSON would give it; each test breaks one thing. */
function base(): Record<string, any> {
  return {
    lengthM: 20,
    segments: [
      { fromM: 0, toM: 12, section: { shape: 'tube', outerDiameterM: 0.762, wallThicknessM: 0.019 }, youngsModulusPa: 210e9, densityKgPerM3: 7850, contentsDensityKgPerM3: 1025 },
      { fromM: 12, toM: 20, section: { shape: 'tube', outerDiameterM: 0.762, wallThicknessM: 0.019 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 },
    ],
    liquid: { densityKgPerM3: 1025, fromM: 0, toM: 12 },
    supports: [{ atM: 0, kind: 'clamped' }],
    masses: [{ atM: 20, massKg: 5000, rotaryInertiaKgM2: 0 }],
    tensionN: 0,
    modes: 5,
  };
}

function broken(edit: (m: Record<string, any>) => void): Record<string, any> {
  const m = base();
  edit(m);
  return m;
}

describe('member input validation names the field, what was expected and what was got', () => {
  it('accepts the issue’s example shape', () => {
    expect(() => parseMemberModel(base())).not.toThrow();
  });

  const cases: [string, (m: Record<string, any>) => void, string][] = [
    ['negative length', (m) => (m.lengthM = -2), 'lengthM must be a finite number > 0, got -2'],
    ['missing length', (m) => delete m.lengthM, 'lengthM must be a finite number > 0, got nothing'],
    ['non-finite length', (m) => (m.lengthM = Infinity), 'lengthM must be a finite number > 0, got Infinity'],
    ['length as text', (m) => (m.lengthM = '20'), 'lengthM must be a finite number > 0, got "20"'],
    ['missing segments', (m) => delete m.segments, 'segments must be a non-empty array, got nothing'],
    ['empty segments', (m) => (m.segments = []), 'segments must be a non-empty array, got an empty array'],
    ['gap between segments', (m) => (m.segments[1].fromM = 13), 'segments[1].fromM must be equal to segments[0].toM = 12 (gap from 12 m to 13 m), got 13'],
    ['overlapping segments', (m) => (m.segments[1].fromM = 11), 'segments[1].fromM must be equal to segments[0].toM = 12 (segments overlap from 11 m to 12 m), got 11'],
    ['first segment not at the root', (m) => (m.segments[0].fromM = 1), 'segments[0].fromM must be 0 (the first segment starts at the root, z = 0), got 1'],
    ['segments short of the length', (m) => (m.segments[1].toM = 18), 'segments[1].toM must be equal to lengthM = 20 (segments must cover the member), got 18'],
    ['segment past the length', (m) => (m.segments[1].toM = 21), 'segments[1].toM must be at most lengthM = 20, got 21'],
    ['segment ending before it starts', (m) => (m.segments[0].toM = -1), 'segments[0].toM must be a finite number > fromM (0), got -1'],
    ['zero diameter', (m) => (m.segments[0].section.outerDiameterM = 0), 'segments[0].section.outerDiameterM must be a finite number > 0, got 0'],
    ['wall as thick as the radius', (m) => (m.segments[0].section.wallThicknessM = 0.381), 'segments[0].section.wallThicknessM must be less than the outer radius 0.381 m (use shape "rod" for a solid bar), got 0.381'],
    ['unknown shape', (m) => (m.segments[0].section = { shape: 'square', sideM: 1 }), 'segments[0].section.shape must be one of "tube", "rod", "plate-strip", "h-section", got "square"'],
    ['negative plate thickness', (m) => (m.segments[0].section = { shape: 'plate-strip', widthM: 0.3, thicknessM: -0.01 }), 'segments[0].section.thicknessM must be a finite number > 0, got -0.01'],
    ['taper to another shape', (m) => (m.segments[1].endSection = { shape: 'rod', diameterM: 0.5 }), 'segments[1].endSection.shape must be the same as section.shape ("tube"), got "rod"'],
    ['zero Young’s modulus', (m) => (m.segments[0].youngsModulusPa = 0), 'segments[0].youngsModulusPa must be a finite number > 0, got 0'],
    ['missing density', (m) => delete m.segments[1].densityKgPerM3, 'segments[1].densityKgPerM3 must be a finite number > 0, got nothing'],
    ['Poisson ratio of 0.5', (m) => (m.segments[0].poissonRatio = 0.5), 'segments[0].poissonRatio must be a finite number from 0 to below 0.5, got 0.5'],
    ['contents in a solid rod', (m) => (m.segments[0].section = { shape: 'rod', diameterM: 0.3 }), 'segments[0].contentsDensityKgPerM3 must be 0 or absent for a "rod" (contents apply to tubes only), got 1025'],
    ['negative coating', (m) => (m.segments[0].coating = { thicknessM: -0.05, densityKgPerM3: 1325 }), 'segments[0].coating.thicknessM must be a finite number ≥ 0, got -0.05'],
    ['misspelt field', (m) => (m.segments[0].sectoin = {}), 'segments[0].sectoin is not a known field'],
    ['unknown top-level field', (m) => (m.lenghtM = 3), 'lenghtM is not a known field'],
    ['support above the top', (m) => (m.supports[0].atM = 25), 'supports[0].atM must be a finite number from 0 to lengthM = 20 (on the member), got 25'],
    ['support below the root', (m) => (m.supports[0].atM = -1), 'supports[0].atM must be a finite number from 0 to lengthM = 20 (on the member), got -1'],
    ['unknown support kind', (m) => (m.supports[0].kind = 'welded'), 'supports[0].kind must be one of "clamped", "pinned", "guided", "free", "spring", got "welded"'],
    ['spring with no stiffness', (m) => (m.supports[0] = { atM: 0, kind: 'spring' }), 'supports[0] must be a spring with translationalStiffnessNPerM or rotationalStiffnessNmPerRad > 0, got neither'],
    ['stiffness on a pinned support', (m) => (m.supports[0] = { atM: 0, kind: 'pinned', translationalStiffnessNPerM: 1e6 }), 'supports[0].kind must be "spring" when stiffnesses are given, got "pinned"'],
    ['supports missing', (m) => delete m.supports, 'supports must be an array, got nothing'],
    ['mass above the top', (m) => (m.masses[0].atM = 20.5), 'masses[0].atM must be a finite number from 0 to lengthM = 20 (on the member), got 20.5'],
    ['negative mass', (m) => (m.masses[0].massKg = -5), 'masses[0].massKg must be a finite number ≥ 0, got -5'],
    ['soil range reversed', (m) => (m.soilSprings = [{ fromM: 5, toM: 2, modulusNPerM2: 1e6 }]), 'soilSprings[0].toM must be a finite number > fromM (5) and at most lengthM = 20, got 2'],
    ['liquid of zero density', (m) => (m.liquid.densityKgPerM3 = 0), 'liquid.densityKgPerM3 must be a finite number > 0, got 0'],
    ['liquid above the member', (m) => (m.liquid = { densityKgPerM3: 1025, fromM: 25, toM: 30 }), 'liquid must be a range overlapping the member [0, 20] m, got [25, 30]'],
    ['liquid range reversed', (m) => (m.liquid.toM = -3), 'liquid.toM must be a finite number > fromM (0), got -3'],
    ['perforation beyond the table', (m) => (m.liquid.perforationRatio = 0.7), 'liquid.perforationRatio must be a finite number from 0 to 0.5 (range of DNV-RP-H103 §4.6.4.3), got 0.7'],
    ['boundaries not a list', (m) => (m.liquid.boundaries = { kind: 'wall' }), 'liquid.boundaries must be an array, got an object'],
    ['confinement starting inside a segment', (m) => (m.liquid.boundariesFromM = 5), 'liquid.boundariesFromM must be at a segment end (segments[0] runs from 0 to 12 m across it), got 5'],
    ['shielded stretch without a speed', (m) => (m.liquid.flowShielding = [{ fromM: 2, toM: 6, label: 'inside the caisson' }]), 'liquid.flowShielding[0].flowSpeedMPerS must be a finite number ≥ 0, got nothing'],
    ['end-effect flag as text', (m) => (m.liquid.endEffect3d = 'yes'), 'liquid.endEffect3d must be true or false, got "yes"'],
    ['fractional mode count', (m) => (m.modes = 2.5), 'modes must be an integer from 1 to 50, got 2.5'],
    ['too many modes', (m) => (m.modes = 51), 'modes must be an integer from 1 to 50, got 51'],
    ['non-finite tension', (m) => (m.tensionN = Number.NaN), 'tensionN must be a finite number (negative = compression), got NaN'],
    ['mesh tolerance of zero', (m) => (m.mesh = { relativeTolerance: 0 }), 'mesh.relativeTolerance must be a finite number > 0 and < 0.1, got 0'],
  ];
  for (const [name, edit, message] of cases) {
    it(`rejects ${name}`, () => {
      expect(() => parseMemberModel(broken(edit))).toThrow(message);
    });
  }

  it('rejects input that is not an object', () => {
    expect(() => parseMemberModel([1, 2])).toThrow('the member input must be a JSON object, got an array');
    expect(() => parseMemberModel(null)).toThrow('the member input must be a JSON object, got null');
  });

  it('the solver entry applies the same checks to typed input', () => {
    const m = broken((x) => (x.segments[0].section.outerDiameterM = -0.2));
    expect(() => solveMember(m as never)).toThrow('segments[0].section.outerDiameterM must be a finite number > 0, got -0.2');
  });

  it('null liquid means dry only', () => {
    const m = broken((x) => (x.liquid = null));
    expect(parseMemberModel(m).liquid).toBeUndefined();
  });
});
