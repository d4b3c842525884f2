/**
 * What every member builder returns: the member model for the beam engine plus what a schematic and the
 * results screen need to draw and explain it. All lengths in metres; every z is measured along the member
 * axis from z = 0 (stated per kind in `origin`), positive towards the member's top or tip.
 */
import type { MemberModel } from '../../physics/beam/model';
import type { PlateInput } from '../../physics/plate';
import type { KindId } from '../registry-pure';

/** The member kind of a build (the ids are listed once, in ../registry-pure.ts). */
export type MemberKind = KindId;

/** Machine-readable name of a level along the member, so the schematic can pick a symbol for it. */
export type LandmarkId =
  | 'fixity' // effective fixity point of a pile (clamped)
  | 'toe' // pile toe (soil-spring model)
  | 'mudline'
  | 'still-water' // still water level of the reference (e.g. mean sea level), without the tide offset
  | 'water-surface' // the surface used for the liquid range (still water + offset)
  | 'liquid-bottom' // lower end of the liquid range when it does not start at the member's bottom
  | 'top' // top end of a pile or riser, upper end of a baffle span
  | 'bottom' // bottom end of a riser, lower end of a baffle span
  | 'guide' // a pinned lateral support along a riser
  | 'tank-floor'
  | 'liquid-level'
  | 'root' // support face of a sensor stem (pipe or vessel wall)
  | 'tip' // free end of a sensor stem
  | 'mass'; // a lumped mass

/** A level along the member. It may lie outside [0, lengthM] (a tank floor below a baffle, a water surface above a pile top). */
export interface Landmark {
  id: LandmarkId;
  /** Plain words without numbers (the UI formats numbers in the user's units), e.g. "Mudline", "Guide 2". */
  label: string;
  zM: number;
}

export type BandId = 'embedded' | 'submerged' | 'marine-growth' | 'coating' | 'flooded' | 'contents' | 'confined';

/** A stretch of the member with something to show (clipped to [0, lengthM]; empty stretches are left out). */
export interface Band {
  id: BandId;
  label: string;
  fromM: number;
  toM: number;
}

/** What confines the liquid around the member's section (drawn in the section view). */
export type Confinement =
  /** A plate strip parallel to a rigid wall; `gapM` is the clear gap from the plate face to the wall. */
  | { kind: 'parallel-wall'; gapM: number }
  /**
   * A rigid tube around the member (riser caisson, sleeve around a stem). The member's centre sits `offsetM`
   * from the tube's centre, at `offsetAngleDeg` from the direction of motion (0 = offset along the motion).
   */
  | { kind: 'surrounding-tube'; innerDiameterM: number; offsetM: number; offsetAngleDeg: number };

export interface MemberBuild {
  kind: MemberKind;
  /** The engine that solves this build (src/kinds/kind-module.ts); absent = the beam engine. */
  engine?: 'beam';
  /** The beam engine's input (src/physics/beam/model.ts). */
  model: MemberModel;
  /** Where z = 0 is, in words, e.g. "effective fixity point below the mudline". */
  origin: string;
  /** Levels for the schematic, ascending in z. */
  landmarks: Landmark[];
  /** Stretches for the schematic, in the order: embedded, submerged, growth/coating, contents, confined. */
  bands: Band[];
  confinement?: Confinement;
  /** Modelling choices in plain words, for the assumptions panel. */
  notes: string[];
}

/** What a plate-panel kind builds: the plate engine's input (src/physics/plate) and its modelling notes. */
export interface PlateBuild {
  kind: MemberKind;
  engine: 'plate';
  plate: PlateInput;
  /** Modelling choices in plain words, for the assumptions panel. */
  notes: string[];
}

/** Any kind's build; `engine` tells them apart. */
export type KindBuild = MemberBuild | PlateBuild;
