import type { Lab, RGB, SrgbFromLab } from '../../types/colour.js';
import { labToXyz } from '../lab/convert-lab-to-xyz.js';
import { xyzToLab } from '../lab/convert-xyz-to-lab.js';
import { linearSrgbToXyz } from '../xyz/convert-linear-srgb-to-xyz.js';
import { xyzToLinearSrgb } from '../xyz/convert-xyz-to-linear-srgb.js';
import { linearToSrgb } from './convert-linear-to-srgb.js';
import { srgbToLinear } from './convert-srgb-to-linear.js';

/** Slack for "in gamut": float round-off on a colour built from sRGB must not count as out. */
const gamutSlack = 1e-9;

/**
 * sRGB floats to CIELAB (D65): IEC 61966-2-1 decoding, then XYZ, then CIE 15:2004 Lab.
 *
 * @param rgb - sRGB channels 0..1
 * @returns Lab relative to D65
 * @example
 * srgbToLab({ r: 0.2, g: 0.4, b: 0.6 }); // ≈ { L: 42.0092, a: -0.1459, b: -32.8451 }
 */
export function srgbToLab(rgb: RGB): Lab {
  return xyzToLab(linearSrgbToXyz(srgbToLinear(rgb)));
}

/**
 * CIELAB (D65) to sRGB with a gamut flag. When the colour is outside the sRGB gamut,
 * `rgb` holds the per-channel clipped fallback (a preview, not a colorimetric match)
 * and `unclipped` the exact, out-of-range values.
 *
 * @param lab - Lab relative to D65
 * @returns `{ rgb, unclipped, inGamut }`
 * @example
 * labToSrgb({ L: 50, a: 0, b: 0 }).inGamut; // true
 * labToSrgb({ L: 50, a: 0, b: 120 }).inGamut; // false
 */
export function labToSrgb(lab: Lab): SrgbFromLab {
  const unclipped = linearToSrgb(xyzToLinearSrgb(labToXyz(lab)));
  const inside = (v: number): boolean => v >= -gamutSlack && v <= 1 + gamutSlack;
  const clip = (v: number): number => (v < 0 ? 0 : v > 1 ? 1 : v);
  return {
    rgb: { r: clip(unclipped.r), g: clip(unclipped.g), b: clip(unclipped.b) },
    unclipped,
    inGamut: inside(unclipped.r) && inside(unclipped.g) && inside(unclipped.b),
  };
}
