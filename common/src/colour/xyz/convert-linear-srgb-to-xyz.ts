import type { RGB, XYZ } from '../../types/colour.js';
import { srgbToXyzMatrix } from '../constants.js';

const [[m00, m01, m02], [m10, m11, m12], [m20, m21, m22]] = srgbToXyzMatrix;

/**
 * Linear-light sRGB to CIE XYZ relative to D65 (IEC 61966-2-1:1999 §5.2, matrix from
 * the BT.709 primaries; see `srgbToXyzMatrix`). White (1, 1, 1) maps to D65 with Y = 1.
 *
 * @param rgb - linear-light sRGB
 * @returns XYZ (D65, Y = 1 for white)
 * @example
 * linearSrgbToXyz({ r: 1, g: 1, b: 1 }); // { X: 0.95045…, Y: 1, Z: 1.08905… }
 */
export function linearSrgbToXyz({ r, g, b }: RGB): XYZ {
  return {
    X: m00 * r + m01 * g + m02 * b,
    Y: m10 * r + m11 * g + m12 * b,
    Z: m20 * r + m21 * g + m22 * b,
  };
}
