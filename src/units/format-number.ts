/**
 * Plain number formatting, apart from the unit reader so code that only prints numbers (the section command) does
 * not load mathjs.
 */

/** A number to `digits` significant figures, without trailing zeros or a negative zero: 304.8 → "305". */
export function formatNumber(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return String(x);
  const v = Number(x.toPrecision(Math.min(21, Math.max(1, Math.round(digits)))));
  return String(v === 0 ? 0 : v);
}
