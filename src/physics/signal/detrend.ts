/**
 * Removes the least-squares straight line from a signal, in place. On an accelerometer this takes out the mean,
 * which is gravity's share on that axis (and the sensor's offset), and a slow drift such as a hand slowly tilting a
 * tablet (classical linear detrending). What is left oscillates about zero.
 */
export function removeLinearTrendInPlace(x: Float64Array): void {
  const n = x.length;
  if (n < 2) {
    if (n === 1) x[0] = 0;
    return;
  }
  // Fit x ≈ a + b·(i - c) with c the mean index, so the two unknowns decouple.
  const c = (n - 1) / 2;
  let sx = 0;
  let sxi = 0;
  let sii = 0;
  for (let i = 0; i < n; i++) {
    const d = i - c;
    sx += x[i];
    sxi += x[i] * d;
    sii += d * d;
  }
  const a = sx / n;
  const b = sxi / sii;
  for (let i = 0; i < n; i++) x[i] -= a + b * (i - c);
}
