import { expect } from 'vitest';

export interface CloseOptions {
  /** Relative tolerance; the reason for its size belongs in a comment at the call. */
  rtol?: number;
  /** Absolute tolerance, for values near zero. */
  atol?: number;
  /** What is being checked, printed on failure. */
  label: string;
}

/**
 * Asserts |actual - expected| <= max(atol, rtol·|expected|), and on failure prints
 * the label, both values, the difference and the tolerance used.
 */
export function expectClose(actual: number, expected: number, { rtol = 0, atol = 0, label }: CloseOptions): void {
  const diff = Math.abs(actual - expected);
  const tol = Math.max(atol, rtol * Math.abs(expected));
  const ok = Number.isFinite(actual) && diff <= tol;
  if (!ok) {
    const rel = expected !== 0 ? diff / Math.abs(expected) : Infinity;
    expect.fail(
      `${label}: actual ${actual}, expected ${expected}, difference ${diff.toExponential(3)} ` +
        `(relative ${rel.toExponential(3)}), tolerance ${tol.toExponential(3)} (rtol ${rtol}, atol ${atol})`,
    );
  }
}
