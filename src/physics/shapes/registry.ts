/**
 * The section-shape registry: one line per shape. `MemberSection` (the beam model's section) is the union
 * of the shapes' section objects; everything that depends on the shape asks `shapeOf(section)`.
 */
import { H_SECTION, type HSection } from './h-section';
import { PLATE_STRIP, type PlateStripSection } from './plate-strip';
import { ROD, type RodSection } from './rod';
import { TUBE, type TubeSection } from './tube';
import type { ShapeDescription } from './types';

/** The cross-section of a beam member segment. */
export type MemberSection = TubeSection | RodSection | PlateStripSection | HSection;
export type ShapeId = MemberSection['shape'];

/** Every shape's description, by id. */
export const SHAPES: { readonly [K in ShapeId]: ShapeDescription<Extract<MemberSection, { shape: K }>> } = {
  tube: TUBE,
  rod: ROD,
  [PLATE_STRIP.id]: PLATE_STRIP,
  [H_SECTION.id]: H_SECTION,
};

/** The shape ids, in registry order (for messages: 'one of "tube", "rod", …'). */
export const SHAPE_IDS = Object.keys(SHAPES) as ShapeId[];

/** The description of a section's shape. */
export function shapeOf(section: MemberSection): ShapeDescription<MemberSection> {
  return SHAPES[section.shape] as unknown as ShapeDescription<MemberSection>;
}

/** The description of a shape id from outside, or undefined when it names no shape. */
export function findShape(id: unknown): ShapeDescription<MemberSection> | undefined {
  return typeof id === 'string' && Object.prototype.hasOwnProperty.call(SHAPES, id) ? (SHAPES[id as ShapeId] as unknown as ShapeDescription<MemberSection>) : undefined;
}
