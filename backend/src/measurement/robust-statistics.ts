/**
 * Mean of the values between the `trim` and `1 − trim` quantiles (a trimmed mean, Tukey's
 * robust location estimate): paper grain, pigment granulation and a stray hair move it
 * little.
 *
 * @param values - the values (not modified)
 * @param trim - fraction cut from each end (default 0.1)
 * @returns the trimmed mean (NaN for no values)
 */
export function trimmedMean(values: ArrayLike<number>, trim = 0.1): number {
  const sorted = Float64Array.from(values).sort();
  const cut = Math.floor(sorted.length * trim);
  let sum = 0;
  for (let i = cut; i < sorted.length - cut; i++) sum += sorted[i];
  return sum / (sorted.length - 2 * cut);
}

/** The q-quantile (0..1) of values, by linear interpolation between order statistics. */
export function quantile(values: ArrayLike<number>, q: number): number {
  const sorted = Float64Array.from(values).sort();
  if (sorted.length === 0) return NaN;
  const pos = q * (sorted.length - 1);
  const i = Math.floor(pos);
  return i + 1 < sorted.length ? sorted[i] + (sorted[i + 1] - sorted[i]) * (pos - i) : sorted[i];
}
