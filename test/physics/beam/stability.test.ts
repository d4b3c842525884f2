import { describe, expect, it } from 'vitest';
import { GRAVITY, MECHANISM_MESSAGE, solveMember, type MemberModel, type MemberSupport } from '../../../src/physics/beam';
import { expectClose } from '../../helpers/expect-close';
import { uniformMember, uniformProps } from './fixtures';

const L = 10;
const { ei } = uniformProps();
const euler = (Math.PI * Math.PI * ei) / (L * L); // classical Euler load, pinned–pinned
const pinned: MemberSupport[] = [
  { atM: 0, kind: 'pinned' },
  { atM: L, kind: 'pinned' },
];

describe('buckling is a typed result', () => {
  it('pinned–pinned buckles for compression above π²EI/L² (Euler, classical)', () => {
    const out = solveMember(uniformMember(L, pinned, { tensionN: -1.01 * euler }));
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.reason).toBe('buckles');
      expect(out.message).toMatch(/^buckles under this load/);
    }
  });

  it('just below the Euler load it solves, with a first frequency near zero', () => {
    const out = solveMember(uniformMember(L, pinned, { modes: 1, tensionN: -0.99 * euler }));
    if (!out.ok) throw new Error(out.message);
    const { m } = uniformProps();
    const f0 = (Math.PI / (2 * L * L)) * Math.sqrt(ei / m);
    // Classical: f1 = f1,0 √(1 − P/P_E) = 0.1 f1,0; 0.1 % covers the mesh tolerance amplified near buckling.
    expectClose(out.result.dry.frequenciesHz[0], f0 * Math.sqrt(0.01), { rtol: 1e-3, label: 'f1 near buckling' });
  });

  it('clamped–free buckles above π²EI/(4L²) and not below (Euler, classical)', () => {
    const cantilever: MemberSupport[] = [{ atM: 0, kind: 'clamped' }];
    expect(solveMember(uniformMember(L, cantilever, { tensionN: -1.02 * (euler / 4) })).ok).toBe(false);
    expect(solveMember(uniformMember(L, cantilever, { tensionN: -0.98 * (euler / 4) })).ok).toBe(true);
  });

  it('a column standing under its own weight buckles at q L³ / EI = 7.837 (Greenhill, classical)', () => {
    // A.G. Greenhill (1881); S.P. Timoshenko & J.M. Gere, Theory of Elastic Stability, §2.13: (qL³/EI)cr = 7.837.
    const rod = { section: { shape: 'rod' as const, diameterM: 0.05 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 };
    const props = uniformProps(rod);
    const q = GRAVITY * props.m;
    const column = (len: number): MemberModel =>
      uniformMember(len, [{ atM: 0, kind: 'clamped' }], { modes: 1, tensionN: 0, tensionVariesWithWeight: true, mesh: { initialElements: 48, refine: false } }, rod);
    let lo = Math.cbrt((6 * props.ei) / q);
    let hi = Math.cbrt((9 * props.ei) / q);
    expect(solveMember(column(lo)).ok).toBe(true);
    expect(solveMember(column(hi)).ok).toBe(false);
    for (let i = 0; i < 30; i++) {
      const mid = 0.5 * (lo + hi);
      if (solveMember(column(mid)).ok) lo = mid;
      else hi = mid;
    }
    // Published to 4 figures; 48 elements put the discrete buckling load within 1e-6 of the continuous one.
    expectClose((q * lo ** 3) / props.ei, 7.837, { rtol: 2e-4, label: 'Greenhill critical qL³/EI' });
  });
});

describe('restraint: a mechanism is named as such', () => {
  const cases: [string, MemberSupport[]][] = [
    ['no supports at all', []],
    ['one pinned support', [{ atM: 0, kind: 'pinned' }]],
    ['a guided support alone', [{ atM: 0, kind: 'guided' }]],
    ['two guided supports', [{ atM: 0, kind: 'guided' }, { atM: L, kind: 'guided' }]],
    ['a free "support" only', [{ atM: 0, kind: 'free' }, { atM: L, kind: 'free' }]],
    ['a rotational spring alone', [{ atM: 0, kind: 'spring', rotationalStiffnessNmPerRad: 1e6 }]],
  ];
  for (const [name, supports] of cases) {
    it(`${name}: "${MECHANISM_MESSAGE}"`, () => {
      const out = solveMember(uniformMember(L, supports));
      expect(out.ok).toBe(false);
      if (!out.ok) {
        expect(out.reason).toBe('mechanism');
        expect(out.message).toBe('member can move as a rigid body: add a support');
      }
    });
  }

  const fine: [string, Partial<MemberModel>, MemberSupport[]][] = [
    ['pinned plus a rotational spring at the same point', {}, [{ atM: 0, kind: 'pinned' }, { atM: 0, kind: 'spring', rotationalStiffnessNmPerRad: 1e6 }]],
    ['two translational springs', {}, [{ atM: 0, kind: 'spring', translationalStiffnessNPerM: 1e6 }, { atM: 4, kind: 'spring', translationalStiffnessNPerM: 1e6 }]],
    ['soil springs alone', { soilSprings: [{ fromM: 0, toM: 3, modulusNPerM2: 1e7 }] }, []],
    ['one pin at the top of a member hanging in tension', { tensionN: 1e5, tensionVariesWithWeight: true }, [{ atM: L, kind: 'pinned' }]],
  ];
  for (const [name, extra, supports] of fine) {
    it(`${name} is enough restraint`, () => {
      const out = solveMember(uniformMember(L, supports, extra));
      if (!out.ok) throw new Error(out.message);
      expect(out.result.dry.frequenciesHz[0]).toBeGreaterThan(0);
    });
  }
});
