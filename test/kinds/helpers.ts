/** Helpers for the member-builder tests: reading a built model at a point, as the beam engine will. */
import { expect } from 'vitest';
import { parseMemberModel, sectionAt } from '../../src/physics/beam';
import type { MemberModel, MemberSegment } from '../../src/physics/beam';
import type { MemberBuild } from '../../src/kinds/common/types';

export function segmentAt(model: MemberModel, zM: number): MemberSegment {
  const seg = model.segments.find((s) => zM >= s.fromM && zM <= s.toM);
  if (!seg) throw new Error(`no segment at z = ${zM}`);
  return seg;
}

/** Mass per metre at z by part, through the beam engine's own section properties. */
export function massAt(model: MemberModel, zM: number): { structure: number; contents: number; coating: number } {
  const seg = segmentAt(model, zM);
  const p = sectionAt(seg, (zM - seg.fromM) / (seg.toM - seg.fromM));
  return { structure: p.structureKgPerM, contents: p.contentsKgPerM, coating: p.coatingKgPerM };
}

/** Structural facts every build must satisfy, whatever the inputs (property checks). */
export function expectWellFormed(build: MemberBuild): void {
  const { model } = build;
  // The beam engine's input gate accepts it unchanged in substance.
  expect(() => parseMemberModel(model)).not.toThrow();
  // Segments cover [0, L] in order, without gaps or overlaps.
  expect(model.segments[0].fromM).toBe(0);
  for (let i = 1; i < model.segments.length; i++) expect(model.segments[i].fromM).toBe(model.segments[i - 1].toM);
  expect(model.segments[model.segments.length - 1].toM).toBe(model.lengthM);
  // Landmarks ascend; bands lie on the member.
  for (let i = 1; i < build.landmarks.length; i++) expect(build.landmarks[i].zM).toBeGreaterThanOrEqual(build.landmarks[i - 1].zM);
  for (const b of build.bands) {
    expect(b.fromM).toBeGreaterThanOrEqual(0);
    expect(b.toM).toBeLessThanOrEqual(model.lengthM);
    expect(b.toM).toBeGreaterThan(b.fromM);
  }
}

export function landmark(build: MemberBuild, id: string, label?: string): number {
  const l = build.landmarks.find((x) => x.id === id && (label === undefined || x.label === label));
  if (!l) throw new Error(`no landmark ${id} ${label ?? ''}`);
  return l.zM;
}
