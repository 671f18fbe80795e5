import { D65, srgbToXyzMatrix } from '../constants.js';
import { srgb8ToLinearLut } from './srgb8-linear-lut.js';

/**
 * Per-channel tables of each 8-bit code value's contribution to X/Xn, Y/Yn and Z/Zn, in
 * the order xr, xg, xb, yr, yg, yb, zr, zg, zb: the IEC 61966-2-1 decode and the sRGB
 * matrix row folded together, so a pixel's normalised XYZ costs nine lookups and six
 * additions. Internal to the region fast path.
 */
export const xyzTables: Float64Array[] = ((): Float64Array[] => {
  const whites = [D65.X, D65.Y, D65.Z];
  const out: Float64Array[] = [];
  for (let row = 0; row < 3; row++) {
    for (let col = 0; col < 3; col++) {
      const m = srgbToXyzMatrix[row][col] / whites[row];
      out.push(Float64Array.from(srgb8ToLinearLut, (linear) => m * linear));
    }
  }
  return out;
})();
