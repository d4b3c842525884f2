/**
 * Reading quantities as people type them: `610 mm`, `24 in`, `2 ft + 6 in`, `2' 6"`, `7.85 t/m^3`, `210 GPa`,
 * `29000 ksi`, `5 t`, `1200 rpm`, `1.5 kt`. A bare number takes the field's shown unit. Results are SI values; failures are messages
 * in words that say what was expected and what was got.
 *
 * Decimal comma: accepted, because a tablet's decimal keypad shows a comma in many locales: `0,6 m` is 0.6 m.
 * Because a comma is also a thousands separator in other locales, a comma followed by exactly three digits
 * (`1,200`) is refused as ambiguous unless the whole part is 0 (`0,125`), and a number with both a comma and a
 * point (`1,200.5`) is refused. In list fields the comma separates items unless the text contains a semicolon,
 * in which case the semicolon separates them and commas are decimal commas (`3,5 m; 12 m`).
 */
import { DIMENSIONS, type Dimension, describeExponents, matchesDimension } from './dimensions';
import { unitFactor } from './format';
import { evaluateWithUnits, isUnit } from './math';
import { isUnitReaderPending } from './reader-pending';

export type QuantityResult = { ok: true; valueSI: number } | { ok: false; message: string };
export type QuantityListResult = { ok: true; valuesSI: number[] } | { ok: false; message: string };

export interface QuantityOptions {
  dimension: Dimension;
  /** The unit shown beside the field, taken by a bare number ('' = plain number, '%' = per cent). */
  unit: string;
}

function expected(dimension: Dimension): string {
  const d = DIMENSIONS[dimension];
  const ex = d.examples.si === d.examples.us ? d.examples.si : `${d.examples.si} or ${d.examples.us}`;
  return `${d.noun} such as ${ex}`;
}

type Normalised = { ok: true; text: string } | { ok: false; message: string };

/** Typographic characters a tablet or a copy-paste may bring, mapped to what the parser reads. */
const REPLACEMENTS: readonly (readonly [RegExp, string])[] = [
  [/[\u00a0\u2009\u202f]/g, ' '], // no-break and thin spaces
  [/\u2212/g, '-'], // minus sign
  [/[×·⋅]/g, ' * '],
  [/²/g, '^2'],
  [/³/g, '^3'],
  [/[µμ]/g, 'u'],
  [/°/g, ' deg'],
  [/[\u2032\u2019]/g, "'"], // prime and right single quote, as a phone keyboard types a foot mark
  [/[\u2033\u201d\u201c]/g, '"'], // double prime and curly quotes, for the inch mark
];

/**
 * Trade notation that mathjs would misread, rewritten before it reads the text. `kt`/`kts` is the mariner's
 * knot (mathjs would read kilotonne); `6'` and `24"` are feet and inches; `2' 6"` and `2 ft 6 in` are a sum
 * of feet and inches, as drawings and surveyors write them.
 */
const TRADE_NOTATION: readonly (readonly [RegExp, string])[] = [
  [/(\d)\s*kts?\b/g, '$1 knot'],
  [/(\d[\d.]*(?:e[+-]?\d+)?)\s*'/g, '$1 ft '],
  [/(\d[\d.]*(?:e[+-]?\d+)?)\s*"/g, '$1 in '],
  [/(\d[\d.]*\s*ft)\s+(?=\d[\d.]*\s*in\b)/g, '$1 + '],
];

/** Rewrites the trade notation (see TRADE_NOTATION) and trims what it leaves. */
function tradeNotation(text: string): string {
  let t = text;
  for (const [re, to] of TRADE_NOTATION) t = t.replace(re, to);
  return t.trim();
}

/** Applies the replacements and the decimal-comma rule (see the file comment). */
export function normaliseText(text: string): Normalised {
  let t = text.trim();
  for (const [re, to] of REPLACEMENTS) t = t.replace(re, to);
  t = tradeNotation(t);
  if (!/\d,\d/.test(t)) return { ok: true, text: t };
  if (/\d\.\d/.test(t)) return { ok: false, message: `"${text.trim()}" mixes a comma and a point: write the number without thousands separators, e.g. 1200.5` };
  const many = /\d+(?:,\d+){2,}/.exec(t);
  if (many) return { ok: false, message: `"${many[0]}" has more than one comma: write one number with a point for decimals` };
  let bad = '';
  t = t.replace(/(\d+),(\d+)/g, (all, whole: string, frac: string) => {
    if (frac.length === 3 && !/^0+$/.test(whole)) bad ||= all;
    return `${whole}.${frac}`;
  });
  if (bad) {
    const [w, f] = bad.split(',');
    return { ok: false, message: `"${bad}" is ambiguous: write ${w}${f} or ${w}.${f} (use a point for decimals, no thousands separators)` };
  }
  return { ok: true, text: t };
}

/** Turns a mathjs error into words. */
function explain(e: unknown, text: string, dimension: Dimension): string {
  const msg = e instanceof Error ? e.message : String(e);
  const sym = /Undefined symbol (\S+)/.exec(msg);
  if (sym) return `"${sym[1]}" is not a unit Wetmode knows; expected ${expected(dimension)}`;
  const fn = /(?:Undefined function|Function) (\w+)/.exec(msg);
  if (fn) return `"${fn[1]}" is not available here: type a number and a unit, such as ${DIMENSIONS[dimension].examples.si}`;
  if (/Units do not match/.test(msg)) return `"${text}" adds or subtracts quantities of different kinds; expected ${expected(dimension)}`;
  return `could not read "${text}"; expected ${expected(dimension)}`;
}

/**
 * Reads one quantity. Accepts arithmetic (`2 ft + 6 in`, `1/2 in`). A trailing `%` on a ratio field means per
 * cent whatever the field's shown unit.
 */
export function parseQuantity(text: string, { dimension, unit }: QuantityOptions): QuantityResult {
  const shown = text.trim();
  if (shown === '') return { ok: false, message: `enter ${expected(dimension)}` };
  const norm = normaliseText(shown);
  if (!norm.ok) return norm;
  let src = norm.text;
  let factor = unitFactor(unit);
  if (dimension === 'ratio' && /%\s*$/.test(src)) {
    src = src.replace(/%\s*$/, '');
    factor = 0.01;
  }
  if (src.includes('%')) return { ok: false, message: `"${shown}": put % only at the end of a ratio, such as 20 %` };
  let r: unknown;
  let namedUnits: boolean;
  try {
    ({ value: r, namedUnits } = evaluateWithUnits(src));
  } catch (e) {
    if (isUnitReaderPending(e)) throw e; // not an input error: the app loads the reader and reads again
    return { ok: false, message: explain(e, shown, dimension) };
  }
  let value: number;
  if (typeof r === 'number' && namedUnits) {
    // Units that cancel (5 mm/m): a plain ratio, right only for a ratio field.
    if (dimension !== 'ratio') return { ok: false, message: `expected ${expected(dimension)}, got a plain number (${shown})` };
    value = r;
  } else if (typeof r === 'number') {
    value = r * factor;
  } else if (isUnit(r)) {
    if (r.value === null) return { ok: false, message: `"${shown}" has no number; expected ${expected(dimension)}` };
    if (!matchesDimension(r.dimensions, dimension)) {
      const hint = dimension === 'length' && describeExponents(r.dimensions) === 'an area' ? ' (to add lengths write 2 ft + 6 in)' : '';
      return { ok: false, message: `expected ${expected(dimension)}, got ${describeExponents(r.dimensions)} (${shown})${hint}` };
    }
    // mathjs keeps a Unit's value in SI base units (radian for angles), so no further conversion is needed.
    value = r.value;
  } else {
    return { ok: false, message: `could not read "${shown}" as one value; expected ${expected(dimension)}` };
  }
  if (!Number.isFinite(value)) return { ok: false, message: `"${shown}" is not a finite number; expected ${expected(dimension)}` };
  return { ok: true, valueSI: value };
}

/** Splits a list as typed: on semicolons if there are any, else on commas (see the file comment). */
export function splitList(text: string): string[] {
  const sep = text.includes(';') ? ';' : ',';
  return text
    .split(sep)
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

/** Reads a list such as `3 m, 12 m, 21 m`; an empty text is an empty list. Messages name the item. */
export function parseQuantityList(text: string, options: QuantityOptions): QuantityListResult {
  const items = splitList(text);
  const values: number[] = [];
  for (let i = 0; i < items.length; i++) {
    const r = parseQuantity(items[i], options);
    if (!r.ok) return { ok: false, message: items.length > 1 ? `item ${i + 1} ("${items[i]}"): ${r.message}` : r.message };
    values.push(r.valueSI);
  }
  return { ok: true, valuesSI: values };
}
