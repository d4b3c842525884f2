import { describe, expect, it } from 'vitest';
import { solveMember, type MemberModel, type MemberSegment } from '../../../src/physics/beam';
import { seededUniform01 } from '../../../src/physics/linalg/seeded';
import { resultSanity } from '../../../src/physics/beam/sanity';
import { expectClose } from '../../helpers/expect-close';
import pileJson from '../../../examples/member-fender-pile-port-halloran.json';

const pile = pileJson as unknown as MemberModel;

/** Converged f1 of the fender pile: a fixed 400-element mesh, well inside the precision limit (cross-check by refinement). */
function referenceF1(): number {
  const out = solveMember({ ...pile, mesh: { initialElements: 400, refine: false } });
  if (!out.ok) throw new Error(out.message);
  return out.result.dry.frequenciesHz[0];
}

/** The pile with each segment cut into `pieces` equal pieces; `distinct` makes neighbours differ by 1e-9 m of wall. */
function cut(pieces: number, distinct: boolean): MemberModel {
  const segments: MemberSegment[] = [];
  for (const s of pile.segments) {
    for (let i = 0; i < pieces; i++) {
      const wall = s.section.shape === 'tube' ? s.section.wallThicknessM + (distinct && i % 2 === 1 ? 1e-9 : 0) : 0;
      segments.push({
        ...s,
        section: { shape: 'tube', outerDiameterM: 0.762, wallThicknessM: wall },
        fromM: s.fromM + ((s.toM - s.fromM) * i) / pieces,
        toM: i === pieces - 1 ? s.toM : s.fromM + ((s.toM - s.fromM) * (i + 1)) / pieces,
      });
    }
  }
  return { ...pile, segments };
}

describe('meshes that double precision cannot carry are refused, never answered wrongly', () => {
  const ref = referenceF1();

  it('the fender pile gives the same f1 for every accepted initial mesh, or a message', () => {
    for (const initialElements of [1, 3, 12, 50, 200, 600, 1000, 1500, 2000, 3200, 5000, 10000, 20000]) {
      const out = solveMember({ ...pile, mesh: { initialElements } });
      if (!out.ok) {
        expect(out.message, `initialElements ${initialElements}`).toMatch(/initialElements|maxElements/);
        continue;
      }
      // 0.1 %: the accuracy asked of an accepted mesh; convergence tolerance is 0.05 % (cross-check by refinement).
      expectClose(out.result.dry.frequenciesHz[0], ref, { rtol: 1e-3, label: `f1 with initialElements ${initialElements}` });
    }
  });

  it('a pile described in many equal pieces is merged back and gives the same f1', () => {
    for (const pieces of [1, 10, 100, 1000, 3000]) {
      const out = solveMember(cut(pieces, false));
      if (!out.ok) throw new Error(`${pieces} pieces: ${out.message}`);
      // Merging equal neighbours gives exactly the undivided member's mesh (classical: same model).
      expectClose(out.result.dry.frequenciesHz[0], ref, { rtol: 1e-3, label: `f1 with ${pieces} pieces per segment` });
      expect(out.result.zones.length).toBeLessThanOrEqual(6);
    }
  });

  it('a pile in many pieces that differ is answered within 0.1 % or refused with a message', () => {
    for (const pieces of [10, 100, 400, 1000, 3000]) {
      const out = solveMember(cut(pieces, true));
      if (!out.ok) {
        expect(out.message, `${pieces} distinct pieces`).toMatch(/mesh|elements/);
        continue;
      }
      // 1e-9 m of wall changes f1 by about 1e-7 relative, far below the 0.1 % asked (cross-check).
      expectClose(out.result.dry.frequenciesHz[0], ref, { rtol: 1e-3, label: `f1 with ${pieces} distinct pieces per segment` });
    }
  });

  it('mesh.maxElements is honoured: more mesh intervals than it allows are refused by name', () => {
    const out = solveMember({ ...cut(100, true), mesh: { maxElements: 100 } });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toMatch(/mesh\.maxElements = 100/);
    const ok = solveMember({ ...pile, mesh: { maxElements: 40 } });
    if (!ok.ok) throw new Error(ok.message);
    for (const n of ok.result.mesh.history) expect(n).toBeLessThanOrEqual(40);
  });

  it('a lumped mass a fraction of a millimetre from another mesh point does not upset the frequencies', () => {
    const near = { ...pile, masses: [...(pile.masses ?? []), { atM: 22.5 + 1e-5, massKg: 1 }] };
    const out = solveMember(near);
    if (!out.ok) throw new Error(out.message);
    // 1 kg beside a 2,500 kg mass at the same point moves f1 by about 1e-4 at most (cross-check against the pile alone).
    expectClose(out.result.dry.frequenciesHz[0], ref, { rtol: 1e-3, label: 'f1 with a near-coincident mass' });
    expect(out.result.warnings.join(' ')).toMatch(/merged/);
  });
});

/** A varied member: 1–3 segments of tube, rod or plate strip (some tapered), held so it cannot move as a rigid body. */
function fuzzMember(next: () => number): MemberModel {
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)];
  const lengthM = 1 + 59 * next();
  const nSeg = 1 + Math.floor(3 * next());
  const shape = pick(['tube', 'rod', 'plate-strip'] as const);
  const sec = () => {
    const d = 0.02 + 1.5 * next();
    if (shape === 'tube') return { shape, outerDiameterM: d, wallThicknessM: d * (0.02 + 0.2 * next()) };
    if (shape === 'rod') return { shape, diameterM: d };
    return { shape, widthM: d, thicknessM: d * (0.02 + 0.1 * next()) };
  };
  const segments: MemberSegment[] = [];
  for (let i = 0; i < nSeg; i++) {
    const s: MemberSegment = {
      fromM: (lengthM * i) / nSeg,
      toM: (lengthM * (i + 1)) / nSeg,
      section: sec(),
      youngsModulusPa: pick([70e9, 200e9, 210e9]),
      densityKgPerM3: pick([2700, 7850, 8000]),
    };
    if (next() < 0.3) s.endSection = sec();
    if (shape === 'tube' && next() < 0.5) s.contentsDensityKgPerM3 = 1025;
    if (next() < 0.3) s.coating = { thicknessM: 0.05 * next(), densityKgPerM3: 1325 };
    segments.push(s);
  }
  const supports = pick([
    [{ atM: 0, kind: 'clamped' as const }],
    [{ atM: 0, kind: 'pinned' as const }, { atM: lengthM, kind: 'pinned' as const }],
    [{ atM: 0, kind: 'clamped' as const }, { atM: lengthM * (0.3 + 0.7 * next()), kind: 'pinned' as const }],
    [{ atM: lengthM, kind: 'spring' as const, translationalStiffnessNPerM: 10 ** (4 + 4 * next()) }, { atM: 0, kind: 'clamped' as const }],
  ]);
  const from = lengthM * 0.5 * next();
  return {
    lengthM,
    segments,
    supports,
    masses: next() < 0.5 ? [{ atM: lengthM * next(), massKg: 10 ** (4 * next()) }] : [],
    soilSprings: next() < 0.3 ? [{ fromM: 0, toM: 0.2 * lengthM, modulusNPerM2: 1e6 + 1e7 * next() }] : [],
    tensionN: next() < 0.3 ? 1e5 * next() : 0,
    liquid: { densityKgPerM3: pick([1000, 1025, 850]), fromM: from, toM: from + lengthM * (0.2 + next()) },
    modes: 1 + Math.floor(5 * next()),
  };
}

describe('liquid never raises a frequency', () => {
  it('every wet frequency is at most its dry one for 60 seeded members with liquid added', () => {
    const next = seededUniform01(2026);
    for (let k = 0; k < 60; k++) {
      const model = fuzzMember(next);
      const out = solveMember(model);
      // A failed solve must be one the member can really have, never a precision loss dressed as a refusal here.
      if (!out.ok) throw new Error(`member ${k}: ${out.reason}: ${out.message}`);
      const { dry, wet, wetToDryRatio } = out.result;
      for (let i = 0; i < dry.frequenciesHz.length; i++) {
        // Added mass only adds kinetic energy: Rayleigh quotient (classical). 1e-6 allows rounding where the
        // liquid barely touches a mode of a member with a large stiffness contrast (seen: 2e-7 with 4 mm and
        // 133 mm plates in one member), far below the four digits shown.
        expect(wet!.frequenciesHz[i], `member ${k} mode ${i + 1}`).toBeLessThanOrEqual(dry.frequenciesHz[i] * (1 + 1e-6));
        expect(Number.isFinite(wetToDryRatio![i])).toBe(true);
      }
    }
  });
});

describe('results that lost precision are refused', () => {
  it('a pile a billion metres wide is refused with a message, not reported as buckling without compression', () => {
    const big = { ...pile, segments: pile.segments.map((s) => ({ ...s, section: { shape: 'tube' as const, outerDiameterM: 1e9, wallThicknessM: 1e7 } })) };
    const out = solveMember(big);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).not.toMatch(/buckles/);
  });

  it('a result whose wet frequency exceeds the dry one is never ok', () => {
    const base = solveMember(pile);
    if (!base.ok) throw new Error(base.message);
    const r = base.result;
    const wet = { ...r.wet!, frequenciesHz: r.wet!.frequenciesHz.map((f, i) => (i === 1 ? r.dry.frequenciesHz[i] * 1.01 : f)) };
    expect(resultSanity({ ...r, wet })).toMatch(/mode 2 .* above its dry one/);
    expect(resultSanity({ ...r, wetToDryRatio: r.wetToDryRatio!.map((x, i) => (i === 0 ? NaN : x)) })).toMatch(/ratio of mode 1/);
    expect(resultSanity(r)).toBeNull();
  });
});
