import { scratchF64 } from './scratch';

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

/**
 * The same trimmed mean of 8-bit codes mapped through a monotone table (e.g. the sRGB
 * decode), from a 256-bin histogram instead of a sort: the order of the values is the order
 * of the codes, so the kept values are the same ones.
 *
 * @param codes - interleaved codes
 * @param channel - offset of the channel read
 * @param stride - codes per sample
 * @param table - code → value, non-decreasing
 * @param trim - fraction cut from each end (default 0.1)
 * @returns the trimmed mean of table[code] (NaN for no values)
 */
export function trimmedMeanOfCodes(
  codes: Uint8Array,
  channel: number,
  stride: number,
  table: ArrayLike<number>,
  trim = 0.1,
): number {
  const counts = new Int32Array(256);
  const n = Math.floor(codes.length / stride);
  for (let k = channel; k < codes.length; k += stride) counts[codes[k]]++;
  const cut = Math.floor(n * trim);
  const end = n - cut;
  let sum = 0;
  let position = 0;
  for (let c = 0; c < 256 && position < end; c++) {
    const next = position + counts[c];
    const kept = Math.min(next, end) - Math.max(position, cut);
    if (kept > 0) sum += kept * table[c];
    position = next;
  }
  return sum / (n - 2 * cut);
}

/** Moves the k-th smallest value of a[lo..hi] to a[k], smaller ones before it and larger
 * ones after (Hoare's selection with the median of three as pivot; deterministic). */
function select(a: Float64Array, k: number, lo: number, hi: number): void {
  while (hi > lo) {
    const mid = (lo + hi) >> 1;
    // Median of three to a[mid].
    if (a[mid] < a[lo]) swap(a, mid, lo);
    if (a[hi] < a[lo]) swap(a, hi, lo);
    if (a[hi] < a[mid]) swap(a, hi, mid);
    const pivot = a[mid];
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        swap(a, i, j);
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i];
  a[i] = a[j];
  a[j] = t;
}

/**
 * Several q-quantiles (0..1) of the same values, by linear interpolation between order
 * statistics (as `quantile`), found by selection in linear time rather than by a sort.
 *
 * @param values - the values (not modified)
 * @param qs - the quantiles wanted
 * @returns one value per q (NaN for no values)
 */
export function quantiles(values: ArrayLike<number>, qs: number[]): number[] {
  const n = values.length;
  if (n === 0) return qs.map(() => NaN);
  const a = scratchF64('select', n);
  for (let k = 0; k < n; k++) a[k] = values[k];
  return qs.map((q) => {
    const pos = q * (n - 1);
    const i = Math.floor(pos);
    select(a, i, 0, n - 1);
    const at = a[i];
    if (i + 1 >= n) return at;
    // Everything after a[i] is at least a[i]: the next order statistic is their minimum.
    let next = Infinity;
    for (let k = i + 1; k < n; k++) if (a[k] < next) next = a[k];
    return at + (next - at) * (pos - i);
  });
}

/** The q-quantile (0..1) of values, by linear interpolation between order statistics. */
export function quantile(values: ArrayLike<number>, q: number): number {
  return quantiles(values, [q])[0];
}

/** The k-th smallest (0-based) of values, by selection (the values are not modified). */
export function kthSmallest(values: ArrayLike<number>, k: number): number {
  const a = scratchF64('select', values.length);
  for (let i = 0; i < values.length; i++) a[i] = values[i];
  select(a, k, 0, a.length - 1);
  return a[k];
}
