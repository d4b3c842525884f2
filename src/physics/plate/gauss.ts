/**
 * Gauss–Legendre quadrature and Legendre polynomials with their first two derivatives
 * (classical; M. Abramowitz & I.A. Stegun, Handbook of Mathematical Functions, §22.7 recurrence and §25.4.29).
 */

/** Nodes and weights on [-1, 1]: exact for polynomials of degree up to 2n − 1. */
export interface GaussRule {
  x: Float64Array;
  w: Float64Array;
}

const cache = new Map<number, GaussRule>();

/** n-point Gauss–Legendre rule on [-1, 1] (Newton on P_n from Chebyshev starting points; cached). */
export function gaussLegendre(n: number): GaussRule {
  const hit = cache.get(n);
  if (hit) return hit;
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = z;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? z : p1;
      const pm = n === 1 ? 1 : p0;
      dp = (n * (z * pn - pm)) / (z * z - 1);
      const dz = pn / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-15) break;
    }
    x[n - 1 - i] = z;
    w[n - 1 - i] = 2 / ((1 - z * z) * dp * dp);
  }
  const rule = { x, w };
  cache.set(n, rule);
  return rule;
}

/**
 * Legendre P_0 … P_{count−1} at ξ with first and second derivatives, written into p, dp, d2p.
 * Derivatives by differentiating the three-term recurrence (k+1)P_{k+1} = (2k+1)ξP_k − kP_{k−1}.
 */
export function legendreInto(xi: number, count: number, p: Float64Array, dp: Float64Array, d2p: Float64Array): void {
  p[0] = 1;
  dp[0] = 0;
  d2p[0] = 0;
  if (count === 1) return;
  p[1] = xi;
  dp[1] = 1;
  d2p[1] = 0;
  for (let k = 1; k + 1 < count; k++) {
    const a = (2 * k + 1) / (k + 1);
    const b = k / (k + 1);
    p[k + 1] = a * xi * p[k] - b * p[k - 1];
    dp[k + 1] = a * (p[k] + xi * dp[k]) - b * dp[k - 1];
    d2p[k + 1] = a * (2 * dp[k] + xi * d2p[k]) - b * d2p[k - 1];
  }
}
