/**
 * A solver input shown in the Section editor: the form's text for each body and for the surroundings the
 * editor offers (a wall below, a wall beside, a free surface above, a circular or unrotated rectangular
 * enclosure). Lengths become millimetre text to 5 significant figures. The text is for showing and editing;
 * a view opened with an input solves that input itself until the form is edited, so the rounding never
 * changes an answer nobody asked to change.
 */
import type { BodySpec, BoundarySpec, SectionInput, Vec2 } from '../../physics/section';
import { bodyReference } from './geometry';
import { newBody, openWater, type BodyForm, type SectionForm, type SurroundForm } from './form';

/** Metres to the editor's millimetre text, to 5 significant figures. */
export function mmText(m: number): string {
  return String(Number((m * 1000).toPrecision(5)));
}

function angleText(deg: number | undefined): string {
  return String(Number((deg ?? 0).toPrecision(12)));
}

/** One body as the editor's fields; positions are the body's reference point (centre or centroid). */
export function bodyForm(b: BodySpec): BodyForm {
  const [x, y] = bodyReference(b);
  const at = { x: mmText(x), y: mmText(y) };
  switch (b.shape) {
    case 'circle':
      return newBody('circle', { diameter: mmText(b.diameterM), ...at });
    case 'ellipse':
      return newBody('ellipse', { width: mmText(b.widthM), height: mmText(b.heightM), angle: angleText(b.angleDeg), ...at });
    case 'plate':
      return newBody('plate', { width: mmText(b.widthM), thickness: mmText(b.thicknessM), angle: angleText(b.angleDeg), ...at });
    case 'rectangle':
      return newBody('rectangle', {
        width: mmText(b.widthM),
        height: mmText(b.heightM),
        cornerRadius: b.cornerRadiusM ? mmText(b.cornerRadiusM) : '',
        angle: angleText(b.angleDeg),
        ...at,
      });
    case 'polygon': {
      const points = b.pointsM.map(([px, py]: Vec2) => `${mmText(px - x)} ${mmText(py - y)}`).join(', ');
      return newBody('polygon', { points, angle: angleText(b.angleDeg), ...at });
    }
  }
}

/** The surroundings the editor can show for these boundaries; `leftOut` counts the rest. */
export function surroundForm(boundaries: readonly BoundarySpec[]): { surround: SurroundForm; leftOut: number } {
  const s = openWater();
  let leftOut = 0;
  for (const b of boundaries) {
    if (b.kind === 'enclosure' && b.shape === 'circle') {
      Object.assign(s, { enclosure: 'circle', enclosureDiameter: mmText(b.diameterM), enclosureX: mmText(b.centerM?.[0] ?? 0), enclosureY: mmText(b.centerM?.[1] ?? 0) });
    } else if (b.kind === 'enclosure' && b.shape === 'rectangle' && !b.angleDeg) {
      Object.assign(s, {
        enclosure: 'rectangle',
        enclosureWidth: mmText(b.widthM),
        enclosureHeight: mmText(b.heightM),
        enclosureX: mmText(b.centerM?.[0] ?? 0),
        enclosureY: mmText(b.centerM?.[1] ?? 0),
      });
    } else if (b.kind === 'wall' && b.normal[1] === 0 && b.normal[0] !== 0) {
      // A vertical wall x = p: to the left of the bodies when the liquid is on its +x side.
      Object.assign(s, { wallBeside: true, wallBesideSide: b.normal[0] > 0 ? 'left' : 'right', wallBesideDistance: mmText(Math.abs(b.pointM[0])) });
    } else if (b.kind === 'wall' && b.normal[0] === 0 && b.normal[1] > 0) {
      Object.assign(s, { wallBelow: true, wallBelowDistance: mmText(Math.abs(b.pointM[1])) });
    } else if (b.kind === 'free-surface' && b.normal[0] === 0 && b.normal[1] < 0) {
      Object.assign(s, { freeSurface: true, freeSurfaceDistance: mmText(Math.abs(b.pointM[1])) });
    } else {
      leftOut++;
    }
  }
  return { surround: s, leftOut };
}

/** The whole input as the editor's form, with the number of boundaries the editor cannot show. */
export function formFromInput(input: SectionInput): { form: SectionForm; leftOut: number } {
  const { surround, leftOut } = surroundForm(input.boundaries ?? []);
  return { form: { density: String(Number(input.liquidDensityKgPerM3.toPrecision(6))), bodies: input.bodies.map(bodyForm), surround }, leftOut };
}

/** A sentence on boundaries the editor cannot show (empty when there are none). */
export function leftOutNote(leftOut: number): string {
  if (leftOut === 0) return '';
  return leftOut === 1
    ? ' 1 boundary shape cannot be shown in the editor: it is solved as given until you edit the section, then left out.'
    : ` ${leftOut} boundary shapes cannot be shown in the editor: they are solved as given until you edit the section, then left out.`;
}
