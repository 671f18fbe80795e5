import { epsilon, kappa } from '../constants.js';

/**
 * CIE 1976 lightness L* from relative luminance (CIE 15:2004 §8.2.1.1).
 *
 * @param Y - luminance relative to the white (white = 1)
 * @returns L*, 0..100 for 0 <= Y <= 1
 * @example
 * lightnessFromY(0.18); // 49.496… (an 18 % grey card)
 */
export function lightnessFromY(Y: number): number {
  return Y > epsilon ? 116 * Math.cbrt(Y) - 16 : kappa * Y;
}

/**
 * Relative luminance from CIE 1976 lightness (inverse of `lightnessFromY`).
 *
 * @param L - L*
 * @returns Y relative to the white (white = 1)
 * @example
 * yFromLightness(50); // 0.18418…
 */
export function yFromLightness(L: number): number {
  return L > kappa * epsilon ? ((L + 16) / 116) ** 3 : L / kappa;
}
