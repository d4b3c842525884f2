/** Plate panels: dry modes by Rayleigh–Ritz, wet modes with liquid on a wall panel or across a tank. */
export { parsePlateInput, MAX_PLATE_MODES } from './validate';
export { clearPlateMemos, solvePlate } from './solve';
export { sloshingFrequencyHz, STANDARD_GRAVITY } from './sloshing';
export { EDGE_CONDITIONS, edgeSpring, geometricCondition } from './types';
export type {
  EdgeCondition,
  EdgeSpring,
  EdgeSupport,
  LiquidSetting,
  PlateEdges,
  PlateErrorEstimate,
  PlateInput,
  PlateLiquid,
  PlateModeSet,
  PlateOutcome,
  PlateResolution,
  PlateResult,
  SloshingMode,
} from './types';
