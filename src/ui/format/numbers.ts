/**
 * Number formatting for results: significant figures, not fixed decimals, because frequencies run from
 * 0.05 Hz (a tall pile) to 500 Hz (a short stem) on the same screens.
 */

const MINUS = '\u2212';

/** `sig` significant figures, plain notation between 1e-3 and 1e6, else scientific; "—" for non-finite. */
export function formatSig(value: number, sig = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  let text: string;
  if (abs >= 1e-3 && abs < 1e6) {
    const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(abs)));
    // Large values: round the integer part too (17438 -> 17400), so no figure claims more than `sig`.
    text = digits === 0 ? String(Number(abs.toPrecision(sig))) : abs.toFixed(Math.min(digits, 12));
    // toFixed can round up into one more integer digit (9.996 -> "10.00"): trim the extra decimal.
    if (digits > 0 && Number(text) >= 10 ** (Math.floor(Math.log10(abs)) + 1)) text = abs.toFixed(digits - 1);
  } else {
    text = abs.toExponential(sig - 1).replace('e+', 'e');
  }
  return value < 0 ? MINUS + text : text;
}

/** A ratio as a percentage with one decimal: 0.873 -> "87.3 %". */
export function formatPercent(ratio: number, decimals = 1): string {
  if (!Number.isFinite(ratio)) return '—';
  const text = (Math.abs(ratio) * 100).toFixed(decimals);
  return `${ratio < 0 ? MINUS : ''}${text} %`;
}

/** Frequency in Hz with three significant figures. */
export function formatHz(hz: number): string {
  return `${formatSig(hz, 3)} Hz`;
}

/** Period in seconds, from a frequency in Hz. */
export function formatPeriod(hz: number): string {
  return hz > 0 ? `${formatSig(1 / hz, 3)} s` : '—';
}
