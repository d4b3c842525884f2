/**
 * Plate panel: a rectangular plate held on its edges (a tank baffle welded to the walls and floor, a bulkhead
 * or tank-wall panel between stiffeners, a gate, a hatch cover), solved by the plate engine (src/physics/plate)
 * rather than as a beam strip.
 *
 * Geometry (as the plate engine takes it): width along the bottom edge, left to right; height up from the
 * bottom edge. Across a tank, the tank is as wide as the plate and the bottom edge sits on the floor.
 * Edge conditions in trade words: welded = clamped, bolted or seated = simply supported, free = no support
 * (common practice, no source).
 */
import { parsePlateInput, type PlateInput } from '../../physics/plate';
import type { PlateBuild } from '../common/types';

export type { PlateInput };

/** Checks the SI input once (RangeError naming the field, from the plate engine's own gate). */
export function validatePlateInput(raw: PlateInput): PlateInput {
  return parsePlateInput(raw);
}

function edgeWords(p: PlateInput): string {
  const e = p.edges;
  const say = (x: PlateInput['edges']['left']): string => (typeof x === 'string' ? x.replace('-', ' ') : 'on a rotational spring');
  return `Edges: left ${say(e.left)}, right ${say(e.right)}, bottom ${say(e.bottom)}, top ${say(e.top)}.`;
}

function liquidWords(p: PlateInput): string {
  const l = p.liquid;
  if (!l) return 'No liquid: dry modes only.';
  const faces = l.sides === 2 ? 'both faces' : 'one face';
  if (l.setting === 'wall-panel') {
    const reach = l.reachM === undefined ? 'unbounded' : `closed by a parallel rigid wall ${l.reachM} m away`;
    return `Panel of a large rigid wall, liquid on ${faces}, ${reach}.`;
  }
  const reach = l.reachM === undefined ? 'a very long tank' : `end walls ${l.reachM} m from the plate`;
  return `Across a rectangular tank as wide as the plate, liquid ${l.depthM} m deep on ${faces}, ${reach}.`;
}

/** The plate engine's input and the modelling notes; throws RangeError for invalid input. */
export function buildPlateModel(raw: PlateInput): PlateBuild {
  const plate = validatePlateInput(raw);
  return {
    kind: 'plate-panel',
    engine: 'plate',
    plate,
    notes: [
      'The panel is a thin plate of uniform thickness, D = E t³ / (12 (1 − ν²)) (classical plate theory).',
      edgeWords(plate),
      liquidWords(plate),
      'Welded edges are clamped; bolted or seated edges simply supported (common practice).',
      'Stiffeners, point supports and edge springs are not in this form yet.',
    ],
  };
}
