import type { Lab, PixelRect, Raster8, RGB } from '../../types/colour.js';
import { xyzToLab } from '../lab/convert-xyz-to-lab.js';
import { linearSrgbToXyz } from '../xyz/convert-linear-srgb-to-xyz.js';
import { srgb8ToLinearLut } from './srgb8-linear-lut.js';

/** The whole raster when no rectangle is given; the caller keeps rectangles inside it. */
export const fullRect = (raster: Raster8): PixelRect => ({
  x: 0,
  y: 0,
  width: raster.width,
  height: raster.height,
});

/**
 * The mean colour of a region in linear light. Averaging must happen in linear light
 * (light adds linearly; averaging encoded values darkens a mottled swatch), so each
 * code value is decoded through the 256-entry table rather than a power function.
 *
 * @param raster - 8-bit sRGB pixels (RGB or RGBA)
 * @param rect - the region (default: the whole raster)
 * @returns the mean linear-light RGB
 * @example
 * regionMeanLinear({ data: Uint8Array.of(255, 0, 0, 0, 0, 0), width: 2, height: 1, channels: 3 });
 * // { r: 0.5, g: 0, b: 0 }
 */
export function regionMeanLinear(raster: Raster8, rect: PixelRect = fullRect(raster)): RGB {
  const { data, width, channels } = raster;
  const lut = srgb8ToLinearLut;
  // Two pixels per turn into two sets of sums: independent additions keep the CPU busy
  // (about 300 M px/s on one core here, against ~170 M for counting code values).
  let r0 = 0;
  let g0 = 0;
  let b0 = 0;
  let r1 = 0;
  let g1 = 0;
  let b1 = 0;
  const pair = 2 * channels;
  for (let y = rect.y; y < rect.y + rect.height; y++) {
    let i = (y * width + rect.x) * channels;
    const end = i + rect.width * channels;
    for (; i + pair <= end; i += pair) {
      const j = i + channels;
      r0 += lut[data[i]];
      g0 += lut[data[i + 1]];
      b0 += lut[data[i + 2]];
      r1 += lut[data[j]];
      g1 += lut[data[j + 1]];
      b1 += lut[data[j + 2]];
    }
    if (i < end) {
      r0 += lut[data[i]];
      g0 += lut[data[i + 1]];
      b0 += lut[data[i + 2]];
    }
  }
  const n = rect.width * rect.height;
  return n === 0 ? { r: 0, g: 0, b: 0 } : { r: (r0 + r1) / n, g: (g0 + g1) / n, b: (b0 + b1) / n };
}

/**
 * The CIELAB (D65) of a region's linear-light mean: what the grading reads for a window.
 *
 * @param raster - 8-bit sRGB pixels (already colour-corrected)
 * @param rect - the region (default: the whole raster)
 * @returns Lab of the mean colour
 * @example
 * regionMeanLab(raster, { x: 10, y: 10, width: 100, height: 40 });
 */
export function regionMeanLab(raster: Raster8, rect?: PixelRect): Lab {
  return xyzToLab(linearSrgbToXyz(regionMeanLinear(raster, rect)));
}
