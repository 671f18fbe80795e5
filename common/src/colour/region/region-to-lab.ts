import type { PixelRect, Raster8 } from '../../types/colour.js';
import { epsilon, kappa } from '../constants.js';
import { cubeRootUnit } from './cube-root-unit.js';
import { fullRect } from './region-mean.js';
import { xyzTables } from './xyz-tables.js';

const [xr, xg, xb, yr, yg, yb, zr, zg, zb] = xyzTables;
const lowSlope = kappa / 116;
const lowOffset = 16 / 116;

/**
 * Per-pixel CIELAB (D65) of a region, as packed L, a, b triples, for spreads and
 * profiles. Same formulas as `srgbToLab` (IEC 61966-2-1, CIE 15:2004 §8.2.1.1), with the
 * 8-bit decode through a lookup table and a table-seeded cube root (`cubeRootUnit`):
 * within 1e-8 of `srgbToLab` before rounding to the output type.
 *
 * @param raster - 8-bit sRGB pixels (RGB or RGBA)
 * @param rect - the region (default: the whole raster)
 * @param out - optional output, length ≥ 3 · pixels (Float32Array like libvips' Lab, or Float64Array)
 * @returns `out`, filled row by row
 * @example
 * regionToLab({ data: Uint8Array.of(128, 128, 128), width: 1, height: 1, channels: 3 });
 * // Float32Array [53.585…, 0, 0]
 */
export function regionToLab<T extends Float32Array | Float64Array = Float32Array>(
  raster: Raster8,
  rect: PixelRect = fullRect(raster),
  out?: T,
): T {
  const { data, width, channels } = raster;
  const result = (out ?? new Float32Array(rect.width * rect.height * 3)) as T;
  const rowLength = rect.width * channels;
  // Whole rows of a tightly packed region are one run; otherwise convert row by row.
  if (rect.x === 0 && rect.width === width) {
    const start = rect.y * width * channels;
    convertRun(data, start, start + rect.height * rowLength, channels, result, 0);
  } else {
    for (let y = 0; y < rect.height; y++) {
      const start = ((rect.y + y) * width + rect.x) * channels;
      convertRun(data, start, start + rowLength, channels, result, y * rect.width * 3);
    }
  }
  return result;
}

/**
 * The per-pixel kernel over one run of pixels (internal; kept small so V8 optimises it
 * whole). Writes packed Lab from `out[offset]` on.
 */
export function convertRun(
  data: Uint8Array | Uint8ClampedArray,
  start: number,
  end: number,
  stride: number,
  out: Float32Array | Float64Array,
  offset: number,
): void {
  let o = offset;
  for (let i = start; i < end; i += stride) {
    const r = data[i];
    const g = data[i + 1];
    const b = data[i + 2];
    const tx = xr[r] + xg[g] + xb[b];
    const ty = yr[r] + yg[g] + yb[b];
    const tz = zr[r] + zg[g] + zb[b];
    const fx = tx > epsilon ? cubeRootUnit(tx) : lowSlope * tx + lowOffset;
    const fy = ty > epsilon ? cubeRootUnit(ty) : lowSlope * ty + lowOffset;
    const fz = tz > epsilon ? cubeRootUnit(tz) : lowSlope * tz + lowOffset;
    out[o] = 116 * fy - 16;
    out[o + 1] = 500 * (fx - fy);
    out[o + 2] = 200 * (fy - fz);
    o += 3;
  }
}
