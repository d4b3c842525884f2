/**
 * The echo beside a quantity field: the value understood, in the other system and in that field's own unit
 * there ("9.5 m" → "= 31.17 ft" on a field shown in m/ft, "610 mm" → "= 24.02 in" on one shown in mm/in).
 * Currents echo in knots and knots in m/s, since a current is read off a chart in knots whatever the system.
 * One rule for the Member screen and the tests; the field says which units it is shown in.
 */
import { DIMENSIONS, type Dimension } from './dimensions';
import { formatQuantity } from './format';

/** Trade marks after a number and the unit each stands for ("24\"" inches, "6'" feet, "1.5 kt" knots). */
const MARKS: Readonly<Record<string, string>> = { '"': 'in', "'": 'ft', kt: 'knot', kts: 'knot', kn: 'knot', knots: 'knot' };

/**
 * The unit the text was typed in: its last unit word or mark, so a sum such as `2' 6"` (no one unit) says
 * which system it was typed in by its last part; `fallback` (the field's shown unit) for a bare number.
 */
export function unitTypedIn(text: string, fallback: string): string {
  // The last unit expression: words joined by '/', '^n' or single spaces ("kg/m^3", "kN m/rad", "in" of "2 ft 6 in").
  const unit = /([A-Za-z"'][A-Za-z"'/^0-9]*(?:\s[A-Za-z][A-Za-z/^0-9]*)*)\s*$/.exec(text)?.[1];
  if (unit === undefined || /^[eE][+-]?\d+$/.test(unit)) return fallback; // "3e5" is a number, not a unit
  return MARKS[unit] ?? unit;
}

/** SI units a field may be typed in without being one of its display units ("61 cm" on a mm/in field). */
const SI_WORDS = /^(?:m|mm|cm|km|g|kg|t|N|kN|MN|Pa|kPa|MPa|GPa|bar)$/;

/** A field's display units in each system (`QuantityField.units`). */
export interface FieldUnits {
  si: string;
  us: string;
}

/**
 * "= 0.7717 m/s" for a current typed `1.5 kt`; "= 24.02 in" for `610 mm` on a mm/in field. Empty where the
 * field reads the same in both systems (times, angles, ratios, frequencies) or the value is not finite.
 */
export function echoQuantity(valueSI: number, dimension: Dimension, typedUnit: string, field: FieldUnits): string {
  const si = field.si;
  const us = dimension === 'speed' ? 'knot' : field.us;
  if (si === us || si === '' || us === '' || !Number.isFinite(valueSI)) return '';
  const typedIsSi = typedUnit === si || DIMENSIONS[dimension].units.si.includes(typedUnit) || SI_WORDS.test(typedUnit);
  return `= ${formatQuantity(valueSI, typedIsSi ? us : si)}`;
}
