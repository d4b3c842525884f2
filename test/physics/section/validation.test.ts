/** Every input check of the section solver, with its message (validate.ts, parse.ts). */
import { describe, expect, test } from 'vitest';
import { parseSectionInput, solveSection, validateSectionInput } from '../../../src/physics/section/index';
import type { SectionInput } from '../../../src/physics/section/index';

const circle = (d = 0.5, c: [number, number] = [0, 0]) => ({ shape: 'circle', diameterM: d, centerM: c }) as const;
const base = (over: Partial<SectionInput>): SectionInput => ({ liquidDensityKgPerM3: 1000, bodies: [circle()], ...over });

describe('validation of typed input', () => {
  test.each([
    ['negative density', base({ liquidDensityKgPerM3: -1 }), RangeError, 'liquidDensityKgPerM3 must be a finite number > 0, got -1'],
    ['non-finite density', base({ liquidDensityKgPerM3: NaN }), RangeError, 'liquidDensityKgPerM3 must be a finite number > 0, got NaN'],
    ['no bodies', base({ bodies: [] }), RangeError, 'bodies must be a non-empty array, got an empty array'],
    ['too many bodies', base({ bodies: Array.from({ length: 25 }, (_, k) => circle(0.1, [k, 0])) }), RangeError, 'bodies may hold at most 24 bodies, got 25'],
    ['bad panel count', base({ panelsPerBody: 10 }), RangeError, 'panelsPerBody must be an integer from 16 to 1024, got 10'],
    ['zero diameter', base({ bodies: [circle(0)] }), RangeError, 'bodies[0].diameterM must be a finite number > 0, got 0'],
    ['infinite centre', base({ bodies: [circle(0.5, [Infinity, 0])] }), RangeError, 'bodies[0].centerM[0] must be a finite number, got Infinity'],
    ['negative rectangle width', base({ bodies: [{ shape: 'rectangle', widthM: -0.2, heightM: 0.1 }] }), RangeError, 'bodies[0].widthM must be a finite number > 0, got -0.2'],
    [
      'corner radius above half the smaller side',
      base({ bodies: [{ shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.15 }] }),
      RangeError,
      'bodies[0].cornerRadiusM must be from 0 to half the smaller side (0.1), got 0.15',
    ],
    ['zero plate thickness', base({ bodies: [{ shape: 'plate', widthM: 1, thicknessM: 0 }] }), RangeError, 'bodies[0].thicknessM must be a finite number > 0, got 0'],
    ['non-finite ellipse angle', base({ bodies: [{ shape: 'ellipse', widthM: 1, heightM: 0.5, angleDeg: NaN }] }), RangeError, 'bodies[0].angleDeg must be a finite number, got NaN'],
    ['unknown shape', base({ bodies: [{ shape: 'hexagon' } as never] }), TypeError, 'bodies[0].shape must be one of circle, rectangle, ellipse, plate, polygon, got "hexagon"'],
    ['polygon of two points', base({ bodies: [{ shape: 'polygon', pointsM: [[0, 0], [1, 0]] }] }), RangeError, 'bodies[0].pointsM must list from 3 to 256 points [x, y], got 2 points'],
    [
      'polygon with a repeated point',
      base({ bodies: [{ shape: 'polygon', pointsM: [[0, 0], [1, 0], [1, 0], [0, 1]] }] }),
      RangeError,
      'bodies[0].pointsM has a zero-length edge: points 1 and 2 coincide at [1, 0]',
    ],
    [
      'self-intersecting polygon',
      base({ bodies: [{ shape: 'polygon', pointsM: [[0, 0], [1, 1], [1, 0], [0, 1]] }] }),
      RangeError,
      'bodies[0].pointsM is self-intersecting: edge 0 (points 0–1) crosses edge 2 (points 2–3)',
    ],
    ['polygon without area', base({ bodies: [{ shape: 'polygon', pointsM: [[0, 0], [1, 0], [2, 1e-13]] }] }), RangeError, 'bodies[0].pointsM encloses no area'],
    [
      'normal of zero length',
      base({ boundaries: [{ kind: 'wall', pointM: [0, -1], normal: [0, 0] }] }),
      RangeError,
      'boundaries[0].normal must have non-zero length, got [0, 0]',
    ],
    ['unknown boundary kind', base({ boundaries: [{ kind: 'seabed' } as never] }), TypeError, 'boundaries[0].kind must be one of wall, free-surface, enclosure, got "seabed"'],
    [
      'unknown enclosure shape',
      base({ boundaries: [{ kind: 'enclosure', shape: 'oval' } as never] }),
      TypeError,
      'boundaries[0].shape must be one of circle, rectangle, polygon, got "oval"',
    ],
    [
      'two enclosures',
      base({ boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 3 }, { kind: 'enclosure', shape: 'circle', diameterM: 4 }] }),
      RangeError,
      'at most one enclosure is allowed, got 2 (boundaries[0], boundaries[1])',
    ],
  ] as [string, SectionInput, ErrorConstructor, string][])('%s is rejected with a message naming the field', (_, input, kind, message) => {
    expect(() => validateSectionInput(input)).toThrow(kind);
    expect(() => validateSectionInput(input)).toThrow(message);
    // The solver's entry runs the same checks.
    expect(() => solveSection(input)).toThrow(message);
  });

  test('three straight boundaries without an enclosure are rejected', () => {
    const lines = [0, 1, 2].map((k) => ({ kind: 'wall', pointM: [0, -1 - k], normal: [0, 1] }) as const);
    expect(() => validateSectionInput(base({ boundaries: lines }))).toThrow(
      'without an enclosure at most two straight boundaries are supported (they are represented by images), got 3; add an enclosure to close the region',
    );
  });

  test('two parallel straight boundaries without an enclosure are rejected, naming both', () => {
    const input = base({
      boundaries: [
        { kind: 'wall', pointM: [0, -1], normal: [0, 1] },
        { kind: 'free-surface', pointM: [0, 2], normal: [0, -1] },
      ],
    });
    expect(() => validateSectionInput(input)).toThrow(/boundaries\[0\] and boundaries\[1\] are not perpendicular/);
  });

  test('a body entirely on the dry side of a boundary is rejected', () => {
    const input = base({ boundaries: [{ kind: 'free-surface', pointM: [0, -1], normal: [0, -1] }] });
    expect(() => validateSectionInput(input)).toThrow('bodies[0] lies entirely on the dry side of boundaries[0] (its normal points into the liquid)');
  });

  test('a body dry of the crossing of two boundaries but wet against each alone is rejected', () => {
    const input = base({
      bodies: [circle(0.5, [1, 1])],
      boundaries: [
        { kind: 'wall', pointM: [1.2, 0], normal: [1, 0] },
        { kind: 'free-surface', pointM: [0, 1.2], normal: [0, 1] },
      ],
    });
    expect(() => validateSectionInput(input)).toThrow('bodies[0] has no part in the liquid (it lies on the dry side of the straight boundaries)');
  });

  test('overlapping bodies are rejected', () => {
    expect(() => validateSectionInput(base({ bodies: [circle(1), circle(1, [0.9, 0])] }))).toThrow('bodies[0] and bodies[1] overlap or touch; bodies must be apart');
  });

  test('a body inside another body is rejected', () => {
    expect(() => validateSectionInput(base({ bodies: [circle(2), circle(0.2, [0.1, 0])] }))).toThrow('bodies[0] and bodies[1] overlap or touch');
  });

  test('a body outside its enclosure is rejected', () => {
    const input = base({ bodies: [circle(0.2, [5, 0])], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 2 }] });
    expect(() => validateSectionInput(input)).toThrow('bodies[0] lies (partly) outside the enclosure boundaries[0]');
  });

  test('a body touching its enclosure is rejected with a hint about walls', () => {
    const input = base({
      bodies: [{ shape: 'plate', widthM: 0.5, thicknessM: 0.01, angleDeg: 90, centerM: [0, 0.25] }],
      boundaries: [{ kind: 'enclosure', shape: 'rectangle', widthM: 2, heightM: 2, centerM: [0, 1] }],
    });
    expect(() => validateSectionInput(input)).toThrow(
      'bodies[0] touches or crosses the enclosure boundaries[0]; a body standing on the tank floor needs a wall boundary along the floor',
    );
    // With a wall along the floor the same plate is accepted.
    const withWall = { ...input, boundaries: [...input.boundaries!, { kind: 'wall', pointM: [0, 0], normal: [0, 1] }] } as SectionInput;
    expect(() => validateSectionInput(withWall)).not.toThrow();
  });

  test('an enclosure entirely on the dry side of a boundary is rejected', () => {
    const input = base({
      bodies: [circle(0.2)],
      boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 2 }, { kind: 'wall', pointM: [0, 5], normal: [0, 1] }],
    });
    expect(() => validateSectionInput(input)).toThrow(/bodies\[0\] lies entirely on the dry side of boundaries\[1\]/);
  });
});

describe('parsing JSON from outside', () => {
  test('a well-formed input is returned typed and clean', () => {
    const raw = JSON.parse('{"liquidDensityKgPerM3": 1025, "bodies": [{"shape": "circle", "diameterM": 0.5}], "boundaries": [{"kind": "wall", "pointM": [0, -1], "normal": [0, 1]}]}');
    expect(parseSectionInput(raw)).toEqual({
      liquidDensityKgPerM3: 1025,
      bodies: [{ shape: 'circle', diameterM: 0.5 }],
      boundaries: [{ kind: 'wall', pointM: [0, -1], normal: [0, 1] }],
    });
  });

  test.each([
    ['an array at the top', [], TypeError, 'section input must be an object, got []'],
    ['a misspelt field', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameter: 0.5 }] }, TypeError, 'bodies[0] has an unknown field "diameter" (expected shape, diameterM, centerM)'],
    ['a number given as text', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: '0.5' }] }, TypeError, 'bodies[0].diameterM must be a number, got "0.5"'],
    ['missing bodies', { liquidDensityKgPerM3: 1000 }, TypeError, 'bodies must be an array of bodies, got nothing'],
    ['a centre that is not a pair', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 1, centerM: [1, 2, 3] }] }, TypeError, 'bodies[0].centerM must be a pair [x, y] of numbers, got [1,2,3]'],
    ['an unknown top-level field', { liquidDensityKgPerM3: 1000, bodies: [], fluid: 'water' }, TypeError, 'section input has an unknown field "fluid"'],
    ['boundaries that are not a list', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 1 }], boundaries: {} }, TypeError, 'boundaries must be an array, got {}'],
    ['an unknown body shape', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'star' }] }, TypeError, 'bodies[0].shape must be one of "circle", "rectangle", "ellipse", "plate", "polygon", got "star"'],
    ['density as text', { liquidDensityKgPerM3: 'sea', bodies: [{ shape: 'circle', diameterM: 1 }] }, TypeError, 'liquidDensityKgPerM3 must be a number, got "sea"'],
  ] as [string, unknown, ErrorConstructor, string][])('%s is rejected with a clear message', (_, raw, kind, message) => {
    expect(() => parseSectionInput(raw)).toThrow(kind);
    expect(() => parseSectionInput(raw)).toThrow(message);
  });

  test('geometric checks run after the type checks', () => {
    const raw = { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 1 }, { shape: 'circle', diameterM: 1, centerM: [0.5, 0] }] };
    expect(() => parseSectionInput(raw)).toThrow('bodies[0] and bodies[1] overlap or touch');
  });
});
