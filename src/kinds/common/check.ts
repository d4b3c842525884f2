/**
 * Checks for the SI inputs of the member builders, used once at each public entry. Every message names the
 * field, what was expected and what was got: `wallThicknessM must be a finite number > 0, got -2`. Built on the
 * core's checking kit (src/physics/check); a failed check is a RangeError carrying the field (`checkedField`).
 */
import { checkingKit } from '../../physics/check/kit';

/** How a received value is shown in a message. */
export function show(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'number' || typeof v === 'boolean' || v === null) return String(v);
  if (Array.isArray(v)) return `an array of length ${v.length}`;
  return typeof v === 'object' ? 'an object' : typeof v;
}

const KIT = checkingKit(show);

// Declared as functions (not destructured) so that a call to `fail` narrows types in the caller.
export function fail(field: string, expected: string, got: unknown): never {
  return KIT.fail(field, expected, got);
}

/** As `fail`, with the received part already in words (not quoted). */
export function failText(field: string, expected: string, gotText: string): never {
  return KIT.failText(field, expected, gotText);
}

export const { finite, positive, nonNegative, optional, bool, oneOf } = KIT;

/** A computed number for a message, without floating-point noise: 0.42390000000000005 → "0.4239". */
export function num(x: number): string {
  return String(Number(x.toPrecision(12)));
}

export function record(field: string, v: unknown): Record<string, unknown> {
  return KIT.record(field, v);
}

/** Material of a member: Young's modulus and density, both > 0. */
export function material(input: Record<string, unknown>): { youngsModulusPa: number; materialDensityKgPerM3: number } {
  return {
    youngsModulusPa: positive('youngsModulusPa', input.youngsModulusPa),
    materialDensityKgPerM3: positive('materialDensityKgPerM3', input.materialDensityKgPerM3),
  };
}

/** Tube wall: 0 < t < D/2 (a thicker wall is a solid bar). */
export function tubeWall(outerDiameterM: number, v: unknown): number {
  const t = positive('wallThicknessM', v);
  if (!(t < outerDiameterM / 2)) fail('wallThicknessM', `less than half of outerDiameterM (${num(outerDiameterM / 2)} m)`, t);
  return t;
}
