/**
 * Public input and output of the 2D added-mass section solver.
 * All lengths in metres, angles in degrees (counter-clockwise), density kg/m³.
 * The same shapes are read by `wetmode section FILE` and by the app.
 */

/** A point or direction in the section plane, metres: [x, y]. */
export type Vec2 = readonly [number, number];

export type BodySpec =
  | { shape: 'circle'; diameterM: number; centerM?: Vec2 }
  | { shape: 'rectangle'; widthM: number; heightM: number; cornerRadiusM?: number; centerM?: Vec2; angleDeg?: number }
  | { shape: 'ellipse'; widthM: number; heightM: number; centerM?: Vec2; angleDeg?: number }
  /** Thin plate: `widthM` along x, `thicknessM` along y, before rotation. */
  | { shape: 'plate'; widthM: number; thicknessM: number; centerM?: Vec2; angleDeg?: number }
  /** Closed polygon, vertices in order (either winding). Reference point: area centroid unless centerM is given. */
  | { shape: 'polygon'; pointsM: Vec2[]; centerM?: Vec2; angleDeg?: number };

export type BoundarySpec =
  /** Rigid straight wall: the infinite line through pointM; `normal` points into the liquid. */
  | { kind: 'wall'; pointM: Vec2; normal: Vec2 }
  /** Free surface in the high-frequency limit (potential = 0); `normal` points into the liquid. */
  | { kind: 'free-surface'; pointM: Vec2; normal: Vec2 }
  /** Closed rigid container around the bodies. */
  | { kind: 'enclosure'; shape: 'circle'; diameterM: number; centerM?: Vec2 }
  | { kind: 'enclosure'; shape: 'rectangle'; widthM: number; heightM: number; centerM?: Vec2; angleDeg?: number }
  | { kind: 'enclosure'; shape: 'polygon'; pointsM: Vec2[] };

export interface SectionInput {
  liquidDensityKgPerM3: number;
  bodies: BodySpec[];
  boundaries?: BoundarySpec[];
  /** Panels per body at the fine resolution; the solver picks a sensible default. */
  panelsPerBody?: number;
}

// ---------------------------------------------------------------------------
// Solver options and results (added by the section solver; input types above are unchanged).
// ---------------------------------------------------------------------------

export interface SolveOptions {
  /**
   * Nominal panels per body at the finest resolution (overrides `SectionInput.panelsPerBody`), 16–1024; thin
   * bodies get up to twice as many. Fixed when given; absent, the solver starts at `startPanelsPerBody` and
   * doubles up to `maxPanelsPerBody` while the estimate misses `targetRelativeError` (solve.ts).
   */
  panelsPerBody?: number;
  /** Starting panels per body of the default (adaptive) resolution. Default 64 (DEFAULT_PANELS_PER_BODY). */
  startPanelsPerBody?: number;
  /** Most panels per body the default resolution doubles up to. Default 128 (DEFAULT_MAX_PANELS_PER_BODY). */
  maxPanelsPerBody?: number;
  /** Largest estimated relative error of the target motions' diagonal terms that stops the doubling. Default 1e-3. */
  targetRelativeError?: number;
  /** Motions whose diagonal terms the target applies to (every body). Default ['x', 'y']. */
  targetMotions?: SectionDof[];
  /**
   * Report Richardson-extrapolated values where the three levels are in the asymptotic range (default true);
   * false reports the finest level's values (studies of the discretisation itself).
   */
  extrapolate?: boolean;
  /** Run the kinetic-energy cross-check on a field grid (slower: ~0.1 s for one body). Default false. */
  energyCheck?: boolean;
  /** Cells across the liquid region for the energy cross-check. Default 96. */
  energyGridCells?: number;
  /** Skip the coarser (N/2, N/4) solves and the error estimate. Default false. */
  skipErrorEstimate?: boolean;
}

/** Why a solve could not produce numbers; the message says it in words. */
export type SectionFailure = 'singular-system' | 'not-positive-semidefinite' | 'non-finite-result';

/** Degree of freedom of a body, in the order used by the added-mass matrix. */
export type SectionDof = 'x' | 'y' | 'rotation';

export interface BodyResult {
  /** Index of the body in the input. */
  index: number;
  /** Reference point for rotation, m (centerM, or the area centroid of a polygon). */
  referencePointM: [number, number];
  /** Wetted cross-section area, m² (the part on the liquid side of straight boundaries). */
  wettedAreaM2: number;
  /** Liquid density × wetted area, kg/m. */
  displacedMassKgPerM: number;
  /** Diagonal added mass per metre: x, y (kg/m), rotation (kg·m²/m). */
  addedMassX: number;
  addedMassY: number;
  addedInertiaRotation: number;
  /** Ca for x motion: addedMassX / (ρ π aX²), aX = half the wetted extent along y (across the motion). */
  caX: number;
  /** Ca for y motion: addedMassY / (ρ π aY²), aY = half the wetted extent along x. */
  caY: number;
  /** The half-extents used for the reference areas, m. */
  referenceHalfWidthXM: number;
  referenceHalfWidthYM: number;
  /** Added mass over displaced liquid mass for x and y motion. */
  addedToDisplacedX: number;
  addedToDisplacedY: number;
  /** Motions the body cannot make without opening a gap at a wall it rests on (net flux through the contact). */
  blockedDofs: SectionDof[];
  /** Panels on this body's wetted outline at the fine resolution. */
  panels: number;
}

/** Discretisation error estimate of one diagonal term from two resolutions. */
export interface ErrorEstimate {
  /** Row/column in the added-mass matrix. */
  dof: number;
  body: number;
  motion: SectionDof;
  fine: number;
  coarse: number;
  /** Richardson-extrapolated value using `order`. */
  extrapolated: number;
  /** Order used: observed from the N/4, N/2 and N values, bounded to [1, 2] (1 if not monotone). */
  order: number;
  /**
   * Estimated absolute error of the reported (fine) value, which also bounds the extrapolated value's:
   * |fine − extrapolated|, widened to the change from the coarsest level when the observed order is below 1.5.
   */
  absoluteError: number;
  /** absoluteError / |fine|. */
  relativeError: number;
}

/** Kinetic-energy cross-check of one diagonal term: m_jj = ρ ∫ |∇φ_j|² dA over the liquid (unit velocity). */
export interface EnergyCheck {
  dof: number;
  body: number;
  motion: SectionDof;
  /** Value from the boundary integral (the reported added mass). */
  boundaryIntegral: number;
  /** ρ ∫|∇φ|² over the liquid on the field grid, including the far-field tail. */
  fieldIntegral: number;
  /** Part of fieldIntegral from the far-field tail beyond the grid (0 in a closed region). */
  tail: number;
  /** (fieldIntegral − boundaryIntegral) / boundaryIntegral. */
  relativeDifference: number;
}

export interface SectionResult {
  /** 3K×3K added-mass matrix per metre, symmetrised; rows/cols body by body [x, y, rotation]. */
  addedMass: number[][];
  /** max |m_ij − m_ji| / max |m_ii| before symmetrising. */
  asymmetry: number;
  bodies: BodyResult[];
  errorEstimates: ErrorEstimate[];
  energyChecks: EnergyCheck[];
  /** Panel counts at the finest (N) and the N/2 resolution (all boundaries). */
  panelsFine: number;
  panelsCoarse: number;
  /** Nominal panels per body at the finest level actually solved (after any default doubling). */
  panelsPerBody?: number;
  /** How the straight boundaries were treated and other method notes. */
  notes: string[];
}

export type SectionOutcome =
  | { ok: true; result: SectionResult }
  | { ok: false; reason: SectionFailure; message: string };
