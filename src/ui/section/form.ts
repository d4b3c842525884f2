/**
 * The Section editor's form, as typed: every value is the text in its field, so a half-typed number is
 * kept as it is and read (with its unit) by read-form.ts. Lengths default to mm, angles to degrees,
 * the density to kg/m³. Positions are in the section's own axes: x to the right, y up, origin (0, 0).
 */

export type BodyShape = 'circle' | 'rectangle' | 'ellipse' | 'plate' | 'polygon';

export const BODY_SHAPES: readonly { value: BodyShape; label: string }[] = [
  { value: 'circle', label: 'Circle' },
  { value: 'rectangle', label: 'Rectangle' },
  { value: 'ellipse', label: 'Ellipse' },
  { value: 'plate', label: 'Flat plate' },
  { value: 'polygon', label: 'Polygon' },
];

export interface BodyForm {
  /** Stable key for the list (not shown). */
  id: string;
  shape: BodyShape;
  /** Circle. */
  diameter: string;
  /** Rectangle, ellipse, plate: across x before rotation. */
  width: string;
  /** Rectangle, ellipse: across y before rotation. */
  height: string;
  /** Plate: across y before rotation. */
  thickness: string;
  /** Rectangle; empty = sharp corners. */
  cornerRadius: string;
  /** Polygon: "x1 y1, x2 y2, …" in mm, relative to the centre. */
  points: string;
  x: string;
  y: string;
  /** Counter-clockwise, degrees; empty = 0. */
  angle: string;
}

export type EnclosureShape = 'none' | 'circle' | 'rectangle';
export type WallSide = 'left' | 'right';

export interface SurroundForm {
  wallBelow: boolean;
  /** Distance of the wall below the origin (its level is y = −distance). */
  wallBelowDistance: string;
  wallBeside: boolean;
  wallBesideSide: WallSide;
  /** Distance of the wall from the origin, to the chosen side. */
  wallBesideDistance: string;
  freeSurface: boolean;
  /** Distance of the free surface above the origin (its level is y = +distance). */
  freeSurfaceDistance: string;
  enclosure: EnclosureShape;
  enclosureDiameter: string;
  enclosureWidth: string;
  enclosureHeight: string;
  /** Offset of the enclosure's centre from the origin. */
  enclosureX: string;
  enclosureY: string;
}

export interface SectionForm {
  density: string;
  bodies: BodyForm[];
  surround: SurroundForm;
}

let nextId = 1;

/** A new body of the given shape with sensible sizes (a 500 mm member at the origin). */
export function newBody(shape: BodyShape, values: Partial<Omit<BodyForm, 'id' | 'shape'>> = {}): BodyForm {
  return {
    id: `b${nextId++}`,
    shape,
    diameter: '500',
    width: shape === 'plate' ? '1000' : '500',
    height: shape === 'ellipse' ? '250' : '500',
    thickness: '10',
    cornerRadius: '',
    points: '0 300, -200 0, 0 -300, 200 0',
    x: '0',
    y: '0',
    angle: '0',
    ...values,
  };
}

/** Open water: no walls, no free surface, no enclosure; the fields keep usable values for when one is switched on. */
export function openWater(values: Partial<SurroundForm> = {}): SurroundForm {
  return {
    wallBelow: false,
    wallBelowDistance: '1000',
    wallBeside: false,
    wallBesideSide: 'right',
    wallBesideDistance: '1000',
    freeSurface: false,
    freeSurfaceDistance: '1000',
    enclosure: 'none',
    enclosureDiameter: '2000',
    enclosureWidth: '2000',
    enclosureHeight: '2000',
    enclosureX: '0',
    enclosureY: '0',
    ...values,
  };
}

/** Key of a field for its message: 'density', 'body.<id>.<field>', 'body.<id>' (the body as a whole), 'surround.<field>'. */
export type FieldKey = string;
export type FieldErrors = Record<FieldKey, string>;

export const bodyKey = (b: BodyForm, field?: keyof BodyForm): FieldKey => (field ? `body.${b.id}.${field}` : `body.${b.id}`);
export const surroundKey = (field: keyof SurroundForm | 'all'): FieldKey => `surround.${field}`;

export function patchBody(form: SectionForm, id: string, patch: Partial<Omit<BodyForm, 'id'>>): SectionForm {
  return { ...form, bodies: form.bodies.map((b) => (b.id === id ? { ...b, ...patch } : b)) };
}

export function removeBody(form: SectionForm, id: string): SectionForm {
  return { ...form, bodies: form.bodies.filter((b) => b.id !== id) };
}

/** Adds a 500 mm circle to the right of the others (clear of them, as far as their typed sizes tell). */
export function addBody(form: SectionForm): SectionForm {
  let right = -Infinity;
  for (const b of form.bodies) {
    const size = parseFloat(b.shape === 'circle' ? b.diameter : b.width);
    const edge = (parseFloat(b.x) || 0) + (Number.isFinite(size) ? size / 2 : 0);
    right = Math.max(right, edge);
  }
  const x = Number.isFinite(right) ? Math.round(right + 500) : 0;
  return { ...form, bodies: [...form.bodies, newBody('circle', { x: String(x) })] };
}

export function patchSurround(form: SectionForm, patch: Partial<SurroundForm>): SectionForm {
  return { ...form, surround: { ...form.surround, ...patch } };
}
