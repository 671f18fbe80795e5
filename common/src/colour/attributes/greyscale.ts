import type { Lab } from '../../types/colour.js';
import { labToHex } from '../srgb/hex-lab.js';

/**
 * The neutral grey of the same CIE lightness, for a "squint" value preview: painters
 * check value by comparing greys. Keeps L*, drops a* and b*.
 *
 * @param lab - CIELAB (D65)
 * @returns the grey of equal L*
 * @example
 * greyscaleLab({ L: 62, a: 30, b: 40 }); // { L: 62, a: 0, b: 0 }
 */
export function greyscaleLab({ L }: Lab): Lab {
  return { L, a: 0, b: 0 };
}

/**
 * The same-L* grey as an sRGB hex string (always in gamut for 0 <= L* <= 100).
 *
 * @param lab - CIELAB (D65)
 * @returns `#rrggbb` of the grey
 * @example
 * greyscaleHex({ L: 50.034439, a: 20, b: -10 }); // '#777777'
 */
export function greyscaleHex(lab: Lab): string {
  return labToHex(greyscaleLab(lab));
}
