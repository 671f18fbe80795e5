import type { Raster8 } from '@mixmark/common';
import { applyHomography, type Homography } from './homography';
import { bilinearGreen } from './sample-card';

/**
 * Sharpness of the photo at a printed vertical edge (grey patch next to paper): the 10–90 %
 * rise distance of the green channel across the edge, in card millimetres, from a profile
 * averaged along the edge (ISO 12233's edge-based idea, much simplified: no slanted-edge
 * supersampling, since the question is only "sharp enough to sample?").
 *
 * @param raster - working raster
 * @param h - card mm → raster px
 * @param edgeX - the edge's x on the card (mm)
 * @param y0 - start of the edge (mm)
 * @param y1 - end of the edge (mm)
 * @returns the 10–90 % width in mm (Infinity when the edge has no contrast)
 */
export function edgeWidthMm(
  raster: Raster8,
  h: Homography,
  edgeX: number,
  y0: number,
  y1: number,
): number {
  const half = 3;
  const step = 0.05;
  const count = Math.round((2 * half) / step) + 1;
  const profile = new Float64Array(count);
  const lines = 12;
  for (let l = 0; l < lines; l++) {
    const y = y0 + ((l + 0.5) * (y1 - y0)) / lines;
    for (let i = 0; i < count; i++) {
      const p = applyHomography(h, edgeX - half + i * step, y);
      profile[i] += bilinearGreen(raster, p.x, p.y) / lines;
    }
  }
  const edge = Math.floor(count / 4);
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < edge; i++) {
    lo += profile[i] / edge;
    hi += profile[count - 1 - i] / edge;
  }
  const range = hi - lo;
  if (Math.abs(range) < 8) return Infinity;
  const level = (f: number): number => {
    const target = lo + f * range;
    for (let i = 1; i < count; i++) {
      const a = profile[i - 1];
      const b = profile[i];
      if ((a - target) * (b - target) <= 0 && a !== b)
        return (i - 1 + (target - a) / (b - a)) * step;
    }
    return NaN;
  };
  const width = Math.abs(level(0.9) - level(0.1));
  return Number.isFinite(width) ? width : Infinity;
}
