import { srgbChannelToLinear } from '../srgb/convert-srgb-to-linear.js';

/**
 * The IEC 61966-2-1 decoding of every 8-bit code value, `lut[v] = decode(v / 255)`: the
 * photo pipeline's pixels only ever take these 256 values, so a table replaces the
 * power function per pixel.
 */
export const srgb8ToLinearLut: Float64Array = Float64Array.from({ length: 256 }, (_, v) =>
  srgbChannelToLinear(v / 255),
);
