/**
 * Method notes for the report: what was computed and the published source each step rests on, taken from
 * what the result says was used (beam theory, added-mass method and factors, screening limits, Strouhal
 * values, damping, liquid). Only methods that were used are listed.
 */
import type { MemberResult } from '../../physics/beam/result';
import type { ScreeningResult } from '../../physics/excitation/results';
import { limitRows } from '../results/check-rows';
import { type DisplayUnits, pct } from '../results/display-units';
import { addedMassLines, type SourcedLine } from '../results/zone-rows';

export function beamMethod(member: MemberResult): SourcedLine {
  const tol = pct(member.mesh.relativeTolerance, 2);
  return member.beamTheory === 'timoshenko'
    ? {
        text: `Natural frequencies and mode shapes by beam finite elements with shear deformation and rotary inertia (Timoshenko beam), consistent mass; mesh doubled until the modes change by less than ${tol}`,
        source: 'Timoshenko beam theory (classical)',
      }
    : {
        text: `Natural frequencies and mode shapes by Euler–Bernoulli beam finite elements (Hermite cubic, consistent mass); mesh doubled until the modes change by less than ${tol}`,
        source: 'Euler–Bernoulli beam theory, finite-element method (classical)',
      };
}

/** Distinct Strouhal sources, from the modes' shedding points and the zones, in order of first use. */
export function strouhalSources(s: ScreeningResult): string[] {
  const out: string[] = [];
  const add = (src: string): void => {
    if (!out.includes(src)) out.push(src);
  };
  for (const m of s.modes) if (m.shedding) add(m.shedding.strouhal.source);
  for (const z of s.zones) add(z.strouhal.source);
  return out;
}

/** `withLimits` false where the screening limits are listed elsewhere with their sources (the printed record). */
export function methodNotes(member: MemberResult, screening: ScreeningResult | null, units: DisplayUnits, withLimits = true): SourcedLine[] {
  const lines: SourcedLine[] = [beamMethod(member)];
  if (member.wet) {
    lines.push({
      text: 'Wet frequencies: added mass per length on the submerged length only, from two-dimensional potential flow (strip theory)',
      source: 'potential-flow added mass (classical)',
    });
    lines.push(...addedMassLines(member, units));
  }
  if (screening) {
    lines.push({
      text: 'Vortex shedding: f_s = St U / D, reduced velocity V_R = U / (f_n D), stability parameter K_S = 4π m_e ζ / (ρ D²), each mode evaluated where it moves most under the liquid',
      source: 'DNV-RP-C205 §9',
    });
    if (withLimits) for (const r of limitRows(screening, units)) lines.push({ text: `${r.name}: ${r.value}`, source: r.source });
    for (const src of strouhalSources(screening)) lines.push({ text: 'Strouhal number', source: src });
  }
  return lines;
}
