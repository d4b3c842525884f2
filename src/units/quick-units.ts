/**
 * The display units Wetmode offers, with their SI factors and dimensions, so that a plain entry such as
 * `610 mm`, `24 in` or `12` can be read, and a value shown, before the full unit reader (mathjs) has loaded.
 * This keeps mathjs off the first load of the app; anything else (`2 ft + 6 in`, `1/2 in`, an unknown unit)
 * waits for mathjs. test/units/quick-units.test.ts checks every factor and dimension against mathjs.
 *
 * Factors are the exact definitions — international foot 0.3048 m and pound 0.45359237 kg (international yard
 * and pound agreement, 1959), pound-force 4.4482216152605 N (pound × standard gravity 9.80665 m/s²), nautical
 * mile 1852 m — except the kip and the psi, taken as mathjs stores them (4448.2216 N, 6894.75729276459 Pa) so
 * that a value reads the same before and after mathjs has loaded, and the same as on the command line.
 */
import { DIMENSIONS, type Dimension } from './dimensions';

const FT = 0.3048;
const IN = 0.0254;
const LB = 0.45359237;
const LBF = 4.4482216152605;
const KIP = 4448.2216; // as mathjs stores it
const PSI = 6894.75729276459; // as mathjs stores it

/** SI factor of one of each unit, and the dimension whose exponents it carries. */
const TABLE: Readonly<Record<string, readonly [number, Dimension | readonly number[]]>> = {
  mm: [1e-3, 'length'],
  m: [1, 'length'],
  in: [IN, 'length'],
  ft: [FT, 'length'],
  kg: [1, 'mass'],
  g: [1e-3, 'mass'], // typed for small tip masses
  t: [1000, 'mass'],
  lb: [LB, 'mass'],
  'kg/m^3': [1, 'density'],
  'lb/ft^3': [LB / FT ** 3, 'density'],
  GPa: [1e9, 'modulus'],
  ksi: [1000 * PSI, 'modulus'],
  kN: [1000, 'force'],
  kip: [KIP, 'force'],
  'kg m^2': [1, 'rotary-inertia'],
  't m^2': [1000, 'rotary-inertia'],
  'lb ft^2': [LB * FT ** 2, 'rotary-inertia'],
  'kN m/rad': [1000, 'rotational-stiffness'],
  'lbf ft/rad': [LBF * FT, 'rotational-stiffness'],
  'MN/m^2': [1e6, 'soil-modulus'],
  psi: [PSI, 'soil-modulus'],
  'MN/m^3': [1e6, 'soil-modulus-gradient'],
  pci: [LBF / IN ** 3, 'soil-modulus-gradient'],
  bar: [1e5, 'pressure'],
  MPa: [1e6, 'pressure'],
  'm^3/h': [1 / 3600, 'flow-rate'],
  'gal/min': [0.003785411784 / 60, 'flow-rate'], // US gallon, 231 in³ exactly
  Hz: [1, 'frequency'],
  rpm: [1 / 60, 'frequency'],
  'm/s': [1, 'speed'],
  'ft/s': [FT, 'speed'],
  knot: [1852 / 3600, 'speed'],
  s: [1, 'time'],
  deg: [Math.PI / 180, 'angle'],
  // Shown on the Results screen and in the report.
  'kg/m': [1, [1, -1, 0, 0, 0, 0, 0, 0, 0]],
  'lb/ft': [LB / FT, [1, -1, 0, 0, 0, 0, 0, 0, 0]],
  'm^2/s': [1, [0, 2, -1, 0, 0, 0, 0, 0, 0]],
  'ft^2/s': [FT ** 2, [0, 2, -1, 0, 0, 0, 0, 0, 0]],
};

/** A quantity read without mathjs: its value in SI base units and its exponents in mathjs's order. */
export class QuickUnit {
  constructor(
    readonly value: number,
    readonly dimensions: readonly number[],
  ) {}
}

/** The units the quick reader knows. */
export const QUICK_UNITS: readonly string[] = Object.keys(TABLE);

function exponents(d: Dimension | readonly number[]): readonly number[] {
  return typeof d === 'string' ? DIMENSIONS[d].exponents : d;
}

// A plain decimal number (optionally signed, with an exponent) and what follows it.
const NUMBER_THEN_REST = /^([+-]?(?:\d+(?:\.\d+)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

/**
 * Reads `number` or `number unit` for a unit in the table (spaces between unit parts collapsed), as mathjs
 * would: a bare number stays a number, a number with a unit becomes its SI value. Null for anything else.
 */
export function quickEvaluate(text: string): { value: number | QuickUnit; namedUnits: boolean } | null {
  // A sum of quantities of one kind, as `2' 6"` and `2 ft 6 in` are rewritten to (`2 ft + 6 in`).
  if (text.includes('+', 1)) return quickSum(text.split(/\s\+\s/));
  return quickTerm(text);
}

function quickSum(parts: readonly string[]): { value: QuickUnit; namedUnits: boolean } | null {
  let total = 0;
  let dims: readonly number[] | null = null;
  for (const p of parts) {
    const q = quickTerm(p);
    if (!q || !(q.value instanceof QuickUnit)) return null; // a bare number in a sum: let mathjs say what is wrong
    if (dims && q.value.dimensions.some((e, i) => e !== dims![i])) return null;
    dims = q.value.dimensions;
    total += q.value.value;
  }
  return dims ? { value: new QuickUnit(total, dims), namedUnits: true } : null;
}

function quickTerm(text: string): { value: number | QuickUnit; namedUnits: boolean } | null {
  const m = NUMBER_THEN_REST.exec(text.trim());
  if (!m) return null;
  const n = Number(m[1]);
  const unit = m[2].replace(/\s+/g, ' ');
  if (unit === '') return { value: n, namedUnits: false };
  const entry = TABLE[unit];
  if (!entry) return null;
  return { value: new QuickUnit(n * entry[0], exponents(entry[1])), namedUnits: true };
}
