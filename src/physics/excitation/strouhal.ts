/**
 * Strouhal number by section and Reynolds number, each value with its source.
 *
 * A value is reported as a band [low, high] plus the single `value` used where one number is needed.
 * `value` is always the upper end: a higher St gives a higher shedding frequency f_s = St·U/D, hence a higher
 * f_s / f_n and a lower critical speed for the stem screen, so the upper end errs on the safe side.
 * The DNV-RP-C205 §9 in-line and cross-flow checks work on V_R and do not use St.
 */
import type { ZoneSection } from './types';

export type StrouhalRegime =
  | 'laminar'
  | 'subcritical'
  | 'critical'
  | 'transcritical'
  | 'plate-normal'
  | 'square'
  | 'rectangle-default'
  | 'override';

export interface StrouhalValue {
  /** St used for f_s where one number is needed (the upper end of the band). */
  value: number;
  low: number;
  high: number;
  regime: StrouhalRegime;
  source: string;
}

/** Circular cylinder Reynolds-number ranges (docs/sources.md §S6.2). */
export const RE_SUBCRITICAL_MIN = 300;
export const RE_SUBCRITICAL_MAX = 2e5;
export const RE_TRANSCRITICAL_MIN = 3.5e6;

/** Rectangle depth/width ratio (d/b) limits of the small table below. */
export const PLATE_NORMAL_MAX_RATIO = 0.1;
export const SQUARE_RATIO_RANGE = [0.9, 1.1] as const;

const SUBCRITICAL: StrouhalValue = {
  value: 0.2,
  low: 0.2,
  high: 0.2,
  regime: 'subcritical',
  source:
    'circle, subcritical 300 ≤ Re ≤ 2×10⁵: St ≈ 0.2 (common practice; DNV-RP-C205 §9). ' +
    'EN 1991-1-4 (Eurocode 1, wind actions) Annex E, Table E.1 uses 0.18 for design.',
};

const LAMINAR: StrouhalValue = {
  value: 0.2,
  low: 0.12,
  high: 0.2,
  regime: 'laminar',
  source:
    'circle, Re < 300: no shedding below Re ≈ 40–50, then St rises from about 0.12 towards 0.2 ' +
    '(A. Roshko, On the development of turbulent wakes from vortex streets, NACA Report 1191, 1954); 0.2 used as the conservative upper value.',
};

/**
 * Critical and supercritical range: the laminar boundary layer separation moves, regular shedding weakens
 * and measured St scatters widely. We screen with the band between the two published anchors around it
 * (0.2 subcritical, 0.27 transcritical) and use its upper end. Narrow-band values up to about 0.45 have been
 * reported near Re ≈ 5×10⁵ (docs/sources.md §S6.2), so the source text says so and invites an override.
 */
const CRITICAL: StrouhalValue = {
  value: 0.27,
  low: 0.2,
  high: 0.27,
  regime: 'critical',
  source:
    'circle, critical/supercritical 2×10⁵ < Re ≤ 3.5×10⁶: shedding is weak and St scatters; Wetmode screens with the ' +
    'band 0.2 (subcritical, DNV-RP-C205 §9) to 0.27 (transcritical, Roshko 1961) and uses 0.27 (conservative). ' +
    'Values up to ≈0.45 were reported near Re ≈ 5×10⁵ (R.D. Blevins, Flow-Induced Vibration, 2nd ed., 1990, ch. 3): override St if that matters.',
};

const TRANSCRITICAL: StrouhalValue = {
  value: 0.27,
  low: 0.27,
  high: 0.27,
  regime: 'transcritical',
  source: 'circle, transcritical Re > 3.5×10⁶: St ≈ 0.27 (A. Roshko, J. Fluid Mech. 10 (1961) 345).',
};

const PLATE_NORMAL: StrouhalValue = {
  value: 0.15,
  low: 0.14,
  high: 0.15,
  regime: 'plate-normal',
  source:
    'flat plate normal to the flow (d/b ≤ 0.1): St ≈ 0.14–0.15 on plate width (Fage & Johansen, Proc. R. Soc. A 116 ' +
    '(1927) 170; R.D. Blevins, Flow-Induced Vibration, 2nd ed., 1990); 0.15 used.',
};

const SQUARE: StrouhalValue = {
  value: 0.13,
  low: 0.12,
  high: 0.13,
  regime: 'square',
  source:
    'square section, flow normal to a face (0.9 ≤ d/b ≤ 1.1): St ≈ 0.13 (S. Okajima, J. Fluid Mech. 123 (1982) 379); ' +
    'EN 1991-1-4 Table E.1 gives 0.12; 0.13 used.',
};

const RECTANGLE_DEFAULT: StrouhalValue = {
  value: 0.2,
  low: 0.06,
  high: 0.2,
  regime: 'rectangle-default',
  source:
    'Wetmode default, no source: sharp-edged rectangles have St from about 0.06 to 0.2 depending on d/b ' +
    '(EN 1991-1-4 Annex E, Figure E.1); 0.2 is used as an upper value. Enter St for this section if known.',
};

/** Strouhal number of a circular cylinder at Reynolds number `re` (ranges above, boundaries inclusive as listed). */
export function strouhalCircle(re: number): StrouhalValue {
  if (re < RE_SUBCRITICAL_MIN) return LAMINAR;
  if (re <= RE_SUBCRITICAL_MAX) return SUBCRITICAL;
  if (re <= RE_TRANSCRITICAL_MIN) return CRITICAL;
  return TRANSCRITICAL;
}

/**
 * Strouhal number for a zone section at Reynolds number `re` (based on D, see `ZoneSection`).
 * Sharp-edged rectangles separate at their corners, so their St hardly depends on Re in the range of interest;
 * it depends on the depth/width ratio d/b instead.
 */
export function strouhalNumber(section: ZoneSection, re: number): StrouhalValue {
  if (section.kind === 'circle') return strouhalCircle(re);
  const ratio = section.depthAlongFlowM / section.widthAcrossFlowM;
  if (ratio <= PLATE_NORMAL_MAX_RATIO) return PLATE_NORMAL;
  if (ratio >= SQUARE_RATIO_RANGE[0] && ratio <= SQUARE_RATIO_RANGE[1]) return SQUARE;
  return RECTANGLE_DEFAULT;
}

/** A user-entered St for every zone. */
export function strouhalOverride(value: number, source: string): StrouhalValue {
  return { value, low: value, high: value, regime: 'override', source };
}

/**
 * Regimes in increasing Re for a section: [ReFrom, ReTo] with the St used there. Used to solve for the speed at
 * which f_s reaches a target when St itself depends on Re (stem critical speed).
 */
export function strouhalRegimes(section: ZoneSection): { reFrom: number; reTo: number; st: StrouhalValue }[] {
  if (section.kind !== 'circle') return [{ reFrom: 0, reTo: Infinity, st: strouhalNumber(section, 1) }];
  return [
    { reFrom: 0, reTo: RE_SUBCRITICAL_MIN, st: LAMINAR },
    { reFrom: RE_SUBCRITICAL_MIN, reTo: RE_SUBCRITICAL_MAX, st: SUBCRITICAL },
    { reFrom: RE_SUBCRITICAL_MAX, reTo: RE_TRANSCRITICAL_MIN, st: CRITICAL },
    { reFrom: RE_TRANSCRITICAL_MIN, reTo: Infinity, st: TRANSCRITICAL },
  ];
}
