import type { RGB, XYZ } from '../../types/colour.js';
import { xyzToSrgbMatrix } from '../constants.js';

const [[m00, m01, m02], [m10, m11, m12], [m20, m21, m22]] = xyzToSrgbMatrix;

/**
 * CIE XYZ (D65) to linear-light sRGB, the inverse of `linearSrgbToXyz`
 * (IEC 61966-2-1:1999 §5.3). Results outside 0..1 mean the colour is out of gamut.
 *
 * @param xyz - XYZ relative to D65, Y = 1 for white
 * @returns linear-light sRGB, not clipped
 * @example
 * xyzToLinearSrgb({ X: 0.9504559, Y: 1, Z: 1.0890578 }); // ≈ { r: 1, g: 1, b: 1 }
 */
export function xyzToLinearSrgb({ X, Y, Z }: XYZ): RGB {
  return {
    r: m00 * X + m01 * Y + m02 * Z,
    g: m10 * X + m11 * Y + m12 * Z,
    b: m20 * X + m21 * Y + m22 * Z,
  };
}
