/**
 * Validation of a screening input, once, at the public entry. Throws ScreeningInputError naming the field,
 * what was expected and what was got. Everything past this point may assume valid input.
 */
import { checkingKit, isRecord } from '../check/kit';
import { describe, ScreeningInputError } from './input-error';
import type { LimitOverrides, ScreeningInput, ZoneSection } from './types';

// The core's checking kit, with this entry's error (ScreeningInputError, which carries the field for forms).
const KIT = checkingKit(describe, (field, expected, _gotText, value) => new ScreeningInputError(field, expected, value));
const { positive, nonNegative, finite } = KIT;

function fail(field: string, expected: string, got: unknown): never {
  return KIT.fail(field, expected, got);
}

const isObject = isRecord;

function arrayLike(field: string, v: unknown, minLength: number): ArrayLike<unknown> {
  const expected = minLength > 0 ? `an array with at least ${minLength} ${minLength === 1 ? 'entry' : 'entries'}` : 'an array';
  return KIT.arrayOf(field, v, minLength, expected);
}

function validateModes(modes: unknown): void {
  const list = arrayLike('modes', modes, 1);
  for (let i = 0; i < list.length; i++) {
    const f = `modes[${i}]`;
    const m = list[i];
    if (!isObject(m)) fail(f, 'an object', m);
    positive(`${f}.wetFrequencyHz`, m.wetFrequencyHz);
    if (m.dryFrequencyHz !== undefined) positive(`${f}.dryFrequencyHz`, m.dryFrequencyHz);
    if (m.effectiveMassKgPerM !== undefined) positive(`${f}.effectiveMassKgPerM`, m.effectiveMassKgPerM);
    const z = arrayLike(`${f}.zM`, m.zM, 2);
    for (let j = 0; j < z.length; j++) {
      const zj = finite(`${f}.zM[${j}]`, z[j]);
      if (j > 0 && !(zj > (z[j - 1] as number))) {
        fail(`${f}.zM[${j}]`, `greater than ${f}.zM[${j - 1}] = ${z[j - 1] as number} (strictly increasing)`, zj);
      }
    }
    const w = arrayLike(`${f}.displacement`, m.displacement, 2);
    if (w.length !== z.length) fail(`${f}.displacement`, `an array of the same length as ${f}.zM (${z.length})`, m.displacement);
    let any = false;
    for (let j = 0; j < w.length; j++) any = finite(`${f}.displacement[${j}]`, w[j]) !== 0 || any;
    if (!any) fail(`${f}.displacement`, 'a mode shape with at least one non-zero value', 'all zeros');
  }
}

function validateSection(f: string, s: unknown): void {
  if (!isObject(s)) fail(f, 'an object', s);
  const section = s as ZoneSection | Record<string, unknown>;
  if (section.kind === 'circle') positive(`${f}.outerDiameterM`, section.outerDiameterM);
  else if (section.kind === 'rectangle') {
    positive(`${f}.widthAcrossFlowM`, section.widthAcrossFlowM);
    positive(`${f}.depthAlongFlowM`, section.depthAlongFlowM);
  } else fail(`${f}.kind`, `"circle" or "rectangle"`, section.kind);
}

function validateZones(zones: unknown): void {
  const list = arrayLike('zones', zones, 0);
  const spans: { i: number; from: number; to: number }[] = [];
  for (let i = 0; i < list.length; i++) {
    const f = `zones[${i}]`;
    const zone = list[i];
    if (!isObject(zone)) fail(f, 'an object', zone);
    const from = finite(`${f}.fromM`, zone.fromM);
    const to = finite(`${f}.toM`, zone.toM);
    if (!(to > from)) fail(`${f}.toM`, `greater than ${f}.fromM = ${from}`, to);
    validateSection(`${f}.section`, zone.section);
    if (zone.flowSpeedMPerS !== undefined) nonNegative(`${f}.flowSpeedMPerS`, zone.flowSpeedMPerS);
    spans.push({ i, from, to });
  }
  spans.sort((a, b) => a.from - b.from);
  for (let k = 1; k < spans.length; k++) {
    const prev = spans[k - 1];
    const cur = spans[k];
    if (cur.from < prev.to) {
      fail(`zones[${cur.i}].fromM`, `≥ zones[${prev.i}].toM = ${prev.to} (zones must not overlap)`, cur.from);
    }
  }
}

function validateFlow(flow: unknown): void {
  if (typeof flow === 'number') {
    nonNegative('flowSpeedMPerS', flow);
    return;
  }
  if (!Array.isArray(flow)) fail('flowSpeedMPerS', 'a finite number ≥ 0 or an array of { zM, speedMPerS } points', flow);
  arrayLike('flowSpeedMPerS', flow, 1);
  for (let i = 0; i < flow.length; i++) {
    const f = `flowSpeedMPerS[${i}]`;
    const p: unknown = flow[i];
    if (!isObject(p)) fail(f, 'an object { zM, speedMPerS }', p);
    const z = finite(`${f}.zM`, p.zM);
    nonNegative(`${f}.speedMPerS`, p.speedMPerS);
    if (i > 0) {
      const prev = (flow[i - 1] as { zM: number }).zM;
      if (!(z > prev)) fail(`${f}.zM`, `greater than flowSpeedMPerS[${i - 1}].zM = ${prev} (points in increasing z)`, z);
    }
  }
}

function validateLimits(limits: unknown): void {
  if (limits === undefined) return;
  if (!isObject(limits)) fail('limits', 'an object', limits);
  const l = limits as LimitOverrides;
  for (const key of ['inLineReducedVelocity', 'crossFlowReducedVelocity'] as const) {
    const r = l[key];
    if (r === undefined) continue;
    if (!isObject(r)) fail(`limits.${key}`, 'an object { min, max, source? }', r);
    const min = positive(`limits.${key}.min`, r.min);
    const max = finite(`limits.${key}.max`, r.max);
    if (!(max > min)) fail(`limits.${key}.max`, `greater than limits.${key}.min = ${min}`, max);
  }
  if (l.inLineStabilityMax !== undefined) positive('limits.inLineStabilityMax.value', l.inLineStabilityMax?.value);
  if (l.stemFrequencyRatioMax !== undefined) positive('limits.stemFrequencyRatioMax.value', l.stemFrequencyRatioMax?.value);
  if (l.separationMargin !== undefined) {
    const m = l.separationMargin?.value;
    if (typeof m !== 'number' || !(m >= 0 && m < 1)) fail('limits.separationMargin.value', 'a fraction 0 ≤ value < 1 (0.2 = ±20 %)', m);
  }
}

function validateMachinery(machinery: unknown): void {
  const list = arrayLike('machinery', machinery, 0);
  for (let i = 0; i < list.length; i++) {
    const f = `machinery[${i}]`;
    const m = list[i];
    if (!isObject(m)) fail(f, 'an object', m);
    const hz = positive(`${f}.shaftSpeedHz`, m.shaftSpeedHz);
    if (m.shaftSpeedMaxHz !== undefined) {
      const max = finite(`${f}.shaftSpeedMaxHz`, m.shaftSpeedMaxHz);
      if (!(max >= hz)) fail(`${f}.shaftSpeedMaxHz`, `≥ ${f}.shaftSpeedHz = ${hz}`, max);
    }
    if (m.bladeCount !== undefined) {
      const b = m.bladeCount;
      if (typeof b !== 'number' || !Number.isInteger(b) || b < 1) fail(`${f}.bladeCount`, 'a whole number ≥ 1', b);
    }
    if (m.shaftOrders !== undefined) {
      const orders = arrayLike(`${f}.shaftOrders`, m.shaftOrders, 0);
      for (let k = 0; k < orders.length; k++) positive(`${f}.shaftOrders[${k}]`, orders[k]);
    }
    if (m.bladePassOrders !== undefined) {
      if (m.bladeCount === undefined) fail(`${f}.bladeCount`, 'given when bladePassOrders is given', undefined);
      const orders = arrayLike(`${f}.bladePassOrders`, m.bladePassOrders, 0);
      for (let k = 0; k < orders.length; k++) positive(`${f}.bladePassOrders[${k}]`, orders[k]);
    }
  }
}

/** Throws ScreeningInputError on the first invalid field; returns the input typed on success. */
export function validateScreeningInput(input: unknown): ScreeningInput {
  if (!isObject(input)) fail('input', 'an object', input);
  validateModes(input.modes);
  validateZones(input.zones);
  validateFlow(input.flowSpeedMPerS);
  positive('effectiveMassKgPerM', input.effectiveMassKgPerM);
  if (input.liquid !== undefined) {
    if (!isObject(input.liquid)) fail('liquid', 'an object', input.liquid);
    positive('liquid.densityKgPerM3', input.liquid.densityKgPerM3);
    positive('liquid.kinematicViscosityM2PerS', input.liquid.kinematicViscosityM2PerS);
  }
  if (input.dampingRatio !== undefined) {
    const z = input.dampingRatio;
    if (typeof z !== 'number' || !(z >= 0 && z < 1)) fail('dampingRatio', 'a fraction of critical 0 ≤ ζ < 1', z);
  }
  if (input.stemFrequencyRatioScreen !== undefined && typeof input.stemFrequencyRatioScreen !== 'boolean') {
    fail('stemFrequencyRatioScreen', 'true or false', input.stemFrequencyRatioScreen);
  }
  if (input.strouhal !== undefined) {
    if (!isObject(input.strouhal)) fail('strouhal', 'an object { value, source }', input.strouhal);
    positive('strouhal.value', input.strouhal.value);
    const s = input.strouhal.source;
    if (typeof s !== 'string' || s.trim() === '') fail('strouhal.source', 'a non-empty text naming where the value comes from', s);
  }
  if (input.waves !== undefined) {
    if (!isObject(input.waves)) fail('waves', 'an object { periodMinS, periodMaxS }', input.waves);
    const tMin = positive('waves.periodMinS', input.waves.periodMinS);
    const tMax = finite('waves.periodMaxS', input.waves.periodMaxS);
    if (!(tMax >= tMin)) fail('waves.periodMaxS', `≥ waves.periodMinS = ${tMin}`, tMax);
  }
  if (input.machinery !== undefined) validateMachinery(input.machinery);
  const against = input.machineryAgainst;
  if (against !== undefined && against !== 'wet' && against !== 'wet-and-dry') {
    fail('machineryAgainst', '"wet" or "wet-and-dry"', against);
  }
  validateLimits(input.limits);
  return input as unknown as ScreeningInput;
}
