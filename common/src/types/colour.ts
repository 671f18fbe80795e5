/**
 * Plain colour records, named with the standard's letters (STYLE.md §3).
 * All CIELAB in Mixmark is D65-relative unless a name says otherwise.
 */

/** CIE 1976 L*a*b* (CIE 15:2004 §8.2.1). L* 0..100, a*, b* unbounded. */
export type Lab = { L: number; a: number; b: number };

/** CIE 1976 LCh(ab): lightness, chroma C*ab, hue angle h in degrees [0, 360). */
export type LCh = { L: number; C: number; h: number };

/** CIE 1931 tristimulus values, scaled so that the white has Y = 1. */
export type XYZ = { X: number; Y: number; Z: number };

/** An RGB triple of floats, nominally 0..1 (may fall outside when out of gamut). */
export type RGB = { r: number; g: number; b: number };

/** An RGB triple of 8-bit integers 0..255. */
export type RGB8 = { r: number; g: number; b: number };

/** A white point as XYZ with Y = 1. */
export type WhitePoint = XYZ;

/** Result of converting Lab to sRGB: the clipped colour and whether clipping was needed. */
export type SrgbFromLab = {
  /** The sRGB colour, each channel clipped to 0..1. */
  rgb: RGB;
  /** The sRGB colour before clipping (may lie outside 0..1). */
  unclipped: RGB;
  /** True when every channel of `unclipped` lies within 0..1 (to 1e-9). */
  inGamut: boolean;
};

/**
 * An 8-bit RGB raster as the photo pipeline gets it from sharp's `.raw()`:
 * interleaved channels, row-major, no padding.
 */
export type Raster8 = {
  data: Uint8Array | Uint8ClampedArray;
  width: number;
  height: number;
  /** 3 (RGB) or 4 (RGBA, alpha ignored). */
  channels: 3 | 4;
};

/** A rectangle of pixels inside a raster, in pixel units. */
export type PixelRect = { x: number; y: number; width: number; height: number };

/** Standard deviations of L*, a*, b* over the pixels of a window. */
export type LabSpread = { L: number; a: number; b: number };
