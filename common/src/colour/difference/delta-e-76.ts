import type { Lab } from '../../types/colour.js';

/**
 * CIE 1976 colour difference ΔE*ab, the Euclidean distance in CIELAB (CIE 15:2004 §8.2.1.3).
 * Kept for comparison and for spreads; grading uses ΔE00.
 *
 * @param reference - first colour
 * @param sample - second colour
 * @returns ΔE*ab
 * @example
 * deltaE76({ L: 50, a: 0, b: 0 }, { L: 53, a: 4, b: 0 }); // 5
 */
export function deltaE76(reference: Lab, sample: Lab): number {
  const dL = sample.L - reference.L;
  const da = sample.a - reference.a;
  const db = sample.b - reference.b;
  return Math.sqrt(dL * dL + da * da + db * db);
}
