import type { Lab, LCh } from '../../types/colour.js';

const degrees = 180 / Math.PI;

/**
 * CIELAB to its polar form LCh(ab) (CIE 15:2004 §8.2.1.2): C* = √(a*² + b*²),
 * h = atan2(b*, a*) in degrees, 0..360. A neutral (a* = b* = 0) gets h = 0.
 *
 * @param lab - Lab
 * @returns LCh with h in [0, 360)
 * @example
 * labToLch({ L: 50, a: 0, b: 20 }); // { L: 50, C: 20, h: 90 }
 */
export function labToLch({ L, a, b }: Lab): LCh {
  const C = Math.sqrt(a * a + b * b);
  let h = Math.atan2(b, a) * degrees;
  if (h < 0) h += 360;
  return { L, C, h: C === 0 ? 0 : h };
}

/**
 * LCh(ab) back to CIELAB.
 *
 * @param lch - lightness, chroma and hue angle in degrees
 * @returns Lab
 * @example
 * lchToLab({ L: 50, C: 20, h: 90 }); // { L: 50, a: ≈0, b: 20 }
 */
export function lchToLab({ L, C, h }: LCh): Lab {
  const r = h / degrees;
  return { L, a: C * Math.cos(r), b: C * Math.sin(r) };
}
