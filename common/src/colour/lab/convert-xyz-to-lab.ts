import type { Lab, WhitePoint, XYZ } from '../../types/colour.js';
import { D65, epsilon, kappa } from '../constants.js';

/** CIE 15:2004 §8.2.1.1: f(t) = t^(1/3) above epsilon, a straight line below it. */
const f = (t: number): number => (t > epsilon ? Math.cbrt(t) : (kappa * t + 16) / 116);

/**
 * CIE XYZ to CIE 1976 L*a*b* (CIE 15:2004 §8.2.1.1; ISO/CIE 11664-4).
 *
 * @param xyz - tristimulus values with the white's Y = 1
 * @param white - the reference white (default D65)
 * @returns Lab
 * @example
 * xyzToLab({ X: 0.2065, Y: 0.1220, Z: 0.0514 }); // ≈ { L: 41.53, a: 52.64, b: 26.92 }
 */
export function xyzToLab({ X, Y, Z }: XYZ, white: WhitePoint = D65): Lab {
  const fx = f(X / white.X);
  const fy = f(Y / white.Y);
  const fz = f(Z / white.Z);
  return { L: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}
