/**
 * The Section editor's words for the surroundings, by how the section is seen. Along a horizontal member
 * (a pipe, a brace, a stem across a pipe) the section is an elevation: y is up, so the straight boundaries are a
 * wall or the seabed below and the free surface above. Across a vertical member (a pile, a riser, a baffle
 * standing in a tank) the section is a plan view seen from above: y is horizontal, across the sway, so the same
 * lines are walls — a quay wall, a tank wall — and other bodies are neighbouring piles. The solver input is
 * the same either way; only the words change.
 */

export type SectionView = 'elevation' | 'plan';

export interface SurroundWords {
  /** One line under the Surroundings heading on how the section is seen. */
  seen: string;
  /** The axes in a few words, for the bodies' positions. */
  axes: string;
  wallBelow: string;
  wallBelowDistance: string;
  /** The wall y = −d in messages ("the wall below"). */
  wallBelowName: string;
  wallBeside: string;
  wallBesideDistance: string;
  freeSurface: string;
  freeSurfaceDistance: string;
  addBody: string;
}

export const SURROUND_WORDS: Record<SectionView, SurroundWords> = {
  elevation: {
    seen: 'Seen along a horizontal member: x across it, y up.',
    axes: 'x to the right, y up',
    wallBelow: 'Wall or seabed below',
    wallBelowDistance: 'Distance below the origin',
    wallBelowName: 'the wall below',
    wallBeside: 'Wall beside',
    wallBesideDistance: 'Distance from the origin',
    freeSurface: 'Free surface above',
    freeSurfaceDistance: 'Distance above the origin',
    addBody: 'Add a body',
  },
  plan: {
    seen: 'Plan view of a vertical member, seen from above: x is the direction of sway, y across it.',
    axes: 'x in the direction of sway, y across it (seen from above)',
    wallBelow: 'Quay wall or tank wall alongside (−y side, parallel to the sway)',
    wallBelowDistance: 'Distance from the origin (−y)',
    wallBelowName: 'the wall alongside',
    wallBeside: 'Quay wall or tank wall ahead (across the sway)',
    wallBesideDistance: 'Distance from the origin',
    freeSurface: 'Pressure-release line (φ = 0) on the +y side',
    freeSurfaceDistance: 'Distance from the origin (+y)',
    addBody: 'Add a neighbour pile or body',
  },
};

/** Choices offered for how the section is seen. */
export const SECTION_VIEWS: readonly { value: SectionView; label: string }[] = [
  { value: 'elevation', label: 'Along a horizontal member (elevation)' },
  { value: 'plan', label: 'Across a vertical member (plan view)' },
];
