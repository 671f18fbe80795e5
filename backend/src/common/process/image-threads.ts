import os from 'node:os';
import sharp from 'sharp';

/**
 * Sets how many threads libvips gives one image operation (`IMAGE_THREADS`). Photos are worked
 * one per process per core, so by default each operation keeps to one thread: more only compete
 * with the other processes' photos for the same cores.
 *
 * @param threads - from the storage config; 0 means one per core (libvips' own default)
 * @returns the number now in use
 */
export function applyImageThreads(threads: number): number {
  return sharp.concurrency(threads === 0 ? os.availableParallelism() : threads);
}
