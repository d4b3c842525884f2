/**
 * Timoshenko shear coefficients from G.R. Cowper, "The shear coefficient in Timoshenko's beam theory",
 * J. Appl. Mech. 33 (1966) 335 (docs/sources.md §S1.7): hollow circle with m = d_i/D
 * κ = 6(1+ν)(1+m²)² / ((7+6ν)(1+m²)² + (20+12ν)m²) (solid circle at m = 0), rectangle κ = 10(1+ν)/(12+11ν).
 */
export function cowperCircle(nu: number, ratio: number): number {
  const q = (1 + ratio * ratio) ** 2;
  return (6 * (1 + nu) * q) / ((7 + 6 * nu) * q + (20 + 12 * nu) * ratio * ratio);
}

export function cowperRectangle(nu: number): number {
  return (10 * (1 + nu)) / (12 + 11 * nu);
}

export function lerp(a: number, b: number, t: number): number {
  return a + (b - a) * t;
}
