import { lightnessFromY } from '../lab/lightness.js';

/**
 * ASTM D1535 neutral value function (ASTM D1535-08e1; colour-science `luminance_ASTMD1535`):
 * Y = 1.1914V − 0.22533V² + 0.23352V³ − 0.020484V⁴ + 0.00081939V⁵, with Y in percent of the
 * perfect reflecting diffuser. It is the 1943 renotation's value scale (Newhall, Nickerson
 * & Judd, JOSA 33:385) rescaled from smoked MgO to the perfect diffuser (× 0.975).
 *
 * @param value - Munsell value V, 0..10
 * @returns luminance Y relative to the white (white = 1)
 * @example
 * yFromMunsellValue(5); // 0.192718… (a middle grey, N5)
 */
export function yFromMunsellValue(value: number): number {
  const v = value;
  return (v * (1.1914 + v * (-0.22533 + v * (0.23352 + v * (-0.020484 + v * 0.00081939))))) / 100;
}

/** dY/dV of the ASTM D1535 polynomial, in percent per value step. */
const slope = (v: number): number =>
  1.1914 + v * (-0.45066 + v * (0.70056 + v * (-0.081936 + v * 0.00409695)));

/**
 * Munsell value (0–10, the painter's value scale) from luminance, by inverting the
 * ASTM D1535 value function with Newton's method (the polynomial has no closed-form
 * inverse; it is strictly increasing on 0..10, so Newton from V ≈ L* ÷ 10 converges in a
 * few steps).
 *
 * @param Y - luminance relative to the white (white = 1)
 * @returns Munsell value V (≈ 0..10; above 10 for Y > 1.026)
 * @example
 * munsellValueFromY(0.1927); // ≈ 5.0
 */
export function munsellValueFromY(Y: number): number {
  if (Y <= 0) return 0;
  const target = Y * 100;
  let v = lightnessFromY(Y) / 10;
  for (let i = 0; i < 30; i++) {
    const step = (yFromMunsellValue(v) * 100 - target) / slope(v);
    v -= step;
    if (Math.abs(step) < 1e-12) break;
  }
  return v;
}
