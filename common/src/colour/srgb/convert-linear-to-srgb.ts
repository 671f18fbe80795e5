import type { RGB } from '../../types/colour.js';
import { srgbTransfer } from '../constants.js';

const { slope, offset, scale, exponent, encodeThreshold } = srgbTransfer;

/**
 * Encodes one linear-light channel with the sRGB transfer function
 * (IEC 61966-2-1:1999 §5.2). Negative values are mirrored (CSS Color 4).
 *
 * @param value - linear-light channel value
 * @returns encoded sRGB channel value
 * @example
 * linearChannelToSrgb(0.18); // 0.4613561…
 */
export function linearChannelToSrgb(value: number): number {
  const abs = value < 0 ? -value : value;
  const encoded = abs <= encodeThreshold ? abs * slope : scale * abs ** (1 / exponent) - offset;
  return value < 0 ? -encoded : encoded;
}

/**
 * Encodes linear-light RGB as sRGB (IEC 61966-2-1:1999 §5.2).
 *
 * @param rgb - linear-light RGB
 * @returns sRGB floats (not clipped)
 * @example
 * linearToSrgb({ r: 0.18, g: 0.18, b: 0.18 }); // { r: 0.4613…, g: 0.4613…, b: 0.4613… }
 */
export function linearToSrgb({ r, g, b }: RGB): RGB {
  return { r: linearChannelToSrgb(r), g: linearChannelToSrgb(g), b: linearChannelToSrgb(b) };
}
