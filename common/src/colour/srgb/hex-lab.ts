import type { Lab, RGB8 } from '../../types/colour.js';
import { formatHex, parseHex } from './parse-hex.js';
import { rgb8ToRgb, rgbToRgb8 } from './rgb8.js';
import { labToSrgb, srgbToLab } from './srgb-lab.js';

/**
 * 8-bit sRGB to CIELAB (D65).
 *
 * @param rgb8 - channels 0..255
 * @returns Lab relative to D65
 * @example
 * rgb8ToLab({ r: 128, g: 128, b: 128 }); // { L: 53.585…, a: 0, b: 0 }
 */
export function rgb8ToLab(rgb8: RGB8): Lab {
  return srgbToLab(rgb8ToRgb(rgb8));
}

/**
 * CIELAB (D65) to the nearest 8-bit sRGB, clipped per channel when out of gamut
 * (use `labToSrgb` to know whether it was).
 *
 * @param lab - Lab relative to D65
 * @returns channels 0..255
 * @example
 * labToRgb8({ L: 53.585013, a: 0, b: 0 }); // { r: 128, g: 128, b: 128 }
 */
export function labToRgb8(lab: Lab): RGB8 {
  return rgbToRgb8(labToSrgb(lab).rgb);
}

/**
 * A hex colour (`#rgb` / `#rrggbb`) to CIELAB (D65).
 *
 * @param hex - the hex text
 * @returns Lab, or `undefined` when the text is not a hex colour
 * @example
 * hexToLab('#336699'); // ≈ { L: 42.0092, a: -0.1459, b: -32.8451 }
 */
export function hexToLab(hex: string): Lab | undefined {
  const rgb8 = parseHex(hex);
  return rgb8 && rgb8ToLab(rgb8);
}

/**
 * CIELAB (D65) to a `#rrggbb` string, clipped per channel when out of gamut.
 *
 * @param lab - Lab relative to D65
 * @returns the hex string
 * @example
 * labToHex({ L: 66.96103, a: 12.969792, b: 34.110085 }); // '#cc9966'
 */
export function labToHex(lab: Lab): string {
  return formatHex(labToRgb8(lab));
}
