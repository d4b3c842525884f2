/** Output of the frequency band over ranged inputs (`memberBand`). SI units; frequencies in Hz. */
import type { MemberFailureReason, MemberResult } from '../beam/result';
import type { Direction } from './monotone';
import type { ResolvedRange } from './ranges';

export type BandMethod = 'corners' | 'sampled';

/** One mode of one state (dry or wet). Band mode k is the k-th lowest frequency at every setting. */
export interface ModeBand {
  /** 1-based. */
  mode: number;
  likelyHz: number;
  lowHz: number;
  highHz: number;
  method: BandMethod;
  /** Why this method: which input broke monotonicity, or that none did. */
  reason: string;
  /** Values of the ranged inputs (range order) where the lowest and highest frequency were found. */
  lowAt: number[];
  highAt: number[];
}

export interface StateBand {
  likelyHz: number[];
  lowHz: number[];
  highHz: number[];
  modes: ModeBand[];
}

/** What one input does to the lowest wet frequency (dry when there is no liquid), others at their likely values. */
export interface SensitivityEntry {
  path: string;
  basis: 'wet' | 'dry';
  low: number;
  likely: number;
  high: number;
  /** Lowest frequency with this input at its low end, at its likely value, at its high end. */
  atLowHz: number;
  likelyHz: number;
  atHighHz: number;
  /** Largest minus smallest lowest frequency over the input's axis settings (= |atHigh − atLow| when monotone). */
  swingHz: number;
  direction: Direction;
}

/** Frequencies along one input's axis, for charts and for the verdict's switching search. */
export interface AxisResult {
  path: string;
  values: number[];
  /** [setting][mode], Hz. */
  dryHz: number[][];
  wetHz: number[][] | null;
  direction: { dry: Direction[]; wet: Direction[] | null };
}

export interface BandResult {
  ranges: ResolvedRange[];
  dry: StateBand;
  wet: StateBand | null;
  /** 'corners' when every mode used it, 'sampled' when every mode needed the search, else 'mixed'. */
  method: 'corners' | 'sampled' | 'mixed';
  /** The method in words, for output. */
  methodText: string;
  sensitivity: SensitivityEntry[];
  axes: AxisResult[];
  /** Member solves used (the likely answer itself not counted), and the budget. */
  solves: number;
  maxSolves: number;
  /** The sampled search stopped at the solve budget: its extremes may be slightly inside the true ones. */
  budgetExhausted: boolean;
  notes: string[];
  /** The answer at the likely inputs (adaptive mesh), as `solveMember` gives it. */
  likely: MemberResult;
}

export type BandOutcome = { ok: true; band: BandResult } | { ok: false; reason: MemberFailureReason | 'invalid-input'; message: string };
