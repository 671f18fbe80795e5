import {
  D65,
  deltaE2000Batch,
  epsilon,
  kappa,
  srgbToXyzMatrix,
  lightnessFromY,
  linearSrgbToXyz,
  xyzToLab,
  type Lab,
  type LabSpread,
} from '@mixmark/common';
import { lightAt, type ColourCorrection } from './colour-correction';
import { shiftedTable } from './jpeg-lattice';
import { quantile, quantiles } from './robust-statistics';
import { scratchF64 } from './scratch';
import type { CardSamples } from './sample-card';

/** A window's reading as the measurement reports it. */
export type WindowReading = {
  /** Index into the layout's windows. */
  window: number;
  /** CIELAB (D65) of the trimmed linear-light mean. */
  lab: Lab;
  /** Standard deviations of L*, a*, b* over the kept pixels, and the 90th percentile of
   * their ΔE00 from the mean (evenness of a wash). */
  spread: LabSpread & { deltaE90: number };
  /** L* along the long axis (long windows only), from the left end. */
  profile?: number[];
  /** Pixels kept after trimming. */
  pixels: number;
};

/** Camera codes to add per channel before correcting (a flat area's JPEG chroma lattice
 * snap, `latticeShift`). */
export type CodeShift = readonly [number, number, number];

/** Per-sample corrected linear RGB (reflectance) and luminance, in scratch arrays that the
 * next call reuses; with `shift`, each code is read as code + shift (interpolated table). */
export function correctSamples(
  samples: CardSamples,
  correction: ColourCorrection,
  shift?: CodeShift,
) {
  const { nx, ny, rect, codes } = samples;
  const n = nx * ny;
  const rgb = scratchF64('window-rgb', n * 3);
  const Y = scratchF64('window-Y', n);
  const [tr, tg, tb] = shift
    ? correction.tables.map((t, c) =>
        shiftedTable(t, shift[c], scratchF64(`window-table-${c}`, 256)),
      )
    : correction.tables;
  const [lr, lg, lb] = correction.light;
  const sx = rect.w / nx;
  let k = 0;
  for (let j = 0; j < ny; j++) {
    const y = rect.y + ((j + 0.5) * rect.h) / ny;
    for (let i = 0; i < nx; i++, k++) {
      const x = rect.x + (i + 0.5) * sx;
      const r = tr[codes[3 * k]] / lightAt(lr, x, y);
      const g = tg[codes[3 * k + 1]] / lightAt(lg, x, y);
      const b = tb[codes[3 * k + 2]] / lightAt(lb, x, y);
      rgb[3 * k] = r;
      rgb[3 * k + 1] = g;
      rgb[3 * k + 2] = b;
      // Relative luminance of linear sRGB (IEC 61966-2-1, the Y row of the matrix).
      Y[k] = 0.2126 * r + 0.7152 * g + 0.0722 * b;
    }
  }
  return { rgb, Y };
}

const labOf = (r: number, g: number, b: number): Lab => xyzToLab(linearSrgbToXyz({ r, g, b }));

const [[m00, m01, m02], [m10, m11, m12], [m20, m21, m22]] = srgbToXyzMatrix;
const labF = (t: number): number => (t > epsilon ? Math.cbrt(t) : (kappa * t + 16) / 116);

/** Most pixels whose ΔE00 from the mean is computed for `deltaE90` (an even stride through
 * the kept pixels beyond this: a 90th percentile of 4096 is within a few hundredths of the
 * whole window's). */
const spreadSampleLimit = 4096;

/**
 * Reads one window: corrects every sample, drops the 10 % darkest and 10 % lightest (by
 * luminance: granulation specks, fibres, a speck of glare), averages the rest in linear
 * light and converts that mean to CIELAB once. The spread is computed over the kept pixels
 * (`deltaE90` over an even stride of at most 4096 of them);
 * a window at least twice as long as it is high also gets its L* profile (16 slices).
 *
 * @param samples - samples inside the inset window
 * @param correction - the fitted correction
 * @param window - the window's index
 * @param shift - codes to add per channel first (a flat area's JPEG lattice snap), if any
 * @returns the reading
 */
export function readWindow(
  samples: CardSamples,
  correction: ColourCorrection,
  window: number,
  shift?: CodeShift,
): WindowReading {
  const { rgb, Y } = correctSamples(samples, correction, shift);
  const n = Y.length;
  const [low, high] = quantiles(Y, [0.1, 0.9]);
  let sr = 0;
  let sg = 0;
  let sb = 0;
  const kept = new Int32Array(n);
  let count = 0;
  for (let k = 0; k < n; k++) {
    if (Y[k] < low || Y[k] > high) continue;
    kept[count++] = k;
    sr += rgb[3 * k];
    sg += rgb[3 * k + 1];
    sb += rgb[3 * k + 2];
  }
  const lab = labOf(sr / count, sg / count, sb / count);
  // σ of L*, a*, b* over every kept pixel (CIE 15:2004 Lab, the same sums as xyzToLab of
  // linearSrgbToXyz, written out so that no object is made per pixel); ΔE00 from the mean
  // over an even stride of at most `spreadSampleLimit` of them.
  const stride = Math.max(1, Math.ceil(count / spreadSampleLimit));
  const m = Math.ceil(count / stride);
  const labs = new Float64Array(m * 3);
  const means = new Float64Array(m * 3);
  const { X: wx, Y: wy, Z: wz } = D65;
  let qL = 0;
  let qa = 0;
  let qb = 0;
  for (let i = 0; i < count; i++) {
    const k = kept[i];
    const r = Math.max(0, rgb[3 * k]);
    const g = Math.max(0, rgb[3 * k + 1]);
    const b = Math.max(0, rgb[3 * k + 2]);
    const fx = labF((m00 * r + m01 * g + m02 * b) / wx);
    const fy = labF((m10 * r + m11 * g + m12 * b) / wy);
    const fz = labF((m20 * r + m21 * g + m22 * b) / wz);
    const L = 116 * fy - 16;
    const A = 500 * (fx - fy);
    const B = 200 * (fy - fz);
    qL += (L - lab.L) ** 2;
    qa += (A - lab.a) ** 2;
    qb += (B - lab.b) ** 2;
    if (i % stride === 0) {
      const o = 3 * (i / stride);
      labs[o] = L;
      labs[o + 1] = A;
      labs[o + 2] = B;
      means[o] = lab.L;
      means[o + 1] = lab.a;
      means[o + 2] = lab.b;
    }
  }
  const dE = deltaE2000Batch(means, labs, new Float64Array(m));
  const reading: WindowReading = {
    window,
    lab: round(lab),
    spread: {
      L: fixed(Math.sqrt(qL / count)),
      a: fixed(Math.sqrt(qa / count)),
      b: fixed(Math.sqrt(qb / count)),
      deltaE90: fixed(quantile(dE, 0.9)),
    },
    pixels: count,
  };
  const horizontal = samples.nx >= 2 * samples.ny;
  if (horizontal || samples.ny >= 2 * samples.nx) {
    const slices = 16;
    const sums = new Float64Array(slices);
    const counts = new Float64Array(slices);
    for (let k = 0; k < n; k++) {
      const along = horizontal ? k % samples.nx : Math.floor(k / samples.nx);
      const s = Math.floor((along * slices) / (horizontal ? samples.nx : samples.ny));
      sums[s] += Y[k];
      counts[s]++;
    }
    reading.profile = Array.from(sums, (sum, s) =>
      fixed(lightnessFromY(Math.max(0, sum / counts[s]))),
    );
  }
  return reading;
}

const fixed = (v: number): number => Math.round(v * 1000) / 1000;
const round = (lab: Lab): Lab => ({ L: fixed(lab.L), a: fixed(lab.a), b: fixed(lab.b) });
