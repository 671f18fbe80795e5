/**
 * Reusable working arrays for the per-pixel passes. A photo's measurement used to allocate
 * about as many megabytes of typed arrays as its raster, and each backing store counts as
 * external memory for V8, which then ran a full mark-compact for nearly every photo (tens of
 * ms on the main thread, and concurrent marking on the other core). Measurement is
 * synchronous, so one array per purpose, grown when needed, is enough; a caller must be done
 * with a scratch array before asking for the same one again.
 */
const pools = new Map<string, Float64Array>();

/** A Float64Array of length n (contents undefined) that stays this purpose's until the next
 * call with the same name. */
export function scratchF64(name: string, n: number): Float64Array {
  let a = pools.get(name);
  if (!a || a.length < n) {
    a = new Float64Array(Math.max(n, Math.ceil(1.25 * (a?.length ?? 0))));
    pools.set(name, a);
  }
  return a.subarray(0, n);
}
