/**
 * The single gate for member input from outside (JSON files, links, forms): checks types, ranges and the
 * layout of segments along the member, and returns a clean copy holding only known fields. Every message
 * names the field path, what was expected and what was got.
 */
import type {
  LumpedMass,
  FlowShielding,
  MemberLiquid,
  MemberModel,
  MemberSection,
  MemberSegment,
  MemberSupport,
  MeshOptions,
  SoilSprings,
  SupportKind,
} from './model';
import type { BoundarySpec } from '../section/types';
import { findShape, SHAPE_IDS, shapeOf } from '../shapes/registry';
import { checkingKit } from '../check/kit';
import { MAX_BOUNDARIES } from '../section/validate';

const SUPPORT_KINDS: readonly SupportKind[] = ['clamped', 'pinned', 'guided', 'free', 'spring'];
export const MAX_MODES = 50;
/**
 * Most entries of each list, so every input bounds its work before any is done (equal neighbouring
 * segments are merged by the solver, so a member cut into many equal pieces still solves quickly).
 */
export const MAX_SEGMENTS = 10000;
export const MAX_SUPPORTS = 100;
export const MAX_SOIL_RANGES = 1000;
export const MAX_MASSES = 1000;

/** How a received value is shown in a message. */
function show(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'number') return String(v);
  if (typeof v === 'string') return JSON.stringify(v);
  if (Array.isArray(v)) return 'an array';
  return typeof v === 'object' ? 'an object' : String(v);
}

// The core's checking kit; a failed check is a RangeError carrying the field path.
const KIT = checkingKit(show);

function fail(path: string, expected: string, got: unknown): never {
  return KIT.fail(path, expected, got);
}

/** Same, with the received value already described in words. */
function failDescribed(path: string, expected: string, gotText: string): never {
  return KIT.failText(path, expected, gotText);
}

type Obj = Record<string, unknown>;

function object(v: unknown, path: string, allowed: readonly string[]): Obj {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path, 'an object', v);
  const o = v as Obj;
  for (const key of Object.keys(o)) {
    if (!allowed.includes(key)) throw new RangeError(`${path === '' ? '' : `${path}.`}${key} is not a known field (expected one of: ${allowed.join(', ')})`);
  }
  return o;
}

function at(path: string, key: string): string {
  return path === '' ? key : `${path}.${key}`;
}

function num(o: Obj, key: string, path: string, expected: string, ok: (x: number) => boolean): number {
  const v = o[key];
  if (typeof v !== 'number' || !Number.isFinite(v) || !ok(v)) fail(at(path, key), expected, v);
  return v;
}

function optNum(o: Obj, key: string, path: string, expected: string, ok: (x: number) => boolean): number | undefined {
  return o[key] === undefined ? undefined : num(o, key, path, expected, ok);
}

function optBool(o: Obj, key: string, path: string): boolean | undefined {
  const v = o[key];
  if (v === undefined) return undefined;
  if (typeof v !== 'boolean') fail(at(path, key), 'true or false', v);
  return v;
}

function array(v: unknown, path: string, nonEmpty: boolean, max: number): unknown[] {
  if (!Array.isArray(v)) fail(path, nonEmpty ? 'a non-empty array' : 'an array', v);
  if (nonEmpty && v.length === 0) failDescribed(path, 'a non-empty array', 'an empty array');
  if (v.length > max) failDescribed(path, `an array of at most ${max} entries`, `${v.length} entries`);
  return v;
}

const positive = (x: number) => x > 0;
const nonNegative = (x: number) => x >= 0;

function section(v: unknown, path: string): MemberSection {
  const shape = findShape((v as Obj | null)?.shape);
  if (shape) {
    const choiceKeys = Object.keys(shape.choices);
    const o = object(v, path, ['shape', ...shape.dimensions, ...choiceKeys]);
    const out: Obj = { shape: shape.id };
    for (const key of shape.dimensions) out[key] = num(o, key, path, 'a finite number > 0', positive);
    for (const key of choiceKeys) {
      const words = shape.choices[key];
      if (typeof o[key] !== 'string' || !words.includes(o[key] as string)) fail(at(path, key), `one of ${words.map((w) => JSON.stringify(w)).join(', ')}`, o[key]);
      out[key] = o[key];
    }
    const sec = out as unknown as MemberSection;
    const bad = shape.check(sec);
    if (bad) fail(at(path, bad.field), bad.expected, bad.got);
    return sec;
  }
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path, 'an object', v);
  return fail(at(path, 'shape'), `one of ${SHAPE_IDS.map((id) => JSON.stringify(id)).join(', ')}`, (v as Obj).shape);
}

function segment(v: unknown, i: number, lengthM: number): MemberSegment {
  const path = `segments[${i}]`;
  const o = object(v, path, ['fromM', 'toM', 'section', 'endSection', 'youngsModulusPa', 'densityKgPerM3', 'poissonRatio', 'contentsDensityKgPerM3', 'coating']);
  const fromM = num(o, 'fromM', path, 'a finite number', () => true);
  const toM = num(o, 'toM', path, `a finite number > fromM (${fromM})`, (x) => x > fromM);
  if (toM > lengthM * (1 + 1e-9)) fail(at(path, 'toM'), `at most lengthM = ${lengthM}`, toM);
  const seg: MemberSegment = {
    fromM,
    toM,
    section: section(o.section, at(path, 'section')),
    youngsModulusPa: num(o, 'youngsModulusPa', path, 'a finite number > 0', positive),
    densityKgPerM3: num(o, 'densityKgPerM3', path, 'a finite number > 0', positive),
  };
  if (o.endSection !== undefined) {
    seg.endSection = section(o.endSection, at(path, 'endSection'));
    if (seg.endSection.shape !== seg.section.shape) fail(at(path, 'endSection.shape'), `the same as section.shape ("${seg.section.shape}")`, seg.endSection.shape);
    const start = seg.section as unknown as Obj;
    const end = seg.endSection as unknown as Obj;
    for (const key of Object.keys(shapeOf(seg.section).choices)) {
      if (end[key] !== start[key]) fail(at(path, `endSection.${key}`), `the same as section.${key} (${JSON.stringify(start[key])})`, end[key]);
    }
  }
  const nu = optNum(o, 'poissonRatio', path, 'a finite number from 0 to below 0.5', (x) => x >= 0 && x < 0.5);
  if (nu !== undefined) seg.poissonRatio = nu;
  const rc = optNum(o, 'contentsDensityKgPerM3', path, 'a finite number ≥ 0', nonNegative);
  if (rc !== undefined) {
    if (rc > 0 && !shapeOf(seg.section).holdsContents) fail(at(path, 'contentsDensityKgPerM3'), `0 or absent for a "${seg.section.shape}" (contents apply to tubes only)`, rc);
    seg.contentsDensityKgPerM3 = rc;
  }
  if (o.coating !== undefined) {
    const cp = at(path, 'coating');
    const c = object(o.coating, cp, ['thicknessM', 'densityKgPerM3']);
    seg.coating = { thicknessM: num(c, 'thicknessM', cp, 'a finite number ≥ 0', nonNegative), densityKgPerM3: num(c, 'densityKgPerM3', cp, 'a finite number ≥ 0', nonNegative) };
  }
  return seg;
}

/** Segments in order, from 0 to lengthM, no gaps and no overlaps. */
function checkLayout(segs: MemberSegment[], lengthM: number): void {
  const tol = 1e-9 * lengthM;
  if (Math.abs(segs[0].fromM) > tol) fail('segments[0].fromM', '0 (the first segment starts at the root, z = 0)', segs[0].fromM);
  for (let i = 1; i < segs.length; i++) {
    const prev = segs[i - 1].toM;
    const from = segs[i].fromM;
    if (from > prev + tol) fail(`segments[${i}].fromM`, `equal to segments[${i - 1}].toM = ${prev} (gap from ${prev} m to ${from} m)`, from);
    if (from < prev - tol) fail(`segments[${i}].fromM`, `equal to segments[${i - 1}].toM = ${prev} (segments overlap from ${from} m to ${prev} m)`, from);
    segs[i].fromM = prev;
  }
  const last = segs[segs.length - 1];
  if (Math.abs(last.toM - lengthM) > tol) fail(`segments[${segs.length - 1}].toM`, `equal to lengthM = ${lengthM} (segments must cover the member)`, last.toM);
  last.toM = lengthM;
}

function support(v: unknown, i: number, lengthM: number): MemberSupport {
  const path = `supports[${i}]`;
  const o = object(v, path, ['atM', 'kind', 'translationalStiffnessNPerM', 'rotationalStiffnessNmPerRad']);
  const atM = num(o, 'atM', path, `a finite number from 0 to lengthM = ${lengthM} (on the member)`, (x) => x >= 0 && x <= lengthM);
  const kind = o.kind as SupportKind;
  if (!SUPPORT_KINDS.includes(kind)) fail(at(path, 'kind'), `one of ${SUPPORT_KINDS.map((k) => `"${k}"`).join(', ')}`, o.kind);
  const s: MemberSupport = { atM, kind };
  const kt = optNum(o, 'translationalStiffnessNPerM', path, 'a finite number ≥ 0', nonNegative);
  const kr = optNum(o, 'rotationalStiffnessNmPerRad', path, 'a finite number ≥ 0', nonNegative);
  if (kind !== 'spring' && (kt !== undefined || kr !== undefined)) {
    fail(at(path, 'kind'), '"spring" when stiffnesses are given', kind);
  }
  if (kind === 'spring') {
    if (!((kt ?? 0) > 0 || (kr ?? 0) > 0)) failDescribed(path, 'a spring with translationalStiffnessNPerM or rotationalStiffnessNmPerRad > 0', 'neither');
    if (kt !== undefined) s.translationalStiffnessNPerM = kt;
    if (kr !== undefined) s.rotationalStiffnessNmPerRad = kr;
  }
  return s;
}

function soilRange(v: unknown, i: number, lengthM: number): SoilSprings {
  const path = `soilSprings[${i}]`;
  const o = object(v, path, ['fromM', 'toM', 'modulusNPerM2']);
  const fromM = num(o, 'fromM', path, `a finite number from 0 to lengthM = ${lengthM}`, (x) => x >= 0 && x <= lengthM);
  const toM = num(o, 'toM', path, `a finite number > fromM (${fromM}) and at most lengthM = ${lengthM}`, (x) => x > fromM && x <= lengthM);
  return { fromM, toM, modulusNPerM2: num(o, 'modulusNPerM2', path, 'a finite number ≥ 0', nonNegative) };
}

function lumpedMass(v: unknown, i: number, lengthM: number): LumpedMass {
  const path = `masses[${i}]`;
  const o = object(v, path, ['atM', 'massKg', 'rotaryInertiaKgM2']);
  const m: LumpedMass = {
    atM: num(o, 'atM', path, `a finite number from 0 to lengthM = ${lengthM} (on the member)`, (x) => x >= 0 && x <= lengthM),
    massKg: num(o, 'massKg', path, 'a finite number ≥ 0', nonNegative),
  };
  const j = optNum(o, 'rotaryInertiaKgM2', path, 'a finite number ≥ 0', nonNegative);
  if (j !== undefined) m.rotaryInertiaKgM2 = j;
  return m;
}

function shielding(v: unknown, i: number): FlowShielding {
  const path = `liquid.flowShielding[${i}]`;
  const o = object(v, path, ['fromM', 'toM', 'flowSpeedMPerS', 'label']);
  const fromM = num(o, 'fromM', path, 'a finite number', () => true);
  const toM = num(o, 'toM', path, `a finite number > fromM (${fromM})`, (x) => x > fromM);
  const flowSpeedMPerS = num(o, 'flowSpeedMPerS', path, 'a finite number ≥ 0', nonNegative);
  if (typeof o.label !== 'string') fail(`${path}.label`, 'a string', o.label);
  return { fromM, toM, flowSpeedMPerS, label: o.label as string };
}

function liquid(v: unknown, lengthM: number): MemberLiquid {
  const path = 'liquid';
  const o = object(v, path, ['densityKgPerM3', 'fromM', 'toM', 'boundaries', 'perforationRatio', 'endEffect3d', 'flowShielding', 'kinematicViscosityM2PerS', 'viscositySource', 'boundariesFromM']);
  const fromM = num(o, 'fromM', path, 'a finite number', () => true);
  const toM = num(o, 'toM', path, `a finite number > fromM (${fromM})`, (x) => x > fromM);
  if (!(toM > 0 && fromM < lengthM)) failDescribed(path, `a range overlapping the member [0, ${lengthM}] m`, `[${fromM}, ${toM}]`);
  const liq: MemberLiquid = { densityKgPerM3: num(o, 'densityKgPerM3', path, 'a finite number > 0', positive), fromM, toM };
  if (o.boundaries !== undefined) {
    const b = array(o.boundaries, at(path, 'boundaries'), false, MAX_BOUNDARIES);
    b.forEach((x, i) => {
      if (typeof x !== 'object' || x === null || Array.isArray(x)) fail(`liquid.boundaries[${i}]`, 'an object', x);
    });
    liq.boundaries = b as BoundarySpec[];
  }
  const p = optNum(o, 'perforationRatio', path, 'a finite number from 0 to 0.5 (range of DNV-RP-H103 §4.6.4.3)', (x) => x >= 0 && x <= 0.5);
  if (p !== undefined) liq.perforationRatio = p;
  const ee = optBool(o, 'endEffect3d', path);
  if (ee !== undefined) liq.endEffect3d = ee;
  const bf = optNum(o, 'boundariesFromM', path, 'a finite number', () => true);
  if (bf !== undefined) liq.boundariesFromM = bf;
  const nu = optNum(o, 'kinematicViscosityM2PerS', path, 'a finite number > 0', positive);
  if (nu !== undefined) liq.kinematicViscosityM2PerS = nu;
  if (o.viscositySource !== undefined) {
    if (typeof o.viscositySource !== 'string') fail(`${path}.viscositySource`, 'a string', o.viscositySource);
    liq.viscositySource = o.viscositySource as string;
  }
  if (o.flowShielding !== undefined) liq.flowShielding = array(o.flowShielding, at(path, 'flowShielding'), false, MAX_SEGMENTS).map((x, i) => shielding(x, i));
  return liq;
}

function meshOptions(v: unknown): MeshOptions {
  const path = 'mesh';
  const o = object(v, path, ['initialElements', 'relativeTolerance', 'maxElements', 'refine']);
  const out: MeshOptions = {};
  const isInt = (lo: number, hi: number) => (x: number) => Number.isInteger(x) && x >= lo && x <= hi;
  const ie = optNum(o, 'initialElements', path, 'an integer from 1 to 20000', isInt(1, 20000));
  if (ie !== undefined) out.initialElements = ie;
  const rt = optNum(o, 'relativeTolerance', path, 'a finite number > 0 and < 0.1', (x) => x > 0 && x < 0.1);
  if (rt !== undefined) out.relativeTolerance = rt;
  const me = optNum(o, 'maxElements', path, 'an integer from 1 to 20000', isInt(1, 20000));
  if (me !== undefined) out.maxElements = me;
  const rf = optBool(o, 'refine', path);
  if (rf !== undefined) out.refine = rf;
  return out;
}

const TOP_FIELDS = ['lengthM', 'segments', 'liquid', 'supports', 'soilSprings', 'masses', 'tensionN', 'tensionVariesWithWeight', 'modes', 'beamTheory', 'mesh', 'name', 'description', 'note'];

/** Checks member input from outside and returns a clean MemberModel; throws RangeError naming the field. */
export function parseMemberModel(raw: unknown): MemberModel {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) fail('the member input', 'a JSON object', raw);
  const o = object(raw, '', TOP_FIELDS);
  const lengthM = num(o, 'lengthM', '', 'a finite number > 0', positive);
  const segments = array(o.segments, 'segments', true, MAX_SEGMENTS).map((s, i) => segment(s, i, lengthM));
  checkLayout(segments, lengthM);
  const model: MemberModel = {
    lengthM,
    segments,
    supports: array(o.supports, 'supports', false, MAX_SUPPORTS).map((s, i) => support(s, i, lengthM)),
  };
  if (o.soilSprings !== undefined) model.soilSprings = array(o.soilSprings, 'soilSprings', false, MAX_SOIL_RANGES).map((s, i) => soilRange(s, i, lengthM));
  if (o.masses !== undefined) model.masses = array(o.masses, 'masses', false, MAX_MASSES).map((m, i) => lumpedMass(m, i, lengthM));
  if (o.liquid !== undefined && o.liquid !== null) model.liquid = liquid(o.liquid, lengthM);
  const bf = model.liquid?.boundariesFromM;
  if (bf !== undefined) {
    const tol = 1e-9 * lengthM;
    const cut = segments.findIndex((s) => s.fromM < bf - tol && s.toM > bf + tol);
    if (cut >= 0) fail('liquid.boundariesFromM', `at a segment end (segments[${cut}] runs from ${segments[cut].fromM} to ${segments[cut].toM} m across it)`, bf);
  }
  const t = optNum(o, 'tensionN', '', 'a finite number (negative = compression)', () => true);
  if (t !== undefined) model.tensionN = t;
  const tv = optBool(o, 'tensionVariesWithWeight', '');
  if (tv !== undefined) model.tensionVariesWithWeight = tv;
  const modes = optNum(o, 'modes', '', `an integer from 1 to ${MAX_MODES}`, (x) => Number.isInteger(x) && x >= 1 && x <= MAX_MODES);
  if (modes !== undefined) model.modes = modes;
  if (o.beamTheory !== undefined) {
    if (o.beamTheory !== 'euler-bernoulli' && o.beamTheory !== 'timoshenko') fail('beamTheory', 'one of "euler-bernoulli", "timoshenko"', o.beamTheory);
    model.beamTheory = o.beamTheory;
  }
  if (o.mesh !== undefined) model.mesh = meshOptions(o.mesh);
  for (const key of ['name', 'description', 'note']) {
    if (o[key] !== undefined && typeof o[key] !== 'string') fail(key, 'a string', o[key]);
  }
  return model;
}
