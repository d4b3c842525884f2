/**
 * The single gate for plate input from outside (JSON files, forms): checks types and ranges and returns a
 * clean copy of known fields. Every message names the field, what was expected and what was got; a bad
 * input throws a RangeError (numerical failure later is a typed result instead).
 */
import { EDGE_CONDITIONS, geometricCondition } from './types';
import type { EdgeSupport, PlateEdges, PlateInput, PlateLiquid } from './types';

export const MAX_PLATE_MODES = 20;

type Obj = Record<string, unknown>;

function show(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  if (typeof v === 'string') return JSON.stringify(v);
  return Array.isArray(v) ? 'an array' : 'an object';
}

function fail(path: string, expected: string, got: unknown): never {
  throw new RangeError(`${path} must be ${expected}, got ${show(got)}`);
}

function object(v: unknown, path: string, allowed: readonly string[]): Obj {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path || 'the plate input', 'an object', v);
  for (const key of Object.keys(v)) {
    if (!allowed.includes(key)) throw new RangeError(`${path ? `${path}.` : ''}${key} is not a known field (expected one of: ${allowed.join(', ')})`);
  }
  return v as Obj;
}

function num(o: Obj, key: string, path: string, expected: string, ok: (x: number) => boolean): number {
  const v = o[key];
  const p = path ? `${path}.${key}` : key;
  if (typeof v !== 'number' || !Number.isFinite(v) || !ok(v)) fail(p, expected, v);
  return v;
}

const POSITIVE = 'a finite number > 0';

function edge(o: Obj, key: keyof PlateEdges): EdgeSupport {
  const v = o[key];
  const path = `edges.${key}`;
  if (typeof v === 'object' && v !== null && !Array.isArray(v)) {
    const s = object(v, path, ['rotationalSpringNmPerRadPerM']);
    return { rotationalSpringNmPerRadPerM: num(s, 'rotationalSpringNmPerRadPerM', path, 'a finite number ≥ 0 (N·m per radian per metre of edge)', (x) => x >= 0) };
  }
  if (typeof v !== 'string' || !(EDGE_CONDITIONS as readonly string[]).includes(v)) {
    fail(path, `one of ${EDGE_CONDITIONS.map((c) => `"${c}"`).join(', ')} or { "rotationalSpringNmPerRadPerM": k }`, v);
  }
  return v as EdgeSupport;
}

function liquid(v: unknown, heightM: number): PlateLiquid {
  const o = object(v, 'liquid', ['setting', 'densityKgPerM3', 'sides', 'depthM', 'reachM']);
  const setting = o.setting;
  if (setting !== 'wall-panel' && setting !== 'across-tank') fail('liquid.setting', 'one of "wall-panel", "across-tank"', setting);
  const out: PlateLiquid = { setting, densityKgPerM3: num(o, 'densityKgPerM3', 'liquid', POSITIVE, (x) => x > 0), sides: 1 };
  if (o.sides !== 1 && o.sides !== 2) fail('liquid.sides', '1 or 2 (wetted faces)', o.sides);
  out.sides = o.sides;
  if (o.reachM !== undefined) out.reachM = num(o, 'reachM', 'liquid', `${POSITIVE} (distance to the facing rigid wall), or absent`, (x) => x > 0);
  if (setting === 'wall-panel') {
    if (o.depthM !== undefined) fail('liquid.depthM', 'absent for "wall-panel" (the liquid covers the whole panel; depth applies to "across-tank")', o.depthM);
  } else {
    out.depthM = num(o, 'depthM', 'liquid', `${POSITIVE} (liquid depth above the bottom edge)`, (x) => x > 0);
    if (out.sides === 1 && out.depthM > heightM * (1 + 1e-9)) {
      fail('liquid.depthM', `at most heightM = ${heightM} m when sides is 1 (deeper liquid would pour over the top edge; use sides 2)`, out.depthM);
    }
  }
  return out;
}

/** Validates raw plate input (parsed JSON or a form's reading). */
export function parsePlateInput(raw: unknown): PlateInput {
  const o = object(raw, '', ['widthM', 'heightM', 'thicknessM', 'youngsModulusPa', 'poissonRatio', 'densityKgPerM3', 'edges', 'liquid', 'modes']);
  const widthM = num(o, 'widthM', '', POSITIVE, (x) => x > 0);
  const heightM = num(o, 'heightM', '', POSITIVE, (x) => x > 0);
  const thicknessM = num(o, 'thicknessM', '', POSITIVE, (x) => x > 0);
  const shortSide = Math.min(widthM, heightM);
  if (thicknessM > shortSide / 5) fail('thicknessM', `at most a fifth of the shorter side (${shortSide / 5} m) for thin-plate theory`, thicknessM);
  const e = object(o.edges, 'edges', ['left', 'right', 'bottom', 'top']);
  const edges: PlateEdges = { left: edge(e, 'left'), right: edge(e, 'right'), bottom: edge(e, 'bottom'), top: edge(e, 'top') };
  const all = [edges.left, edges.right, edges.bottom, edges.top].map(geometricCondition);
  const clamped = all.filter((c) => c === 'clamped').length;
  const supported = all.filter((c) => c === 'simply-supported').length;
  if (clamped === 0 && supported < 2) {
    throw new RangeError(
      `edges must hold the plate: at least one edge "clamped" or two "simply-supported" (or spring-restrained), got ${all.map((c) => `"${c}"`).join(', ')} (left, right, bottom, top) — the plate could move as a rigid body`,
    );
  }
  const input: PlateInput = {
    widthM,
    heightM,
    thicknessM,
    youngsModulusPa: num(o, 'youngsModulusPa', '', POSITIVE, (x) => x > 0),
    poissonRatio: num(o, 'poissonRatio', '', 'a finite number from 0 to below 0.5', (x) => x >= 0 && x < 0.5),
    densityKgPerM3: num(o, 'densityKgPerM3', '', POSITIVE, (x) => x > 0),
    edges,
  };
  if (o.liquid !== undefined) input.liquid = liquid(o.liquid, heightM);
  if (o.modes !== undefined) input.modes = num(o, 'modes', '', `a whole number from 1 to ${MAX_PLATE_MODES}`, (x) => Number.isInteger(x) && x >= 1 && x <= MAX_PLATE_MODES);
  return input;
}
