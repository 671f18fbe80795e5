/**
 * The score a reading keeps at exactly its pass limit. Mixmark's choice (docs/grading.md):
 * 70 reads as "passed, with room to improve" on a 0–100 scale.
 */
export const passScore = 70;

const decay = Math.log(100 / passScore);

/**
 * Mixmark's scoring curve: 100·(0.7)^((x/limit)²), a half-bell that is flat near zero
 * (a miss below the threshold of notice costs almost nothing), passes through 70 at the
 * limit and falls to about 24 at twice the limit and 4 at three times. Unrounded.
 *
 * @param miss - the size of the miss (ΔE00, an L* error …), ≥ 0
 * @param limit - the pass limit in the same unit, > 0
 * @returns a score 0–100
 * @example
 * scoreFromMiss(0, 3); // 100
 * scoreFromMiss(3, 3); // 70
 */
export function scoreFromMiss(miss: number, limit: number): number {
  const ratio = Math.abs(miss) / limit;
  return 100 * Math.exp(-decay * ratio * ratio);
}
