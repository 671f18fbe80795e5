/** Result of timing one workload. */
export type Timing = { median: number; best: number; rounds: number };

/**
 * Times a synchronous or asynchronous workload: a warm-up run, then `rounds` timed runs.
 * Returns milliseconds (median and best).
 */
export async function measure(work: () => unknown, rounds = 5): Promise<Timing> {
  await work(); // warm-up: lets the JIT (or libvips) settle
  const times: number[] = [];
  for (let k = 0; k < rounds; k++) {
    const start = performance.now();
    await work();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(times.length / 2)], best: times[0], rounds };
}
