import { describe, expect, it } from 'vitest';
import { parseMemberModel, solveMember } from '../../../src/physics/beam';
import { parseSectionInput, solveSection } from '../../../src/physics/section/index';

/** A clamped 20 m tube; each test adds one oversized list. */
function base(): Record<string, any> {
  return {
    lengthM: 20,
    segments: [{ fromM: 0, toM: 20, section: { shape: 'tube', outerDiameterM: 0.762, wallThicknessM: 0.019 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 }],
    supports: [{ atM: 0, kind: 'clamped' }],
  };
}

describe('every list of a member input has a bound, refused before any work is done', () => {
  it.each([
    ['soilSprings', 100000, (i: number) => ({ fromM: 0, toM: 1 + (i % 5), modulusNPerM2: 1e6 }), 'soilSprings must be an array of at most 1000 entries, got 100000 entries'],
    ['masses', 100000, (i: number) => ({ atM: i % 20, massKg: 1 }), 'masses must be an array of at most 1000 entries, got 100000 entries'],
    ['supports', 101, (i: number) => ({ atM: i % 20, kind: 'pinned' }), 'supports must be an array of at most 100 entries, got 101 entries'],
  ])('%s with %i entries is refused by name', (field, n, make, message) => {
    const m = base();
    m[field] = Array.from({ length: n }, (_, i) => make(i));
    expect(() => parseMemberModel(m)).toThrow(message);
  });

  it('100,000 segments are refused by name', () => {
    const m = base();
    m.segments = Array.from({ length: 100000 }, (_, i) => ({ ...m.segments[0], fromM: (20 * i) / 100000, toM: (20 * (i + 1)) / 100000 }));
    expect(() => parseMemberModel(m)).toThrow('segments must be an array of at most 10000 entries, got 100000 entries');
  });

  it('1,000 soil ranges with distinct ends are answered or refused with a message, never a stack overflow', () => {
    const m = base();
    m.soilSprings = Array.from({ length: 1000 }, (_, i) => ({ fromM: (6 * i) / 1000, toM: (6 * (i + 1)) / 1000, modulusNPerM2: 1e6 }));
    const out = solveMember(m as never);
    if (!out.ok) expect(out.message).toMatch(/mesh/);
  });
});

describe('the section solver bounds its work', () => {
  it('a polygon of 1,000 points is refused by name before any geometry check', () => {
    const pts = Array.from({ length: 1000 }, (_, k) => [Math.cos((2 * Math.PI * k) / 1000), Math.sin((2 * Math.PI * k) / 1000)]);
    expect(() => parseSectionInput({ liquidDensityKgPerM3: 1000, bodies: [{ shape: 'polygon', pointsM: pts }] })).toThrow(
      'bodies[0].pointsM must list from 3 to 256 points [x, y], got 1000 points',
    );
  });

  it('more panels than the dense solve can take in seconds are refused with the count and the way out', () => {
    const bodies = Array.from({ length: 24 }, (_, k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [k, 0] as [number, number] }));
    expect(() => solveSection({ liquidDensityKgPerM3: 1000, bodies, panelsPerBody: 1024 })).toThrow(/needs 24576 panels .* more than the 2048 the solver allows; lower panelsPerBody/);
  });

  it('17 boundaries are refused by name', () => {
    const walls = Array.from({ length: 17 }, () => ({ kind: 'wall', pointM: [0, -2], normal: [0, 1] }));
    expect(() => parseSectionInput({ liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 1 }], boundaries: walls })).toThrow('boundaries may hold at most 16 boundaries, got 17');
  });
});
