/**
 * `parseSectionInput(raw)`: reads a section input from outside (JSON from the CLI, a link, storage).
 * Checks kinds and shapes of every field (unknown fields are rejected, so a misspelt `diameter` is not
 * silently ignored), builds a clean `SectionInput`, then runs the geometric checks of validate.ts.
 * Throws TypeError / RangeError with a message naming the field, what was expected and what was got.
 */
import type { BodySpec, BoundarySpec, SectionInput, Vec2 } from './types';
import { MAX_BODIES, MAX_BOUNDARIES, MAX_POLYGON_POINTS, validateSectionInput } from './validate';
import { checkingKit, mustBe } from '../check/kit';

type Obj = Record<string, unknown>;

const show = (v: unknown): string => {
  if (v === undefined) return 'nothing';
  try {
    const s = JSON.stringify(v);
    return s === undefined ? String(v) : s.length > 60 ? `${s.slice(0, 57)}...` : s;
  } catch {
    return String(v);
  }
};

// The core's checking kit; every failure here is a value of the wrong kind (TypeError).
const KIT = checkingKit(show, (field, expected, gotText) => new TypeError(mustBe(field, expected, gotText)));

function obj(where: string, v: unknown): Obj {
  return KIT.record(where, v);
}

function onlyKeys(where: string, o: Obj, allowed: readonly string[]): void {
  for (const k of Object.keys(o)) {
    if (!allowed.includes(k)) throw new TypeError(`${where} has an unknown field "${k}" (expected ${allowed.join(', ')})`);
  }
}

function num(where: string, v: unknown): number {
  if (typeof v !== 'number') KIT.fail(where, 'a number', v);
  return v as number;
}

function optNum(where: string, v: unknown): number | undefined {
  return v === undefined ? undefined : num(where, v);
}

function pair(where: string, v: unknown): Vec2 {
  if (!Array.isArray(v) || v.length !== 2) throw new TypeError(`${where} must be a pair [x, y] of numbers, got ${show(v)}`);
  return [num(`${where}[0]`, v[0]), num(`${where}[1]`, v[1])];
}

function optPair(where: string, v: unknown): Vec2 | undefined {
  return v === undefined ? undefined : pair(where, v);
}

function points(where: string, v: unknown): Vec2[] {
  if (!Array.isArray(v)) throw new TypeError(`${where} must be an array of points [x, y], got ${show(v)}`);
  if (v.length > MAX_POLYGON_POINTS) throw new RangeError(`${where} must list from 3 to ${MAX_POLYGON_POINTS} points [x, y], got ${v.length} points`);
  return v.map((p, k) => pair(`${where}[${k}]`, p));
}

/** Copies only the defined optional fields (keeps the result free of `undefined` values). */
function withOptional<T extends Obj>(base: T, extra: Obj): T {
  for (const [k, v] of Object.entries(extra)) if (v !== undefined) (base as Obj)[k] = v;
  return base;
}

function parseBody(v: unknown, k: number): BodySpec {
  const w = `bodies[${k}]`;
  const o = obj(w, v);
  const c = optPair(`${w}.centerM`, o.centerM);
  switch (o.shape) {
    case 'circle':
      onlyKeys(w, o, ['shape', 'diameterM', 'centerM']);
      return withOptional({ shape: 'circle', diameterM: num(`${w}.diameterM`, o.diameterM) }, { centerM: c });
    case 'ellipse':
      onlyKeys(w, o, ['shape', 'widthM', 'heightM', 'centerM', 'angleDeg']);
      return withOptional(
        { shape: 'ellipse', widthM: num(`${w}.widthM`, o.widthM), heightM: num(`${w}.heightM`, o.heightM) },
        { centerM: c, angleDeg: optNum(`${w}.angleDeg`, o.angleDeg) },
      );
    case 'rectangle':
      onlyKeys(w, o, ['shape', 'widthM', 'heightM', 'cornerRadiusM', 'centerM', 'angleDeg']);
      return withOptional(
        { shape: 'rectangle', widthM: num(`${w}.widthM`, o.widthM), heightM: num(`${w}.heightM`, o.heightM) },
        { centerM: c, angleDeg: optNum(`${w}.angleDeg`, o.angleDeg), cornerRadiusM: optNum(`${w}.cornerRadiusM`, o.cornerRadiusM) },
      );
    case 'plate':
      onlyKeys(w, o, ['shape', 'widthM', 'thicknessM', 'centerM', 'angleDeg']);
      return withOptional(
        { shape: 'plate', widthM: num(`${w}.widthM`, o.widthM), thicknessM: num(`${w}.thicknessM`, o.thicknessM) },
        { centerM: c, angleDeg: optNum(`${w}.angleDeg`, o.angleDeg) },
      );
    case 'polygon':
      onlyKeys(w, o, ['shape', 'pointsM', 'centerM', 'angleDeg']);
      return withOptional({ shape: 'polygon', pointsM: points(`${w}.pointsM`, o.pointsM) }, { centerM: c, angleDeg: optNum(`${w}.angleDeg`, o.angleDeg) });
    default:
      throw new TypeError(`${w}.shape must be one of "circle", "rectangle", "ellipse", "plate", "polygon", got ${show(o.shape)}`);
  }
}

function parseBoundary(v: unknown, k: number): BoundarySpec {
  const w = `boundaries[${k}]`;
  const o = obj(w, v);
  switch (o.kind) {
    case 'wall':
    case 'free-surface':
      onlyKeys(w, o, ['kind', 'pointM', 'normal']);
      return { kind: o.kind, pointM: pair(`${w}.pointM`, o.pointM), normal: pair(`${w}.normal`, o.normal) };
    case 'enclosure':
      switch (o.shape) {
        case 'circle':
          onlyKeys(w, o, ['kind', 'shape', 'diameterM', 'centerM']);
          return withOptional({ kind: 'enclosure', shape: 'circle', diameterM: num(`${w}.diameterM`, o.diameterM) }, { centerM: optPair(`${w}.centerM`, o.centerM) });
        case 'rectangle':
          onlyKeys(w, o, ['kind', 'shape', 'widthM', 'heightM', 'centerM', 'angleDeg']);
          return withOptional(
            { kind: 'enclosure', shape: 'rectangle', widthM: num(`${w}.widthM`, o.widthM), heightM: num(`${w}.heightM`, o.heightM) },
            { centerM: optPair(`${w}.centerM`, o.centerM), angleDeg: optNum(`${w}.angleDeg`, o.angleDeg) },
          );
        case 'polygon':
          onlyKeys(w, o, ['kind', 'shape', 'pointsM']);
          return { kind: 'enclosure', shape: 'polygon', pointsM: points(`${w}.pointsM`, o.pointsM) };
        default:
          throw new TypeError(`${w}.shape must be one of "circle", "rectangle", "polygon" for an enclosure, got ${show(o.shape)}`);
      }
    default:
      throw new TypeError(`${w}.kind must be one of "wall", "free-surface", "enclosure", got ${show(o.kind)}`);
  }
}

/** Parses and validates a section input read from JSON (or any untyped source). */
export function parseSectionInput(raw: unknown): SectionInput {
  const o = obj('section input', raw);
  onlyKeys('section input', o, ['liquidDensityKgPerM3', 'bodies', 'boundaries', 'panelsPerBody']);
  if (!Array.isArray(o.bodies)) throw new TypeError(`bodies must be an array of bodies, got ${show(o.bodies)}`);
  if (o.boundaries !== undefined && !Array.isArray(o.boundaries)) throw new TypeError(`boundaries must be an array, got ${show(o.boundaries)}`);
  // Counts first, so a huge input is refused before any work on its entries.
  if (o.bodies.length > MAX_BODIES) throw new RangeError(`bodies may hold at most ${MAX_BODIES} bodies, got ${o.bodies.length}`);
  if (Array.isArray(o.boundaries) && o.boundaries.length > MAX_BOUNDARIES) throw new RangeError(`boundaries may hold at most ${MAX_BOUNDARIES} boundaries, got ${o.boundaries.length}`);
  const input: SectionInput = {
    liquidDensityKgPerM3: num('liquidDensityKgPerM3', o.liquidDensityKgPerM3),
    bodies: o.bodies.map(parseBody),
  };
  if (o.boundaries !== undefined) input.boundaries = (o.boundaries as unknown[]).map(parseBoundary);
  if (o.panelsPerBody !== undefined) input.panelsPerBody = num('panelsPerBody', o.panelsPerBody);
  validateSectionInput(input);
  return input;
}
