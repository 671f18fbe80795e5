import type { Lab, LabSpread, PixelRect, Raster8 } from '../../types/colour.js';
import { fullRect, regionMeanLab } from './region-mean.js';
import { convertRun } from './region-to-lab.js';

/** A window's colour as the grading reads it. */
export type RegionLabStats = {
  /** Lab of the linear-light mean (the colour the eye integrates). */
  mean: Lab;
  /** Standard deviations of per-pixel L*, a*, b* (population, n in the denominator). */
  spread: LabSpread;
  /** Number of pixels measured. */
  pixels: number;
};

/**
 * Mean colour and spread of a region: the mean in linear light, converted once, and the
 * per-pixel CIELAB standard deviations (a mottled or streaky wash has a large spread).
 * Works row by row, so it needs no full-size Lab buffer.
 *
 * @param raster - 8-bit sRGB pixels (already colour-corrected)
 * @param rect - the region (default: the whole raster)
 * @returns `{ mean, spread, pixels }`
 * @example
 * regionLabStats(raster, { x: 10, y: 10, width: 100, height: 40 }).spread.L;
 */
export function regionLabStats(
  raster: Raster8,
  rect: PixelRect = fullRect(raster),
): RegionLabStats {
  const { data, width, channels } = raster;
  const row = new Float64Array(rect.width * 3);
  const pixels = rect.width * rect.height;
  if (pixels === 0) return { mean: { L: 0, a: 0, b: 0 }, spread: { L: 0, a: 0, b: 0 }, pixels };
  // Sums of values shifted by the first pixel, so the variance does not cancel badly.
  convertRun(
    data,
    (rect.y * width + rect.x) * channels,
    (rect.y * width + rect.x + 1) * channels,
    channels,
    row,
    0,
  );
  const [kL, ka, kb] = [row[0], row[1], row[2]];
  let sL = 0;
  let sa = 0;
  let sb = 0;
  let qL = 0;
  let qa = 0;
  let qb = 0;
  for (let y = rect.y; y < rect.y + rect.height; y++) {
    const start = (y * width + rect.x) * channels;
    convertRun(data, start, start + rect.width * channels, channels, row, 0);
    for (let i = 0; i < row.length; i += 3) {
      const L = row[i] - kL;
      const a = row[i + 1] - ka;
      const b = row[i + 2] - kb;
      sL += L;
      sa += a;
      sb += b;
      qL += L * L;
      qa += a * a;
      qb += b * b;
    }
  }
  const sd = (s: number, q: number): number =>
    Math.sqrt(Math.max(0, q / pixels - (s / pixels) ** 2));
  return {
    mean: regionMeanLab(raster, rect),
    spread: { L: sd(sL, qL), a: sd(sa, qa), b: sd(sb, qb) },
    pixels,
  };
}
