/**
 * Sign and scale of a mode shape for reporting. An eigenvector's sign is arbitrary, so a convention fixes it:
 * the shape is scaled to a largest |value| of 1, and its peak is made positive. Where two entries are
 * equal and opposite peaks (a symmetric member's antisymmetric mode, a square plate's mode), rounding decides
 * which one is a hair larger, and any change in rounding would flip the reported shape. So the peak that
 * sets the sign is the FIRST entry (lowest index) within a relative `SHAPE_PEAK_TIE` of the largest |value|:
 * entries that close count as equal. Common practice, no source.
 */

/**
 * Relative tolerance within which two |values| count as the same peak: well above the error of a computed
 * eigenvector (about 1e-9 relative for the Lanczos pairs at their default tolerance; far smaller for the
 * dense solvers) and far below any difference a reader could see.
 */
export const SHAPE_PEAK_TIE = 1e-6;

/**
 * The scale that normalises `values` by the rule above: divide by it to get a shape whose largest |value|
 * is exactly 1 and whose first peak is +1 (up to the tie tolerance). Its magnitude is the largest |value|;
 * 0 when every value is 0 (nothing to normalise).
 */
export function signedPeak(values: ArrayLike<number>, count = values.length): number {
  let peak = 0;
  for (let i = 0; i < count; i++) {
    const a = Math.abs(values[i]);
    if (a > peak) peak = a;
  }
  if (!(peak > 0)) return 0;
  const floor = peak * (1 - SHAPE_PEAK_TIE);
  for (let i = 0; i < count; i++) if (Math.abs(values[i]) >= floor) return values[i] < 0 ? -peak : peak;
  return peak;
}
