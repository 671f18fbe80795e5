/**
 * Mixmark's colour engine: pure functions on plain values (STYLE.md §3). CIELAB is
 * D65-relative throughout; D50 only through the explicit Bradford helpers.
 */
export * from './constants.js';
export * from './srgb/convert-srgb-to-linear.js';
export * from './srgb/convert-linear-to-srgb.js';
export * from './srgb/rgb8.js';
export * from './srgb/parse-hex.js';
export * from './srgb/srgb-lab.js';
export * from './srgb/hex-lab.js';
export * from './xyz/convert-linear-srgb-to-xyz.js';
export * from './xyz/convert-xyz-to-linear-srgb.js';
export * from './xyz/bradford.js';
export * from './lab/convert-xyz-to-lab.js';
export * from './lab/convert-lab-to-xyz.js';
export * from './lab/lab-lch.js';
export * from './lab/lab-d50.js';
export * from './lab/lightness.js';
export * from './difference/delta-e-76.js';
export * from './difference/delta-e-2000.js';
export * from './attributes/munsell-value.js';
export * from './attributes/warm-cool-index.js';
export * from './attributes/compare-colours.js';
export * from './attributes/greyscale.js';
export { srgb8ToLinearLut } from './region/srgb8-linear-lut.js';
export { cubeRootUnit } from './region/cube-root-unit.js';
export { regionMeanLinear, regionMeanLab } from './region/region-mean.js';
export { regionToLab } from './region/region-to-lab.js';
export * from './region/region-lab-stats.js';
export * from './region/lightness-profile.js';
