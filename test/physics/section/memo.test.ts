/** Section outcomes remembered between keystrokes: equal on a hit, a miss on any change, bounded, read-only. */
import { beforeEach, describe, expect, test } from 'vitest';
import { MEMO_ENTRIES, clearSectionMemo, solveSection, solveSectionMemo } from '../../../src/physics/section/index';
import { canonicalKey, memoSize } from '../../../src/physics/section/memo';
import { defaultSectionSolver } from '../../../src/physics/beam/section-bridge';
import { solveMember, type MemberModel } from '../../../src/physics/beam';
import { RHO, alone } from './helpers';

const square = () => alone({ shape: 'rectangle', widthM: 0.5, heightM: 0.5 }, [{ kind: 'wall', pointM: [0, -0.4], normal: [0, 1] }]);

beforeEach(() => clearSectionMemo());

describe('section memo', () => {
  test('a repeated input is a hit that returns values equal to a fresh solve', () => {
    const first = solveSectionMemo(square());
    expect(memoSize()).toBe(1);
    const again = solveSectionMemo(square());
    expect(memoSize()).toBe(1);
    expect(again).toBe(first);
    const fresh = solveSection(square());
    if (!again.ok || !fresh.ok) throw new Error('solve failed');
    // Same deterministic computation: equal to the last bit.
    expect(again.result.addedMass).toEqual(fresh.result.addedMass);
    expect(again.result.errorEstimates).toEqual(fresh.result.errorEstimates);
  });

  test('a changed input or changed options miss; key order does not matter', () => {
    solveSectionMemo(square());
    const moved = square();
    moved.boundaries![0] = { kind: 'wall', pointM: [0, -0.41], normal: [0, 1] };
    const a = solveSectionMemo(moved);
    expect(memoSize()).toBe(2);
    solveSectionMemo(square(), { panelsPerBody: 32 });
    expect(memoSize()).toBe(3);
    const reordered = { bodies: square().bodies, boundaries: square().boundaries, liquidDensityKgPerM3: RHO };
    solveSectionMemo(reordered);
    expect(memoSize()).toBe(3);
    expect(canonicalKey({ b: 1, a: [2, { d: 3, c: undefined }] })).toBe('{"a":[2,{"d":3}],"b":1}');
    const b = solveSectionMemo(square());
    if (!a.ok || !b.ok) throw new Error('solve failed');
    expect(a.result.addedMass[0][0]).not.toBe(b.result.addedMass[0][0]);
  });

  test(`holds at most ${MEMO_ENTRIES} outcomes, forgetting the least recently used`, () => {
    const circle = (d: number) => alone({ shape: 'circle', diameterM: d });
    for (let k = 0; k < MEMO_ENTRIES + 8; k++) solveSectionMemo(circle(0.1 + 0.01 * k), { panelsPerBody: 16 });
    expect(memoSize()).toBe(MEMO_ENTRIES);
  });

  test('remembered outcomes are read-only, so one caller cannot change what the next receives', () => {
    const out = solveSectionMemo(square());
    if (!out.ok) throw new Error('solve failed');
    expect(Object.isFrozen(out.result.addedMass[0])).toBe(true);
    expect(() => {
      (out.result.addedMass[0] as number[])[0] = 0;
    }).toThrow(TypeError);
  });

  test('the beam path answers a keystroke that changes the length (not the section) from the memo', () => {
    const member = (lengthM: number): MemberModel => ({
      lengthM,
      segments: [{ fromM: 0, toM: lengthM, section: { shape: 'plate-strip', widthM: 0.3, thicknessM: 0.01 }, youngsModulusPa: 193e9, densityKgPerM3: 8000 }],
      liquid: { densityKgPerM3: 1000, fromM: 0, toM: lengthM, boundaries: [{ kind: 'wall', pointM: [0.055, 0], normal: [-1, 0] }] },
      supports: [
        { atM: 0, kind: 'clamped' },
        { atM: lengthM, kind: 'pinned' },
      ],
      modes: 2,
    });
    const a = solveMember(member(2.4));
    const after = memoSize();
    expect(after).toBeGreaterThan(0);
    const b = solveMember(member(2.6));
    expect(memoSize()).toBe(after);
    if (!a.ok || !b.ok) throw new Error('solve failed');
    expect(b.result.zones[0].addedMassCoefficientCa).toBe(a.result.zones[0].addedMassCoefficientCa);
    // The bridge returns its own copy: changing it does not reach the memo.
    const input = { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle' as const, diameterM: 0.3 }], boundaries: [{ kind: 'wall' as const, pointM: [0.3, 0] as [number, number], normal: [-1, 0] as [number, number] }] };
    const first = defaultSectionSolver(input);
    if (!first.ok) throw new Error(first.message);
    const kept = first.result.addedMass[0][0];
    first.result.addedMass[0][0] = -1;
    const second = defaultSectionSolver(input);
    if (!second.ok) throw new Error(second.message);
    expect(second.result.addedMass[0][0]).toBe(kept);
  });
});
