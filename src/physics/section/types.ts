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
