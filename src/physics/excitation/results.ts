/**
 * Output of the resonance screening. Every number that comes from a rule carries the rule's source,
 * so the Results screen and the Report can print it beside the value.
 */
import type { LiquidProperties, ScreeningLimits } from './types';
import type { StrouhalValue } from './strouhal';
import type { Verdict } from './verdict';
import type { Severity } from './severity';

export type ExcitationKind = 'in-line-viv' | 'cross-flow-viv' | 'stem-frequency-ratio' | 'machinery' | 'waves';

/** One mode screened against one excitation. */
export interface CheckResult {
  kind: ExcitationKind;
  /** Plain words: "cross-flow VIV", "pump P-1 blade pass 1×", "waves 4–12 s". */
  label: string;
  /** Which natural frequency was compared: the wet one, or the dry one (machinery, when asked). */
  frequencyBasis: 'wet' | 'dry';
  frequencyHz: number;
  verdict: Verdict;
  /**
   * Signed separation in %, see `verdict.ts`: distance from the mode frequency to the nearest edge of the
   * excitation band, as a percentage of that edge frequency; > 0 outside the band, ≤ 0 inside.
   * null when the excitation cannot reach this mode at all (no flow, not submerged, damped out).
   */
  marginPercent: number | null;
  /** Excitation band the mode frequency is compared with, Hz (low = high for a machinery line). null if none. */
  bandHz: { lowHz: number; highHz: number } | null;
  /**
   * Flow speed at the mode's evaluation point (`SheddingPoint.atZM`) at which this excitation begins, m/s:
   * U = V_R,min · f_n · D (in-line, cross-flow) or the U with f_s = limit · f_n (stem).
   * null for machinery and waves, and when no flow speed can start it.
   */
  criticalSpeedMPerS: number | null;
  /** Machinery only: shaft speed at which this order hits the mode frequency exactly, Hz (revolutions per second). */
  resonantShaftHz?: number;
  /** Why the verdict is what it is, in words a surveyor can read. */
  reason: string;
  /** Source of the limit or range used. */
  source: string;
}

/** What a check says before its verdict: which excitation, which frequency, and the rule's source. */
export type CheckBase = Pick<CheckResult, 'kind' | 'label' | 'frequencyBasis' | 'frequencyHz' | 'source'>;

/**
 * A check the excitation cannot reach (not submerged, no flow, damped out): clear, with no margin and no band;
 * `criticalSpeedMPerS` is the speed at which it would begin, when one exists.
 */
export function unreachedCheck(base: CheckBase, criticalSpeedMPerS: number | null, reason: string): CheckResult {
  return { ...base, verdict: 'clear', marginPercent: null, bandHz: null, criticalSpeedMPerS, reason };
}

/** Where a mode is evaluated for vortex shedding, and the numbers there. */
export interface SheddingPoint {
  /** Elevation of the largest |mode shape| within the submerged zones, m. */
  atZM: number;
  zoneIndex: number;
  /** |φ| there divided by max |φ| over the whole mode (1 = the mode moves most under water). */
  relativeAmplitude: number;
  /** U used, m/s. */
  flowSpeedMPerS: number;
  /** D used (outer diameter including growth, or width across flow), m. */
  characteristicSizeM: number;
  reynoldsNumber: number;
  strouhal: StrouhalValue;
  /** f_s = St · U / D, Hz. */
  sheddingFrequencyHz: number;
  /** V_R = U / (f_n D). */
  reducedVelocity: number;
  /** K_S = 4π m_e ζ / (ρ D²). */
  stabilityParameter: number;
  effectiveMassKgPerM: number;
}

export interface ModeScreening {
  modeIndex: number;
  wetFrequencyHz: number;
  dryFrequencyHz?: number;
  /** null when the mode has no submerged length (then `notSubmergedReason` says why). */
  shedding: SheddingPoint | null;
  notSubmergedReason?: string;
  checks: CheckResult[];
  /** Worst verdict over this mode's checks, and the index in `checks` that drives it (-1 if no checks). */
  verdict: Verdict;
  driverCheckIndex: number;
}

/** Vortex shedding per zone: the band of shedding frequency over the zone's speed range. */
export interface ZoneShedding {
  zoneIndex: number;
  characteristicSizeM: number;
  speedMinMPerS: number;
  speedMaxMPerS: number;
  reynoldsMax: number;
  /** Strouhal number at the zone's highest speed. */
  strouhal: StrouhalValue;
  /** Low edge: St_low at the lowest speed; high edge: St_high at the highest speed, Hz. */
  sheddingFrequencyLowHz: number;
  sheddingFrequencyHighHz: number;
  /** Set when the zone is shielded from the open flow ("inside the caisson"); its speed is its own. */
  shieldedBy?: string;
}

export interface CaseDriver {
  modeIndex: number;
  checkIndex: number;
  kind: ExcitationKind;
  label: string;
  marginPercent: number | null;
}

export interface ScreeningResult {
  /**
   * How severe a shedding resonance of the driving mode would be (Scruton number, indicative A/D); null when
   * the verdict is not driven by a shedding check, or the driving mode has no shedding point.
   */
  severity: Severity | null;
  /** Worst verdict over all modes and excitations. */
  verdict: Verdict;
  /** The mode and excitation that give the case verdict; null when nothing was checked. */
  driver: CaseDriver | null;
  modes: ModeScreening[];
  zones: ZoneShedding[];
  /** The limits actually used (defaults merged with overrides), each with its source. */
  limits: ScreeningLimits;
  liquid: Required<LiquidProperties>;
  damping: { ratio: number; source: string };
  notes: string[];
}
