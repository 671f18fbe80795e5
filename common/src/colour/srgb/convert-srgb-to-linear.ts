import type { RGB } from '../../types/colour.js';
import { srgbTransfer } from '../constants.js';

const { slope, offset, scale, exponent, decodeThreshold } = srgbTransfer;

/**
 * Decodes one sRGB channel value to linear light (IEC 61966-2-1:1999 §5.2, the
 * inverse of the encoding). Negative values are mirrored so out-of-gamut colours
 * survive a round trip, as CSS Color 4 does.
 *
 * @param value - encoded channel, nominally 0..1
 * @returns linear-light channel value
 * @example
 * srgbChannelToLinear(0.5); // 0.2140411…
 */
export function srgbChannelToLinear(value: number): number {
  const abs = value < 0 ? -value : value;
  const linear = abs <= decodeThreshold ? abs / slope : ((abs + offset) / scale) ** exponent;
  return value < 0 ? -linear : linear;
}

/**
 * Decodes an sRGB colour to linear-light RGB (IEC 61966-2-1:1999 §5.2).
 *
 * @param rgb - sRGB floats, nominally 0..1
 * @returns linear-light RGB
 * @example
 * srgbToLinear({ r: 1, g: 0.5, b: 0 }); // { r: 1, g: 0.2140411…, b: 0 }
 */
export function srgbToLinear({ r, g, b }: RGB): RGB {
  return { r: srgbChannelToLinear(r), g: srgbChannelToLinear(g), b: srgbChannelToLinear(b) };
}
