/**
 * Public input of the resonance screening (`screenResonance`).
 * SI units throughout; every field carries its unit in its name. z runs along the member axis
 * from 0 (root / bottom / pipe wall) to the member's length, as in `beam/model.ts`.
 * Defaults, and the source of each default, are in `defaults.ts`.
 */

/** One natural mode of the member, as produced by the beam engine (or typed in). */
export interface ScreeningMode {
  /** Natural frequency with added mass on the submerged length, Hz. Screened against every excitation. */
  wetFrequencyHz: number;
  /** Natural frequency in air, Hz. Carried to the result for the chart; screened only when asked (see `machineryAgainst`). */
  dryFrequencyHz?: number;
  /** Node positions along the member axis, m, strictly increasing. */
  zM: ArrayLike<number>;
  /** Lateral mode-shape displacement at each node of `zM` (any scale and sign; only |shape| ratios are used). */
  displacement: ArrayLike<number>;
  /**
   * Mode-weighted effective mass per metre for the stability parameter, kg/m:
   * m_e = ∫ m(z) φ(z)² dz / ∫ φ(z)² dz over the member, with m = structure + contents + added mass
   * (DNV-RP-C205 §9). Overrides the case value `effectiveMassKgPerM` for this mode.
   */
  effectiveMassKgPerM?: number;
}

/**
 * Cross-section seen by the flow. `D` below is the size that enters Re, St, f_s, V_R and K_S.
 * - circle: D = outer diameter including coating and marine growth.
 * - rectangle: D = width across the flow; `depthAlongFlowM` is its length in the flow direction.
 *   A plate normal to the flow is a rectangle with depthAlongFlowM = its thickness;
 *   a plate edge-on to the flow is a rectangle with widthAcrossFlowM = its thickness.
 */
export type ZoneSection =
  | { kind: 'circle'; outerDiameterM: number }
  | { kind: 'rectangle'; widthAcrossFlowM: number; depthAlongFlowM: number };

/** A submerged stretch of the member, [fromM, toM] along z, with one section. Zones must not overlap. */
export interface SubmergedZone {
  fromM: number;
  toM: number;
  section: ZoneSection;
  /**
   * Flow speed over this zone, m/s, in place of the case's flow (a shielded stretch: a riser inside a caisson,
   * a stem inside its nozzle; 0 = still water). Absent = the case's flow profile.
   */
  flowSpeedMPerS?: number;
  /** What shields it, in plain words ("inside the caisson"); given with `flowSpeedMPerS`. */
  shieldedBy?: string;
}

/** One point of a flow-speed profile: speed magnitude at elevation zM (member axis). */
export interface FlowPoint {
  zM: number;
  speedMPerS: number;
}

/** Liquid properties; `source` says where the numbers come from. */
export interface LiquidProperties {
  densityKgPerM3: number;
  kinematicViscosityM2PerS: number;
  source?: string;
}

/** Wave band: periods in seconds; forcing frequencies 1/periodMaxS … 1/periodMinS. */
export interface WaveBand {
  periodMinS: number;
  periodMaxS: number;
  label?: string;
}

/** A rotating machine near the member (pump, fan, agitator, propeller). */
export interface Machine {
  label?: string;
  /** Shaft speed, Hz (revolutions per second; rpm / 60); for a variable-speed drive, the lowest running speed. */
  shaftSpeedHz: number;
  /** Variable-speed drive: highest running speed, Hz (each order then forces a band, not a line). */
  shaftSpeedMaxHz?: number;
  /** Blades or vanes; needed for blade-pass orders. */
  bladeCount?: number;
  /** Multiples of shaft frequency to check; default [1, 2]. */
  shaftOrders?: number[];
  /** Multiples of blade-pass frequency (bladeCount × shaft) to check; default [1] when bladeCount is given. */
  bladePassOrders?: number[];
}

/** A closed range of reduced velocity V_R = U / (f_n D). */
export interface ReducedVelocityRange {
  min: number;
  max: number;
  source: string;
}

/** A single limit value with its source. */
export interface SourcedLimit {
  value: number;
  source: string;
}

/** Screening limits, all editable; each carries the source shown beside it. */
export interface ScreeningLimits {
  /** In-line VIV range of V_R (DNV-RP-C205 §9: 1.0 ≤ V_R ≤ 4.5). */
  inLineReducedVelocity: ReducedVelocityRange;
  /** In-line VIV only when K_S ≤ this (DNV-RP-C205 §9: 1.8). */
  inLineStabilityMax: SourcedLimit;
  /** Cross-flow VIV range of V_R (DNV-RP-C205 §9: 3.0 ≤ V_R ≤ 16). */
  crossFlowReducedVelocity: ReducedVelocityRange;
  /** Stem screen: pass when f_s / f_n ≤ this (0.8, common practice). */
  stemFrequencyRatioMax: SourcedLimit;
  /** Frequency separation margin as a fraction (0.2 = ±20 %, common practice). */
  separationMargin: SourcedLimit;
}

/** Overrides: give any limit; a missing `source` becomes "entered by user". */
export type LimitOverrides = {
  [K in keyof ScreeningLimits]?: Omit<ScreeningLimits[K], 'source'> & { source?: string };
};

/** Input of `screenResonance`. */
export interface ScreeningInput {
  modes: ScreeningMode[];
  /** Submerged stretches of the member; empty = nothing submerged (no vortex shedding). */
  zones: SubmergedZone[];
  /**
   * Current or flow speed, m/s: one value for the whole member, or a profile by elevation
   * (at least surface, mid-depth and near bed for piles and risers), points in strictly increasing zM,
   * interpolated linearly in z and held constant beyond the first and last point.
   */
  flowSpeedMPerS: number | FlowPoint[];
  /** Default: seawater (`SEAWATER` in defaults.ts). */
  liquid?: LiquidProperties;
  /** Effective mass per metre for K_S, kg/m (structure + contents + added). See ScreeningMode.effectiveMassKgPerM. */
  effectiveMassKgPerM: number;
  /** Structural damping ratio ζ (fraction of critical). Default in defaults.ts with its source. */
  dampingRatio?: number;
  /** Apply the sensor-stem screen f_s / f_n ≤ 0.8. Default false. */
  stemFrequencyRatioScreen?: boolean;
  /**
   * Override the Strouhal number for every zone (e.g. a measured or tabulated value for an odd section).
   * Default: from `strouhalNumber` by section and Reynolds number.
   */
  strouhal?: { value: number; source: string };
  waves?: WaveBand;
  machinery?: Machine[];
  /**
   * Which mode frequencies machinery is screened against. 'wet-and-dry' adds a check on the dry frequency
   * of modes that have one (a tank or sump drained while the pump still runs). Default 'wet'.
   */
  machineryAgainst?: 'wet' | 'wet-and-dry';
  limits?: LimitOverrides;
}
