/**
 * Checks for the SI inputs of the member builders, used once at each public entry. Every message names the
 * field, what was expected and what was got: `wallThicknessM must be a finite number > 0, got -2`.
 */

/** How a received value is shown in a message. */
export function show(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'number' || typeof v === 'boolean' || v === null) return String(v);
  if (Array.isArray(v)) return `an array of length ${v.length}`;
  return typeof v === 'object' ? 'an object' : typeof v;
}

export function fail(field: string, expected: string, got: unknown): never {
  failText(field, expected, show(got));
}

/** As `fail`, with the received part already in words (not quoted). */
export function failText(field: string, expected: string, gotText: string): never {
  throw new RangeError(`${field} must be ${expected}, got ${gotText}`);
}

/** A computed number for a message, without floating-point noise: 0.42390000000000005 → "0.4239". */
export function num(x: number): string {
  return String(Number(x.toPrecision(12)));
}

export function record(field: string, v: unknown): Record<string, unknown> {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(field, 'an object', v);
  return v as Record<string, unknown>;
}

export function finite(field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) fail(field, 'a finite number', v);
  return v;
}

export function positive(field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || !(v > 0)) fail(field, 'a finite number > 0', v);
  return v;
}

export function nonNegative(field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || !(v >= 0)) fail(field, 'a finite number ≥ 0', v);
  return v;
}

/** A value that may be absent; when present it must pass `check`. */
export function optional<T>(field: string, v: unknown, check: (field: string, v: unknown) => T): T | undefined {
  return v === undefined ? undefined : check(field, v);
}

export function bool(field: string, v: unknown): boolean {
  if (typeof v !== 'boolean') fail(field, 'true or false', v);
  return v;
}

export function oneOf<T extends string>(field: string, v: unknown, allowed: readonly T[]): T {
  if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v)) {
    fail(field, `one of ${allowed.map((a) => JSON.stringify(a)).join(', ')}`, v);
  }
  return v as T;
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
