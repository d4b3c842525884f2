/**
 * A small seeded pseudo-random generator (mulberry32, a public-domain 32-bit mixer): uniform in [0, 1).
 * Used where the numbers must repeat run to run: Lanczos start vectors, test systems, benchmark inputs.
 */
export function seededUniform01(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
