import type { Lab, WhitePoint, XYZ } from '../../types/colour.js';
import { D65, epsilon, kappa } from '../constants.js';

/** Inverse of CIE 15:2004 §8.2.1.1's f: cube above 6/29, the straight line below. */
const fInverse = (t: number): number => {
  const t3 = t * t * t;
  return t3 > epsilon ? t3 : (116 * t - 16) / kappa;
};

/**
 * CIE 1976 L*a*b* to CIE XYZ (the inverse of CIE 15:2004 §8.2.1.1).
 *
 * @param lab - Lab relative to `white`
 * @param white - the reference white (default D65)
 * @returns XYZ with the white's Y = 1
 * @example
 * labToXyz({ L: 100, a: 0, b: 0 }); // D65: { X: 0.95045…, Y: 1, Z: 1.08905… }
 */
export function labToXyz({ L, a, b }: Lab, white: WhitePoint = D65): XYZ {
  const fy = (L + 16) / 116;
  const fx = fy + a / 500;
  const fz = fy - b / 200;
  // Y uses L* directly below L* = kappa·epsilon = 8, which is the same line written in L*.
  const Y = L > kappa * epsilon ? fy * fy * fy : L / kappa;
  return { X: white.X * fInverse(fx), Y: white.Y * Y, Z: white.Z * fInverse(fz) };
}
