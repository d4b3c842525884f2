/**
 * Assumptions and solver diagnostics in plain words, from what the result and the member build say was
 * used: potential-flow added mass, the pressure-release surface, the beam theory, the support and fixity
 * model (the builder's notes), the mesh and the axial load.
 */
import type { MemberResult } from '../../physics/beam/result';
import type { MemberBuild } from '../../kinds/common/types';
import { type DisplayUnits, pct, plain, qty } from './display-units';

export function beamTheoryText(theory: MemberResult['beamTheory']): string {
  return theory === 'timoshenko'
    ? 'Timoshenko beam finite elements: shear deformation and rotary inertia included, because the member is stubby (length / depth below about 10).'
    : 'Euler–Bernoulli beam, Hermite cubic finite elements with consistent mass: shear deformation and rotary inertia neglected, which suits slender members (length / depth above about 10).';
}

export function assumptionLines(member: MemberResult, build: MemberBuild): string[] {
  const lines: string[] = [];
  if (member.wet) {
    lines.push(
      'Added mass from potential flow: the liquid is inviscid, incompressible and at rest, and the motions are small. It acts on the submerged length only.',
      'The liquid surface is treated as pressure-release (zero potential): valid when the member’s frequencies are well above the sloshing frequencies of the liquid.',
      member.addedMass?.endEffect
        ? 'Added mass per metre is the two-dimensional (strip) value, reduced for three-dimensional end effects as stated under the mass table.'
        : 'Added mass per metre is the two-dimensional (strip) value for each section; no reduction for three-dimensional end effects.',
    );
  }
  // The builder may already say which theory it chose (and why); do not say it twice.
  if (!build.notes.some((n) => /Timoshenko|Euler/.test(n))) lines.push(beamTheoryText(member.beamTheory));
  lines.push(`Elevations z are measured along the member from the ${build.origin}.`);
  lines.push(...build.notes);
  return lines;
}

export function meshText(member: MemberResult): string {
  const m = member.mesh;
  const tried = m.history.length > 1 ? ` (meshes tried: ${m.history.join(', ')} elements)` : '';
  const change =
    m.lastChangePercent === null
      ? 'refinement off'
      : `largest change at the last doubling ${plain(m.lastChangePercent, '', 2)} %, tolerance ${pct(m.relativeTolerance, 2)}`;
  return `${m.elements} elements${tried}; ${m.converged ? 'converged' : 'NOT converged'}: ${change}.`;
}

/** Axial load in words, or null when there is none. Positive = tension. */
export function tensionText(member: MemberResult, units: DisplayUnits): string | null {
  const t = member.tension;
  if (t.minN === 0 && t.maxN === 0) return null;
  const f = (n: number): string => qty(n, units.force);
  return t.varies
    ? `Axial tension varies with submerged weight: ${f(t.bottomN)} at the bottom, ${f(t.topN)} at the top (negative = compression).`
    : `Axial tension ${f(t.topN)} along the member (negative = compression).`;
}
