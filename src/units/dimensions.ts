/**
 * Dimensions of the quantities Wetmode asks for: what each is called in messages, an example in each unit
 * system, the units offered for display, and its exponents of the SI base dimensions in mathjs's order
 * [mass, length, time, current, temperature, luminous intensity, amount of substance, angle, bit].
 */

export type { UnitSystem } from './systems';
import type { UnitSystem } from './systems';

export type Dimension =
  | 'length'
  | 'mass'
  | 'density'
  | 'modulus'
  | 'force'
  | 'rotary-inertia'
  | 'rotational-stiffness'
  | 'soil-modulus'
  | 'soil-modulus-gradient'
  | 'frequency'
  | 'speed'
  | 'flow-rate'
  | 'pressure'
  | 'time'
  | 'angle'
  | 'ratio';

export interface DimensionInfo {
  /** With its article, for messages: "a length". */
  noun: string;
  exponents: readonly number[];
  /** How it might be typed in each system, for messages: "610 mm" or "24 in". */
  examples: Readonly<Record<UnitSystem, string>>;
  /** Display units offered per system; the first is the usual one. '' = a plain number, '%' = per cent. */
  units: Readonly<Record<UnitSystem, readonly string[]>>;
  /** Rotational stiffness: accept N·m/rad and N·m alike (radians are dimensionless). */
  angleOptional?: boolean;
}

// Exponent vectors, mathjs order.
const L = [0, 1, 0, 0, 0, 0, 0, 0, 0];
const M = [1, 0, 0, 0, 0, 0, 0, 0, 0];
const DENSITY = [1, -3, 0, 0, 0, 0, 0, 0, 0];
const PRESSURE = [1, -1, -2, 0, 0, 0, 0, 0, 0];
const FORCE = [1, 1, -2, 0, 0, 0, 0, 0, 0];
const INERTIA = [1, 2, 0, 0, 0, 0, 0, 0, 0];
const ROT_STIFFNESS = [1, 2, -2, 0, 0, 0, 0, -1, 0];
const FORCE_PER_VOLUME = [1, -2, -2, 0, 0, 0, 0, 0, 0];
const FREQUENCY = [0, 0, -1, 0, 0, 0, 0, 0, 0];
const SPEED = [0, 1, -1, 0, 0, 0, 0, 0, 0];
const TIME = [0, 0, 1, 0, 0, 0, 0, 0, 0];
const ANGLE = [0, 0, 0, 0, 0, 0, 0, 1, 0];
const NONE = [0, 0, 0, 0, 0, 0, 0, 0, 0];

export const DIMENSIONS: Readonly<Record<Dimension, DimensionInfo>> = {
  length: { noun: 'a length', exponents: L, examples: { si: '610 mm', us: '24 in' }, units: { si: ['mm', 'm'], us: ['in', 'ft'] } },
  mass: { noun: 'a mass', exponents: M, examples: { si: '250 kg', us: '550 lb' }, units: { si: ['kg', 't'], us: ['lb'] } },
  density: { noun: 'a density', exponents: DENSITY, examples: { si: '1025 kg/m^3', us: '64 lb/ft^3' }, units: { si: ['kg/m^3'], us: ['lb/ft^3'] } },
  modulus: { noun: 'a modulus', exponents: PRESSURE, examples: { si: '210 GPa', us: '29000 ksi' }, units: { si: ['GPa'], us: ['ksi'] } },
  force: { noun: 'a force', exponents: FORCE, examples: { si: '500 kN', us: '110 kip' }, units: { si: ['kN'], us: ['kip'] } },
  'rotary-inertia': {
    noun: 'a rotary inertia',
    exponents: INERTIA,
    examples: { si: '2000 kg m^2', us: '47000 lb ft^2' },
    units: { si: ['kg m^2', 't m^2'], us: ['lb ft^2'] },
  },
  'rotational-stiffness': {
    noun: 'a rotational stiffness',
    exponents: ROT_STIFFNESS,
    examples: { si: '50 kN m/rad', us: '37000 lbf ft/rad' },
    units: { si: ['kN m/rad'], us: ['lbf ft/rad'] },
    angleOptional: true,
  },
  'soil-modulus': { noun: 'a soil spring modulus', exponents: PRESSURE, examples: { si: '5 MN/m^2', us: '725 psi' }, units: { si: ['MN/m^2'], us: ['psi'] } },
  'soil-modulus-gradient': {
    noun: 'a soil modulus gradient',
    exponents: FORCE_PER_VOLUME,
    examples: { si: '4.4 MN/m^3', us: '16 pci' },
    units: { si: ['MN/m^3'], us: ['pci'] },
  },
  frequency: { noun: 'a frequency', exponents: FREQUENCY, examples: { si: '12 Hz', us: '720 rpm' }, units: { si: ['Hz', 'rpm'], us: ['Hz', 'rpm'] } },
  speed: { noun: 'a speed', exponents: SPEED, examples: { si: '1.5 m/s', us: '3 knot' }, units: { si: ['m/s'], us: ['ft/s', 'knot'] } },
  pressure: { noun: 'a pressure', exponents: PRESSURE, examples: { si: '100 bar', us: '1450 psi' }, units: { si: ['bar', 'MPa'], us: ['psi'] } },
  'flow-rate': { noun: 'a volume flow rate', exponents: [0, 3, -1, 0, 0, 0, 0, 0, 0], examples: { si: '50 m^3/h', us: '220 gal/min' }, units: { si: ['m^3/h'], us: ['gal/min'] } },
  time: { noun: 'a time', exponents: TIME, examples: { si: '8 s', us: '8 s' }, units: { si: ['s'], us: ['s'] } },
  angle: { noun: 'an angle', exponents: ANGLE, examples: { si: '30 deg', us: '30 deg' }, units: { si: ['deg'], us: ['deg'] } },
  ratio: { noun: 'a ratio', exponents: NONE, examples: { si: '20 %', us: '20 %' }, units: { si: ['%', ''], us: ['%', ''] } },
};

/** Names for what was typed when it is not what was expected (first match wins). */
const NOUNS: readonly (readonly [readonly number[], string])[] = [
  [L, 'a length'],
  [[0, 2, 0, 0, 0, 0, 0, 0, 0], 'an area'],
  [[0, 3, 0, 0, 0, 0, 0, 0, 0], 'a volume'],
  [M, 'a mass'],
  [DENSITY, 'a density'],
  [[1, -1, 0, 0, 0, 0, 0, 0, 0], 'a mass per length'],
  [PRESSURE, 'a pressure, stress or modulus'],
  [FORCE, 'a force'],
  [[1, 0, -2, 0, 0, 0, 0, 0, 0], 'a stiffness (force per length)'],
  [[1, 2, -2, 0, 0, 0, 0, 0, 0], 'a moment or energy'],
  [ROT_STIFFNESS, 'a rotational stiffness'],
  [INERTIA, 'a rotary inertia'],
  [FORCE_PER_VOLUME, 'a force per volume'],
  [FREQUENCY, 'a frequency'],
  [TIME, 'a time'],
  [SPEED, 'a speed'],
  [[0, 0, -1, 0, 0, 0, 0, 1, 0], 'an angular speed'],
  [ANGLE, 'an angle'],
  [NONE, 'a plain number'],
];

function same(a: readonly number[], b: readonly number[], skip = -1): boolean {
  for (let i = 0; i < a.length; i++) if (i !== skip && (a[i] ?? 0) !== (b[i] ?? 0)) return false;
  return true;
}

/** Index of the angle exponent in mathjs's order. */
const ANGLE_INDEX = 7;

/** Does a unit with these exponents measure the given dimension? */
export function matchesDimension(exponents: readonly number[], dimension: Dimension): boolean {
  const info = DIMENSIONS[dimension];
  if (info.angleOptional) {
    const a = exponents[ANGLE_INDEX] ?? 0;
    return (a === 0 || a === info.exponents[ANGLE_INDEX]) && same(exponents, info.exponents, ANGLE_INDEX);
  }
  return same(exponents, info.exponents);
}

/** "a mass", or "a quantity of another kind" when the exponents match nothing we name. */
export function describeExponents(exponents: readonly number[]): string {
  for (const [e, noun] of NOUNS) if (same(exponents, e)) return noun;
  return 'a quantity of another kind';
}
