import type { WhitePoint } from '../types/colour.js';

/**
 * CIE 1976 L*a*b* constants in their exact rational form, as CIE 15:2004 §8.2.1.1
 * intends them: epsilon = (6/29)^3 = 216/24389, kappa = (29/3)^3 = 24389/27.
 * (The legacy rounded 0.008856 / 903.3 make L* slightly discontinuous at the join.)
 */
export const epsilon = 216 / 24389;
export const kappa = 24389 / 27;

/** Converts CIE xy chromaticity to XYZ with Y = 1 (CIE 15:2004 §7.3). */
const fromXy = (x: number, y: number): WhitePoint => ({ X: x / y, Y: 1, Z: (1 - x - y) / y });

/**
 * D65 white from its CIE 15:2004 chromaticity (0.3127, 0.3290), the white of
 * IEC 61966-2-1 sRGB. Using xy rather than ASTM E308's 0.95047/1.08883 makes
 * sRGB white map to exactly a* = b* = 0.
 */
export const D65: WhitePoint = fromXy(0.3127, 0.329);

/** D50 white from its CIE 15:2004 chromaticity (0.3457, 0.3585), the ICC PCS illuminant. */
export const D50: WhitePoint = fromXy(0.3457, 0.3585);

/** CIE Illuminant C (0.31006, 0.31616), the illuminant of the Munsell renotation. */
export const illuminantC: WhitePoint = fromXy(0.31006, 0.31616);

/**
 * IEC 61966-2-1:1999 transfer-function constants (§5.2 / Amendment 1):
 * decode V <= 0.04045 ? V/12.92 : ((V + 0.055)/1.055)^2.4, encode its inverse.
 */
export const srgbTransfer = {
  slope: 12.92,
  offset: 0.055,
  scale: 1.055,
  exponent: 2.4,
  decodeThreshold: 0.04045,
  encodeThreshold: 0.0031308,
} as const;

/**
 * Linear sRGB -> XYZ (D65, Y = 1), derived exactly from the IEC 61966-2-1 / ITU-R BT.709
 * primaries R (0.64, 0.33), G (0.30, 0.60), B (0.15, 0.06) and the D65 xy above. The
 * standard prints it rounded to 4 decimals (0.4124 0.3576 0.1805 …); the rational form
 * (506752/1228815 …) is the one CSS Color 4 uses, and keeps white at a* = b* = 0.
 * Row-major.
 */
export const srgbToXyzMatrix = [
  [506752 / 1228815, 87881 / 245763, 12673 / 70218],
  [87098 / 409605, 175762 / 245763, 12673 / 175545],
  [7918 / 409605, 87881 / 737289, 1001167 / 1053270],
] as const;

/** XYZ (D65) -> linear sRGB: the inverse of `srgbToXyzMatrix`, row-major. */
export const xyzToSrgbMatrix = [
  [12831 / 3959, -329 / 214, -1974 / 3959],
  [-851781 / 878810, 1648619 / 878810, 36519 / 878810],
  [705 / 12673, -2585 / 12673, 705 / 667],
] as const;

/**
 * The Bradford cone-response matrix (Lam 1985, as given by Fairchild, Color Appearance
 * Models, and used by ICC.1 Annex E's linearised Bradford transform). Row-major.
 */
export const bradfordMatrix = [
  [0.8951, 0.2664, -0.1614],
  [-0.7502, 1.7135, 0.0367],
  [0.0389, -0.0685, 1.0296],
] as const;
