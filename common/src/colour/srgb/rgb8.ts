import type { RGB, RGB8 } from '../../types/colour.js';

/**
 * Scales an 8-bit RGB triple to floats 0..1.
 *
 * @param rgb8 - channels 0..255
 * @returns channels 0..1
 * @example
 * rgb8ToRgb({ r: 255, g: 128, b: 0 }); // { r: 1, g: 0.50196…, b: 0 }
 */
export function rgb8ToRgb({ r, g, b }: RGB8): RGB {
  return { r: r / 255, g: g / 255, b: b / 255 };
}

/**
 * Quantises float RGB to 8 bits, clipping to 0..255 and rounding to nearest.
 *
 * @param rgb - channels nominally 0..1
 * @returns integer channels 0..255
 * @example
 * rgbToRgb8({ r: 1, g: 0.5, b: -0.1 }); // { r: 255, g: 128, b: 0 }
 */
export function rgbToRgb8({ r, g, b }: RGB): RGB8 {
  const q = (v: number): number => Math.round(Math.min(1, Math.max(0, v)) * 255);
  return { r: q(r), g: q(g), b: q(b) };
}
