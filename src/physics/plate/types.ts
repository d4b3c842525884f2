/**
 * Plate-panel model: a rectangular plate of width a (x, along the bottom edge, left to right) and height b
 * (y, up from the bottom edge), uniform thickness, isotropic material, each edge clamped, simply supported
 * or free; optionally in contact with liquid on one or both faces. SI throughout.
 */

export type EdgeCondition = 'clamped' | 'simply-supported' | 'free';
export const EDGE_CONDITIONS: readonly EdgeCondition[] = ['clamped', 'simply-supported', 'free'];

/** An edge held against deflection and restrained in rotation by a spring, N·m per radian per metre of edge. */
export interface EdgeSpring {
  rotationalSpringNmPerRadPerM: number;
}

/** Ideal edge, or a simply supported edge with a rotational spring (0: simply supported; very stiff: clamped). */
export type EdgeSupport = EdgeCondition | EdgeSpring;

export interface PlateEdges {
  left: EdgeSupport;
  right: EdgeSupport;
  bottom: EdgeSupport;
  top: EdgeSupport;
}

/** The ideal condition the trial functions enforce on an edge (a spring edge is held against deflection only). */
export function geometricCondition(e: EdgeSupport): EdgeCondition {
  return typeof e === 'string' ? e : 'simply-supported';
}

/** Rotational spring stiffness of an edge (N·m/rad per m), 0 for the ideal conditions. */
export function edgeSpring(e: EdgeSupport): number {
  return typeof e === 'string' ? 0 : e.rotationalSpringNmPerRadPerM;
}

export type LiquidSetting = 'wall-panel' | 'across-tank';

/**
 * The liquid on the plate's faces.
 * - `wall-panel`: the plate is a panel of an infinite rigid plane wall; liquid fills the half-space on `sides`
 *   faces, closed by a parallel rigid wall at `reachM` when given (otherwise unbounded). `depthM` not used.
 * - `across-tank`: the plate spans a rectangular tank crosswise (tank width = plate width, bottom edge on the
 *   floor); liquid `depthM` deep above the floor with a free surface; the tank's end walls are `reachM` from the
 *   plate on each wetted side (omitted = very long tank). With `sides` 1 the liquid must not reach over the top.
 */
export interface PlateLiquid {
  setting: LiquidSetting;
  densityKgPerM3: number;
  sides: 1 | 2;
  depthM?: number;
  reachM?: number;
}

export interface PlateInput {
  widthM: number;
  heightM: number;
  thicknessM: number;
  youngsModulusPa: number;
  poissonRatio: number;
  densityKgPerM3: number;
  edges: PlateEdges;
  liquid?: PlateLiquid;
  /** Modes to report (default 6). */
  modes?: number;
}

/** Numerical resolution; defaults are what the app and command line use. */
export interface PlateResolution {
  /** Ritz polynomial terms per direction (default 10): (terms)² unknowns. */
  ritzTerms?: number;
  /** Dry modes kept as coordinates of the wet problem (default 16, at least modes + 6, at most terms²). */
  coupledModes?: number;
  /** Wall panel: quadrature cells along the plate's longer side (default 24). */
  cellsLongSide?: number;
  /** Across tank: Fourier terms across the width and down the depth (default 16 and 144), gap functions (default 6; keep depth terms ≈ 24 × gap terms, a mode-matching convergence rule). */
  tankWidthTerms?: number;
  tankDepthTerms?: number;
  gapTerms?: number;
  /** Mode-shape grid points along the longer side (default 21). */
  shapePointsLongSide?: number;
}

/**
 * One set of modes. `shapes[i]` is mode i's deflection on a (nx × ny) grid of points including the edges,
 * layout `[iy·nx + ix]` (ix along the width from the left edge, iy up from the bottom edge), scaled so the
 * largest |w| is 1 and positive; where equal and opposite peaks tie (within a relative 1e-6), the first in
 * that layout is the positive one.
 */
export interface PlateModeSet {
  frequenciesHz: number[];
  shapes: Float64Array[];
}

export interface PlateErrorEstimate {
  /** What was coarsened to get the estimate. */
  basis: string;
  /** Per mode: |f(default) − f(coarse)| / f(default), as a fraction. */
  dryRelative: number[];
  wetRelative: number[];
}

export interface PlateResult {
  dry: PlateModeSet;
  wet: PlateModeSet | null;
  /** Mode-shape grid size. */
  grid: { nx: number; ny: number };
  /** Per wet mode: f_wet / f_dry of the dry mode it resembles most (largest modal participation). */
  wetToDryRatio: number[];
  method: string[];
  validity: string[];
  errorEstimate: PlateErrorEstimate;
  /** Across-tank only: lowest sloshing frequencies of the tank's liquid, excitations to keep clear of. */
  sloshing: SloshingMode[] | null;
  notes: string[];
}

export interface SloshingMode {
  frequencyHz: number;
  /** Which compartment and direction, in words. */
  description: string;
}

export type PlateOutcome =
  | { ok: true; result: PlateResult }
  | { ok: false; reason: 'basis-ill-conditioned' | 'not-converged' | 'added-mass-not-positive'; message: string };
