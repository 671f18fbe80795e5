/** Mulberry32: a small deterministic PRNG for reproducible test scenes (common practice, no
 * standard; public-domain algorithm by Tommy Ettinger). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = imul(t ^ (t >>> 15), t | 1);
    t ^= t + imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const { sqrt, log, cos, max, imul, PI } = Math;

/** Standard normal deviate (Box–Muller). */
export function gaussian(random: () => number): number {
  const u = max(random(), 1e-12);
  return sqrt(-2 * log(u)) * cos(2 * PI * random());
}
