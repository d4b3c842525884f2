/**
 * Units the Results screen and the Report show numbers in, by the case's unit system, and the small
 * formatting steps they share (a quantity, a range, a signed margin). Values come in SI; conversion is
 * done by src/units so the factors are the same as in the forms.
 */
import type { UnitSystem } from '../../units';
import { formatNumber, formatQuantity, unitFactor, unitLabel } from '../../units';
import { formatSig } from '../format/numbers';

export interface DisplayUnits {
  /** Elevations and lengths along the member: m or ft. */
  length: string;
  /** Section sizes (D in shedding): mm or in. */
  size: string;
  massPerLength: string;
  speed: string;
  force: string;
  density: string;
  viscosity: string;
}

const UNITS: Readonly<Record<UnitSystem, DisplayUnits>> = {
  si: { length: 'm', size: 'mm', massPerLength: 'kg/m', speed: 'm/s', force: 'kN', density: 'kg/m^3', viscosity: 'm^2/s' },
  us: { length: 'ft', size: 'in', massPerLength: 'lb/ft', speed: 'ft/s', force: 'kip', density: 'lb/ft^3', viscosity: 'ft^2/s' },
};

export function displayUnits(system: UnitSystem): DisplayUnits {
  return UNITS[system];
}

/** Speed units as typed: "1.5 kt", "3 knots", "0.8 m/s", "2 ft/s" (the last word of the entry). */
const TYPED_SPEED: readonly (readonly [RegExp, string])[] = [
  [/\d\s*(?:kts?|knots?|kn)\s*$/i, 'knot'],
  [/\d\s*m\/s\s*$/, 'm/s'],
  [/\d\s*ft\/s\s*$/, 'ft/s'],
];

/**
 * The units results follow for a case: the system's, except speeds, which follow the unit the currents and flow
 * speeds were typed in when they all name the same one (critical currents in knots when the current was typed
 * in knots). `speedTexts` are the case's speed entries as typed.
 */
export function displayUnitsAsTyped(system: UnitSystem, speedTexts: readonly string[]): DisplayUnits {
  const named = new Set<string>();
  for (const t of speedTexts) {
    const hit = TYPED_SPEED.find(([re]) => re.test(t.trim()));
    if (hit) named.add(hit[1]);
  }
  return named.size === 1 ? { ...UNITS[system], speed: [...named][0] } : UNITS[system];
}

/** Significant figures of elevations: four, so that 15.87 m and 16.07 m stay apart. */
export const Z_DIGITS = 4;
/** Significant figures of everything else shown (masses per metre, speeds, ratios). */
export const SIG = 3;

/** A quantity in a display unit with `digits` significant figures: "258 kg/m", "—" for non-finite. */
export function qty(valueSI: number, unit: string, digits = SIG): string {
  return Number.isFinite(valueSI) ? formatQuantity(valueSI, unit, digits) : '—';
}

/** A value in a unit without the unit (for table cells whose header carries it): 258.3 kg/m → "258". */
export function plain(valueSI: number, unit: string, digits = SIG): string {
  return Number.isFinite(valueSI) ? formatNumber(valueSI / unitFactor(unit), digits) : '—';
}

/** A unit as shown in a table header: "kg/m", "ft", "lb/ft". */
export function unitText(unit: string): string {
  return unitLabel(unit);
}

/** An elevation along the member in the length unit: "15.87 m". */
export function zText(zM: number, units: DisplayUnits): string {
  return qty(zM, units.length, Z_DIGITS);
}

/** A range of SI values in one unit: "4.572–15.87 m" (without the unit when `withUnit` is false). */
export function rangeText(fromSI: number, toSI: number, unit: string, digits = Z_DIGITS, withUnit = true): string {
  const text = `${plain(fromSI, unit, digits)}–${plain(toSI, unit, digits)}`;
  return withUnit ? `${text} ${unitLabel(unit)}` : text;
}

/** A signed margin in per cent with three significant figures: "+38.1 %", "−54.0 %", "0 %"; null → "—". */
export function marginText(marginPercent: number | null): string {
  if (marginPercent === null || !Number.isFinite(marginPercent)) return '—';
  if (marginPercent === 0) return '0 %';
  const sign = marginPercent > 0 ? '+' : '\u2212';
  const abs = Math.abs(marginPercent);
  // Three significant figures in plain digits for large margins: 35866 % → "35900 %" (formatSig would turn
  // a margin of a million per cent or more into exponent notation).
  return `${sign}${abs >= 1000 ? formatNumber(abs, SIG) : formatSig(abs, SIG)} %`;
}

/** A fraction as a per cent without trailing zeros, for limits as people state them: 0.2 → "20 %", 0.005 → "0.5 %". */
export function pct(fraction: number, digits = SIG): string {
  return Number.isFinite(fraction) ? `${formatNumber(fraction * 100, digits)} %` : '—';
}

/** Text as a sentence: a full stop added unless it already ends with one (sources often do). */
export function sentence(text: string): string {
  const t = text.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

/** A small quantity in scientific notation with its unit: kinematic viscosity 1.19e-6 m²/s. */
export function sci(valueSI: number, unit: string, digits = SIG): string {
  return Number.isFinite(valueSI) ? `${formatSig(valueSI / unitFactor(unit), digits)} ${unitLabel(unit)}` : '—';
}

/** A plain number with three significant figures (ratios, V_R, K_S, Ca). */
export function num(x: number | null | undefined, digits = SIG): string {
  return x === null || x === undefined ? '—' : formatSig(x, digits);
}
