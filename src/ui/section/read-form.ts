/**
 * Reads the Section editor's form into a solver input, with a message beside each field that does not read
 * and, once every field reads, the solver's own geometric checks (overlaps, a body outside its enclosure,
 * a self-intersecting outline) in the editor's words. Nothing is solved from a form with any message.
 *
 * Conventions of the form (see form.ts): lengths in mm unless a unit is typed (`24 in`, `0.6 m`); angles in
 * degrees; polygon points relative to the body's centre, which is also its rotation reference point; the
 * straight boundaries are horizontal or vertical lines at a distance from the origin.
 */
import { validateSectionInput, type BodySpec, type BoundarySpec, type SectionInput, type Vec2 } from '../../physics/section';
import { parseQuantity, type Dimension } from '../../units';
import { bodyKey, surroundKey, type BodyForm, type FieldErrors, type FieldKey, type SectionForm, type SurroundForm } from './form';
import { humanise, locate } from './messages';
import { SURROUND_WORDS, type SurroundWords } from './view-words';

/** Most bodies the editor offers (the dense solve grows as the cube of the panel count). */
export const MAX_EDITOR_BODIES = 8;

export interface FormReading {
  /** The solver input, or null while any field has a message. */
  input: SectionInput | null;
  errors: FieldErrors;
  /** Names of the input's boundaries in order ("the wall below"), for messages and labels. */
  boundaryNames: string[];
}

type Reader = {
  /** A value in SI, or NaN after recording a message under `key`. */
  q(key: FieldKey, text: string, dimension: Dimension, unit: string, rule?: 'positive' | 'any', emptyMeans?: number): number;
  errors: FieldErrors;
};

function reader(): Reader {
  const errors: FieldErrors = {};
  return {
    errors,
    q(key, text, dimension, unit, rule = 'any', emptyMeans) {
      if (text.trim() === '' && emptyMeans !== undefined) return emptyMeans;
      const r = parseQuantity(text, { dimension, unit });
      if (!r.ok) {
        errors[key] = r.message;
        return NaN;
      }
      if (rule === 'positive' && !(r.valueSI > 0)) {
        errors[key] = `must be more than 0, got ${text.trim()}`;
        return NaN;
      }
      return r.valueSI;
    },
  };
}

const RAD_TO_DEG = 180 / Math.PI;

/** Reads "x1 y1, x2 y2, …" (mm unless a unit is attached: `0.3m`); semicolons may separate points instead. */
export function readPoints(text: string): { ok: true; pointsM: Vec2[] } | { ok: false; message: string } {
  const sep = text.includes(';') ? ';' : ',';
  const items = text.split(sep).map((s) => s.trim()).filter((s) => s !== '');
  const pts: Vec2[] = [];
  for (let i = 0; i < items.length; i++) {
    const parts = items[i].split(/\s+/);
    if (parts.length !== 2) return { ok: false, message: `point ${i + 1} ("${items[i]}"): write two numbers in mm, x then y, such as 120 -40` };
    const xy = parts.map((p) => parseQuantity(p, { dimension: 'length', unit: 'mm' }));
    for (const r of xy) if (!r.ok) return { ok: false, message: `point ${i + 1} ("${items[i]}"): ${r.message}` };
    pts.push([(xy[0] as { valueSI: number }).valueSI, (xy[1] as { valueSI: number }).valueSI]);
  }
  if (pts.length < 3) return { ok: false, message: `list at least 3 points "x y" separated by commas, got ${pts.length}` };
  return { ok: true, pointsM: pts };
}

function readBody(b: BodyForm, r: Reader): BodySpec | null {
  const k = (f: keyof BodyForm) => bodyKey(b, f);
  const len = (f: keyof BodyForm, rule: 'positive' | 'any' = 'positive', empty?: number) => r.q(k(f), b[f] as string, 'length', 'mm', rule, empty);
  const x = len('x', 'any', 0);
  const y = len('y', 'any', 0);
  const centerM: Vec2 = [x, y];
  // Back to degrees; 12 figures undo the round trip through radians (30 stays 30, not 29.999999999999996).
  const angleDeg = Number((r.q(k('angle'), b.angle, 'angle', 'deg', 'any', 0) * RAD_TO_DEG).toPrecision(12));
  let spec: BodySpec;
  switch (b.shape) {
    case 'circle':
      spec = { shape: 'circle', diameterM: len('diameter'), centerM };
      break;
    case 'ellipse':
      spec = { shape: 'ellipse', widthM: len('width'), heightM: len('height'), centerM, angleDeg };
      break;
    case 'plate':
      spec = { shape: 'plate', widthM: len('width'), thicknessM: len('thickness'), centerM, angleDeg };
      break;
    case 'rectangle': {
      const widthM = len('width'), heightM = len('height');
      const cornerRadiusM = len('cornerRadius', 'any', 0);
      const half = Math.min(widthM, heightM) / 2;
      if (cornerRadiusM < 0) r.errors[k('cornerRadius')] = `must be 0 or more, got ${b.cornerRadius.trim()}`;
      else if (cornerRadiusM > half) r.errors[k('cornerRadius')] = `must be at most half the smaller side (${Number((half * 1000).toPrecision(4))} mm)`;
      spec = { shape: 'rectangle', widthM, heightM, centerM, angleDeg };
      if (cornerRadiusM > 0) spec.cornerRadiusM = cornerRadiusM;
      break;
    }
    case 'polygon': {
      const p = readPoints(b.points);
      if (!p.ok) {
        r.errors[k('points')] = p.message;
        return null;
      }
      spec = { shape: 'polygon', pointsM: p.pointsM.map(([px, py]): Vec2 => [px + x, py + y]), centerM, angleDeg };
      break;
    }
  }
  return spec;
}

interface Boundaries {
  list: BoundarySpec[];
  names: string[];
  keys: FieldKey[];
}

function readSurround(s: SurroundForm, r: Reader, words: SurroundWords): Boundaries {
  const out: Boundaries = { list: [], names: [], keys: [] };
  const add = (b: BoundarySpec, name: string, key: FieldKey) => {
    out.list.push(b);
    out.names.push(name);
    out.keys.push(key);
  };
  const len = (f: keyof SurroundForm, rule: 'positive' | 'any' = 'any', empty?: number) =>
    r.q(surroundKey(f), s[f] as string, 'length', 'mm', rule, empty);
  if (s.wallBelow) add({ kind: 'wall', pointM: [0, -len('wallBelowDistance')], normal: [0, 1] }, words.wallBelowName, surroundKey('wallBelowDistance'));
  if (s.wallBeside) {
    const d = len('wallBesideDistance');
    const right = s.wallBesideSide === 'right';
    add({ kind: 'wall', pointM: [right ? d : -d, 0], normal: [right ? -1 : 1, 0] }, `the wall to the ${s.wallBesideSide}`, surroundKey('wallBesideDistance'));
  }
  if (s.freeSurface) add({ kind: 'free-surface', pointM: [0, len('freeSurfaceDistance')], normal: [0, -1] }, 'the free surface', surroundKey('freeSurfaceDistance'));
  if (s.enclosure !== 'none') {
    const centerM: Vec2 = [len('enclosureX', 'any', 0), len('enclosureY', 'any', 0)];
    if (s.enclosure === 'circle') {
      add({ kind: 'enclosure', shape: 'circle', diameterM: len('enclosureDiameter', 'positive'), centerM }, 'the enclosure', surroundKey('enclosure'));
    } else {
      const widthM = len('enclosureWidth', 'positive'), heightM = len('enclosureHeight', 'positive');
      add({ kind: 'enclosure', shape: 'rectangle', widthM, heightM, centerM }, 'the enclosure', surroundKey('enclosure'));
    }
  }
  return out;
}

/**
 * Reads the whole form; `input` is set only when every field reads and the geometry passes the solver's checks.
 * `words` name the boundaries in messages (elevation or plan view, see view-words.ts).
 */
export function readSectionForm(form: SectionForm, words: SurroundWords = SURROUND_WORDS.elevation): FormReading {
  const r = reader();
  const density = r.q('density', form.density, 'density', 'kg/m^3', 'positive');
  if (form.bodies.length === 0) r.errors['bodies'] = 'add at least one body';
  if (form.bodies.length > MAX_EDITOR_BODIES) r.errors['bodies'] = `at most ${MAX_EDITOR_BODIES} bodies, got ${form.bodies.length}`;
  const bodies = form.bodies.map((b) => readBody(b, r));
  const bounds = readSurround(form.surround, r, words);
  if (Object.keys(r.errors).length > 0) return { input: null, errors: r.errors, boundaryNames: bounds.names };
  const input: SectionInput = { liquidDensityKgPerM3: density, bodies: bodies as BodySpec[] };
  if (bounds.list.length > 0) input.boundaries = bounds.list;
  try {
    validateSectionInput(input);
  } catch (e) {
    const raw = e instanceof Error ? e.message : String(e);
    const where = locate(raw);
    const key = !where ? 'bodies' : 'body' in where ? bodyKey(form.bodies[where.body]) : (bounds.keys[where.boundary] ?? surroundKey('all'));
    return { input: null, errors: { [key]: humanise(raw, bounds.names) }, boundaryNames: bounds.names };
  }
  return { input, errors: {}, boundaryNames: bounds.names };
}
