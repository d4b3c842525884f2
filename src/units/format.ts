/**
 * Showing SI values in a chosen unit: for reading (`formatQuantity`, a few significant figures, pretty unit
 * label) and for putting back into an input (`formatForEntry`, as few figures as keep the value to one part
 * in a million, so toggling SI/US and back returns the text first typed for values of up to five figures:
 * the first step moves the value by at most 1e-6 of itself, less than half a unit in the fifth figure, so the
 * second step rounds back to the same five figures).
 */
import { DIMENSIONS, type Dimension, type UnitSystem } from './dimensions';
import { evaluateText, isUnit } from './math';
import { formatNumber } from './format-number';

const factors = new Map<string, number>([
  ['', 1],
  ['%', 0.01],
]);

/** SI value of one of `unit` ('' = 1, '%' = 0.01). Throws for a unit that mathjs cannot read (a programming error). */
export function unitFactor(unit: string): number {
  let f = factors.get(unit);
  if (f === undefined) {
    const u = evaluateText(`1 ${unit}`);
    if (!isUnit(u) || u.value === null) throw new RangeError(`unit must be a unit mathjs can read, got ${JSON.stringify(unit)}`);
    f = u.value;
    factors.set(unit, f);
  }
  return f;
}

/**
 * Pretty label of a unit as typed: `kg/m^3` → `kg/m³`, `kN m/rad` → `kN·m/rad`, `knot` → `kn` (the knot's
 * symbol on charts and in sailing directions; the reader also takes `kt`, `kts` and `knot`).
 */
export function unitLabel(unit: string): string {
  if (unit === 'knot') return 'kn';
  return unit.replace(/\^2/g, '²').replace(/\^3/g, '³').replace(/ (?=[A-Za-z])/g, '·');
}

export { formatNumber };

/** `formatQuantity(0.305, 'mm')` → "305 mm"; `formatQuantity(7850, 'kg/m^3')` → "7850 kg/m³". */
export function formatQuantity(valueSI: number, unit: string, digits = 4): string {
  const n = formatNumber(valueSI / unitFactor(unit), digits);
  return unit === '' ? n : `${n} ${unitLabel(unit)}`;
}

/** Relative error allowed when writing a value back into an input. */
export const ENTRY_RELATIVE_TOLERANCE = 1e-6;

/** The shortest plain number in `unit` within one part in a million of the value: 0.61 m in inches → "24.01575". */
export function formatForEntry(valueSI: number, unit: string): string {
  const x = valueSI / unitFactor(unit);
  if (!Number.isFinite(x) || x === 0) return formatNumber(x);
  for (let d = 1; d <= 17; d++) {
    const s = formatNumber(x, d);
    if (Math.abs(Number(s) - x) <= ENTRY_RELATIVE_TOLERANCE * Math.abs(x)) return s;
  }
  return String(x);
}

/** The usual display unit of a dimension in a unit system. */
export function defaultUnit(dimension: Dimension, system: UnitSystem): string {
  return DIMENSIONS[dimension].units[system][0];
}
