/**
 * Added mass per metre on the submerged part of the member (strip theory).
 * Unbounded liquid uses closed forms: a circle (tube or rod, diameter including coating) m_a = ρ π D²/4,
 * Ca = 1; a flat plate of width w moving normal to itself m_a = ρ π (w/2)², Ca = 1 (H. Lamb, Hydrodynamics,
 * classical; plate thickness neglected). Confined sections (liquid.boundaries given), and shapes without a
 * closed form (src/physics/shapes), go to the 2D section solver, once per distinct section within one solve. Contents move with the member and take none.
 */
import type { MemberModel, MemberSegment } from './model';
import { cylinderEndEffectFactor, END_EFFECT_SOURCE, PERFORATION_SOURCE, perforationFactor, plateEndEffectFactor } from './reductions';
import { type SectionSolver, sectionBody, sectionInput } from './section-bridge';
import { interpolateSection, sectionAt } from './section-props';
import { shapeOf } from '../shapes/registry';
import type { AddedMassMethod } from '../shapes/types';
import { concentricAnnulusCa } from './annulus';

export type { AddedMassMethod };

/** Added mass of one segment: m_a(t) = Ca(t) · ρ · π (w_outer(t)/2)² · endEffect, t = fraction along it. */
export interface SegmentAddedMass {
  method: AddedMassMethod;
  /** 2D coefficient on the reference area π (w_outer/2)² at the segment's ends, perforation included. */
  caStart: number;
  caEnd: number;
  perforationFactor: number;
  /**
   * A tapered segment solved by the section solver: Ca at stations along it, `t` ascending from 0 to 1 and
   * `ca` beside it (perforation included); Ca is interpolated linearly between stations, not between the ends
   * (confined added mass is far from linear along a taper: Fritz's annulus Ca = (R2² + R1²)/(R2² − R1²)).
   */
  stations?: { t: Float64Array; ca: Float64Array };
}

/** Taper stations: bisect while the linear prediction at a midpoint misses the solved Ca by more than this. */
export const TAPER_CA_RTOL = 0.005;
/** Deepest bisection of a taper (2^6 = 64 intervals at most). */
const TAPER_MAX_DEPTH = 6;

/** Ca at fraction t of a segment from its plan: piecewise linear over the stations, else between the ends. */
export function caAt(s: SegmentAddedMass, t: number): number {
  const st = s.stations;
  if (!st) return s.caStart + (s.caEnd - s.caStart) * t;
  const n = st.t.length;
  if (t <= 0) return st.ca[0];
  if (t >= 1) return st.ca[n - 1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (st.t[mid] <= t) lo = mid;
    else hi = mid;
  }
  const u = (t - st.t[lo]) / (st.t[hi] - st.t[lo]);
  return st.ca[lo] + u * (st.ca[hi] - st.ca[lo]);
}

export interface EndEffectUsed {
  factor: number;
  basis: 'circular cylinder' | 'rectangular plate';
  submergedLengthM: number;
  /** Mean outer diameter (cylinder) or plate width over the submerged length, m. */
  widthM: number;
  source: string;
}

export interface AddedMassPlan {
  densityKgPerM3: number;
  /** Per segment; null where the segment is entirely out of the liquid. */
  segments: (SegmentAddedMass | null)[];
  endEffect: EndEffectUsed | null;
  perforation: { ratio: number; factor: number; source: string } | null;
  /** Distinct section-solver calls made for this plan. */
  sectionSolves: number;
  /** Largest estimated relative discretisation error of the section-solver added masses used (null: none, or not given). */
  sectionRelativeError: number | null;
  warnings: string[];
}

export type AddedMassPlanOutcome = { ok: true; plan: AddedMassPlan } | { ok: false; reason: 'section-solver-failed'; message: string };

/** Cache of section-solver coefficients (and their error estimates) by input, shared across the mesh levels of one solve. */
export type SectionCache = Map<string, { ca: number; relativeError: number | null }>;

/** `referenceAreaM2`: the section's reference area at t when the caller has it (saves recomputing the section). */
export function addedMassPerM(plan: AddedMassPlan, seg: MemberSegment, segIndex: number, t: number, referenceAreaM2?: number): number {
  const s = plan.segments[segIndex];
  if (!s) return 0;
  const ca = caAt(s, t);
  const factor = plan.endEffect ? plan.endEffect.factor : 1;
  return ca * plan.densityKgPerM3 * (referenceAreaM2 ?? sectionAt(seg, t).referenceAreaM2) * factor;
}

export function planAddedMass(model: MemberModel, solver: SectionSolver | undefined, cache: SectionCache): AddedMassPlanOutcome {
  const liq = model.liquid!;
  const rho = liq.densityKgPerM3;
  const boundaries = liq.boundaries ?? [];
  const confined = boundaries.length > 0;
  const p = liq.perforationRatio ?? 0;
  const warnings: string[] = [];
  const segments: (SegmentAddedMass | null)[] = [];
  let solves = 0;
  let worstError: number | null = null;
  let anyPlate = false;
  for (let i = 0; i < model.segments.length; i++) {
    const seg = model.segments[i];
    if (!(seg.toM > liq.fromM && seg.fromM < liq.toM)) {
      segments.push(null);
      continue;
    }
    const shape = shapeOf(seg.section);
    anyPlate ||= shape.perforable;
    const perf = shape.perforable ? perforationFactor(p) : 1;
    // Surrounded here? Everywhere in the liquid, or only above liq.boundariesFromM (segments never straddle it).
    const segConfined = confined && (liq.boundariesFromM === undefined || 0.5 * (seg.fromM + seg.toM) >= liq.boundariesFromM);
    const segBoundaries = segConfined ? boundaries : [];
    if (!segConfined && shape.closedForm) {
      segments.push({ method: shape.closedForm, caStart: perf, caEnd: perf, perforationFactor: perf });
      continue;
    }
    const coat = seg.coating?.thicknessM ?? 0;
    // A round member centred in a round pipe: Fritz's closed form, exact, no solver (annulus.ts).
    const sectionOf = (t: number) => (t === 0 ? seg.section : t === 1 ? (seg.endSection ?? seg.section) : interpolateSection(seg, t));
    const annular = concentricAnnulusCa(sectionBody(seg.section, coat), segBoundaries) !== null;
    if (!solver && !annular) {
      const needs = segConfined ? 'liquid.boundaries needs' : `the added mass of a "${seg.section.shape}" section needs`;
      return { ok: false, reason: 'section-solver-failed', message: `${needs} the section solver, which is not available` };
    }
    let failure: string | null = null;
    // Ca of the section at fraction t of the segment, through the cache; null (and `failure` set) when it fails.
    const caOf = (t: number): number | null => {
      const section = sectionOf(t);
      if (annular) {
        const exact = concentricAnnulusCa(sectionBody(section, coat), segBoundaries);
        if (exact !== null) return exact * perf;
      }
      if (!solver) {
        failure = `added mass of segments[${i}]: the section solver is not available`;
        return null;
      }
      const input = sectionInput(section, coat, rho, segBoundaries);
      const key = JSON.stringify(input);
      let hit = cache.get(key);
      if (hit === undefined) {
        const out = solver(input);
        solves++;
        if (!out.ok) {
          failure = `added mass of segments[${i}] in its surroundings: ${out.message}`;
          return null;
        }
        const ca = out.result.addedMass[0][0] / (rho * sectionAt(seg, t).referenceAreaM2);
        if (!(Number.isFinite(ca) && ca > 0)) {
          failure = `section solver gave a non-positive added mass for segments[${i}]`;
          return null;
        }
        hit = { ca, relativeError: out.result.swayRelativeError ?? null };
        cache.set(key, hit);
      }
      if (hit.relativeError !== null) worstError = Math.max(worstError ?? 0, hit.relativeError);
      return hit.ca * perf;
    };
    const ca0 = caOf(0);
    const ca1 = ca0 === null ? null : caOf(1);
    if (ca0 === null || ca1 === null) return { ok: false, reason: 'section-solver-failed', message: failure! };
    const plan: SegmentAddedMass = { method: annular ? 'annulus closed form (Fritz)' : 'section solver', caStart: ca0, caEnd: ca1, perforationFactor: perf };
    if (seg.endSection && segConfined) {
      // Solve the section where it changes: bisect each interval until the straight line between its ends
      // predicts the solved Ca at its middle within TAPER_CA_RTOL (or the depth limit).
      const pts: [number, number][] = [[0, ca0]];
      const refine = (ta: number, ca: number, tb: number, cb: number, depth: number): boolean => {
        const tm = 0.5 * (ta + tb);
        const cm = caOf(tm);
        if (cm === null) return false;
        if (depth < TAPER_MAX_DEPTH && Math.abs(cm - 0.5 * (ca + cb)) > TAPER_CA_RTOL * cm) {
          if (!refine(ta, ca, tm, cm, depth + 1)) return false;
          return refine(tm, cm, tb, cb, depth + 1);
        }
        pts.push([tm, cm]);
        return true;
      };
      if (!refine(0, ca0, 1, ca1, 1)) return { ok: false, reason: 'section-solver-failed', message: failure! };
      pts.push([1, ca1]);
      plan.stations = { t: Float64Array.from(pts, (p) => p[0]), ca: Float64Array.from(pts, (p) => p[1]) };
    }
    segments.push(plan);
  }
  if (p > 0 && !anyPlate) warnings.push('liquid.perforationRatio applies to plate strips only; it was not used for this member.');
  const perforation = anyPlate && p > 0 ? { ratio: p, factor: perforationFactor(p), source: PERFORATION_SOURCE } : null;
  if (perforation) {
    warnings.push('Perforation reduces the added mass only; the plate mass and stiffness are those of a solid plate.');
  }
  const plan: AddedMassPlan = { densityKgPerM3: rho, segments, endEffect: null, perforation, sectionSolves: solves, sectionRelativeError: worstError, warnings };
  if (liq.endEffect3d) plan.endEffect = endEffect(model, warnings);
  return { ok: true, plan };
}

/** DNV-RP-H103 Table A-2 factor for the whole submerged length (one shape kind only). */
function endEffect(model: MemberModel, warnings: string[]): EndEffectUsed | null {
  const liq = model.liquid!;
  const from = Math.max(0, liq.fromM);
  const to = Math.min(model.lengthM, liq.toM);
  const length = to - from;
  let widthIntegral = 0;
  const kinds = new Set<EndEffectUsed['basis'] | null>();
  for (const seg of model.segments) {
    const a = Math.max(from, seg.fromM);
    const b = Math.min(to, seg.toM);
    if (b <= a) continue;
    kinds.add(shapeOf(seg.section).endEffectBasis);
    // Width is linear in z within a segment: the midpoint value is its mean.
    const tMid = (0.5 * (a + b) - seg.fromM) / (seg.toM - seg.fromM);
    widthIntegral += sectionAt(seg, tMid).outerWidthM * (b - a);
  }
  if (kinds.has(null)) {
    warnings.push('3D end-effect reduction not applied: no tabulated factor for a section of this shape.');
    return null;
  }
  if (kinds.size !== 1) {
    warnings.push('3D end-effect reduction not applied: the submerged length mixes plate strips and round sections.');
    return null;
  }
  const width = widthIntegral / length;
  const plate = kinds.has('rectangular plate');
  if (!plate && length / width < 1.2) {
    warnings.push('Submerged length/diameter is below 1.2, the end of the end-effect table: its first value (0.62) was used.');
  }
  if ((liq.boundaries ?? []).length > 0) {
    warnings.push('The 3D end-effect reduction is tabulated for a body in open liquid; it was applied to a confined section as well.');
  }
  const factor = plate ? plateEndEffectFactor(length, width) : cylinderEndEffectFactor(length / width);
  return { factor, basis: plate ? 'rectangular plate' : 'circular cylinder', submergedLengthM: length, widthM: width, source: END_EFFECT_SOURCE };
}
