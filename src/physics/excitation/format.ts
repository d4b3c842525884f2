/** Number formatting for the plain-word reasons attached to each check (three significant figures). */
export function sig(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  return String(Number(x.toPrecision(digits)));
}
