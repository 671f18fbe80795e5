import type { PixelRect, Raster8 } from '../../types/colour.js';
import { lightnessFromY } from '../lab/lightness.js';
import { fullRect } from './region-mean.js';
import { xyzTables } from './xyz-tables.js';

const [, , , yr, yg, yb] = xyzTables;

/** Options for `lightnessProfile`. */
export type LightnessProfileOptions = {
  /** Direction of the profile; 'auto' takes the region's long side (default). */
  axis?: 'auto' | 'horizontal' | 'vertical';
  /** Number of slices (default: the long side in pixels, at most 64). */
  slices?: number;
};

/**
 * L* along a region's long axis: the region is cut into equal slices across that axis,
 * each slice's luminance averaged in linear light, then converted to L* (CIE 15:2004).
 * This is the profile a graded or flat wash is judged by.
 *
 * @param raster - 8-bit sRGB pixels (already colour-corrected)
 * @param rect - the region (default: the whole raster)
 * @param options - axis and number of slices
 * @returns L* per slice, from the left (or top) end
 * @example
 * lightnessProfile(raster, { x: 0, y: 0, width: 400, height: 60 }, { slices: 16 });
 */
export function lightnessProfile(
  raster: Raster8,
  rect: PixelRect = fullRect(raster),
  options: LightnessProfileOptions = {},
): number[] {
  const { data, width, channels } = raster;
  const axis = options.axis ?? 'auto';
  const horizontal = axis === 'horizontal' || (axis === 'auto' && rect.width >= rect.height);
  const length = horizontal ? rect.width : rect.height;
  const slices = Math.max(1, Math.min(options.slices ?? Math.min(length, 64), length));
  const sums = new Float64Array(slices);
  const counts = new Float64Array(slices);
  for (let y = 0; y < rect.height; y++) {
    let i = ((rect.y + y) * width + rect.x) * channels;
    for (let x = 0; x < rect.width; x++, i += channels) {
      const along = horizontal ? x : y;
      const slice = Math.floor((along * slices) / length);
      sums[slice] += yr[data[i]] + yg[data[i + 1]] + yb[data[i + 2]];
      counts[slice]++;
    }
  }
  return Array.from(sums, (sum, k) => lightnessFromY(sum / counts[k]));
}
