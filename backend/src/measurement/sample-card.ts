import type { Raster8 } from '@mixmark/common';
import type { MmRect } from '../cards/card-layout.types';
import { applyHomography, type Homography } from './homography';

/** Pixels sampled from a card rectangle, on a grid in card millimetres. */
export type CardSamples = {
  /** RGB code values, 3 per sample, row-major over the grid (nx across, ny down). */
  codes: Uint8Array;
  /** The rectangle sampled (mm): sample (i, j) sits at x + (i + ½)·w/nx, y + (j + ½)·h/ny. */
  rect: MmRect;
  nx: number;
  ny: number;
  /** Grid points that fell outside the frame (not sampled). */
  outside: number;
};

/** Local scale of the homography at a card point: working pixels per millimetre (the
 * smaller of the two directions, so a grid at this step never skips pixels twice). */
export function pixelsPerMm(h: Homography, x: number, y: number): number {
  const p = applyHomography(h, x, y);
  const px = applyHomography(h, x + 1, y);
  const py = applyHomography(h, x, y + 1);
  return Math.min(Math.hypot(px.x - p.x, px.y - p.y), Math.hypot(py.x - p.x, py.y - p.y));
}

/** A rectangle shrunk on every side by `inset` mm. */
export const insetRect = (r: MmRect, inset: number): MmRect => ({
  x: r.x + inset,
  y: r.y + inset,
  w: Math.max(0, r.w - 2 * inset),
  h: Math.max(0, r.h - 2 * inset),
});

/**
 * Samples a card rectangle through the homography: a grid at about one sample per photo
 * pixel (at most `maxPerSide` along a side), each the nearest pixel's code values, so the
 * 8-bit values reach the correction tables untouched (no interpolation mixes them).
 *
 * @param raster - working raster
 * @param h - card mm → raster px
 * @param rect - the (already inset) rectangle, mm
 * @param maxPerSide - grid limit per side (default 160)
 * @returns the samples
 */
export function sampleCardRect(
  raster: Raster8,
  h: Homography,
  rect: MmRect,
  maxPerSide = 160,
): CardSamples {
  const ppm = pixelsPerMm(h, rect.x + rect.w / 2, rect.y + rect.h / 2);
  // One scale for both sides, so the grid keeps the rectangle's shape when the limit bites (a
  // 110 × 24 mm wash window on a large photo is 160 × 35 samples, not 160 × 160, and still
  // reads as a long window with an L* profile).
  const fit = Math.min(1, maxPerSide / (Math.max(rect.w, rect.h) * ppm));
  const nx = Math.max(2, Math.min(maxPerSide, Math.round(rect.w * ppm * fit)));
  const ny = Math.max(2, Math.min(maxPerSide, Math.round(rect.h * ppm * fit)));
  const codes = new Uint8Array(nx * ny * 3);
  const { data, width, height, channels } = raster;
  let outside = 0;
  let k = 0;
  // Along a grid row the homography's numerators and denominator are linear in the column,
  // so each sample costs three multiply-adds and one division (no call, no object).
  const sx = rect.w / nx;
  for (let j = 0; j < ny; j++) {
    const y = rect.y + ((j + 0.5) * rect.h) / ny;
    const x0 = rect.x + 0.5 * sx;
    const X0 = h[0] * x0 + h[1] * y + h[2];
    const Y0 = h[3] * x0 + h[4] * y + h[5];
    const W0 = h[6] * x0 + h[7] * y + h[8];
    const dX = h[0] * sx;
    const dY = h[3] * sx;
    const dW = h[6] * sx;
    for (let i = 0; i < nx; i++, k += 3) {
      const w = W0 + i * dW;
      const px = Math.floor((X0 + i * dX) / w);
      const py = Math.floor((Y0 + i * dY) / w);
      if (px < 0 || py < 0 || px >= width || py >= height) {
        outside++;
        continue;
      }
      const o = (py * width + px) * channels;
      codes[k] = data[o];
      codes[k + 1] = data[o + 1];
      codes[k + 2] = data[o + 2];
    }
  }
  return { codes, rect, nx, ny, outside };
}

/** Bilinear green-channel value at a raster point (for edge profiles). */
export function bilinearGreen(raster: Raster8, x: number, y: number): number {
  const { data, width, height, channels } = raster;
  const fx = Math.min(Math.max(x - 0.5, 0), width - 1.001);
  const fy = Math.min(Math.max(y - 0.5, 0), height - 1.001);
  const x0 = Math.floor(fx);
  const y0 = Math.floor(fy);
  const ax = fx - x0;
  const ay = fy - y0;
  const at = (xx: number, yy: number): number => data[(yy * width + xx) * channels + 1];
  return (
    (1 - ay) * ((1 - ax) * at(x0, y0) + ax * at(x0 + 1, y0)) +
    ay * ((1 - ax) * at(x0, y0 + 1) + ax * at(x0 + 1, y0 + 1))
  );
}
