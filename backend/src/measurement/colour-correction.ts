import { srgb8ToLinearLut } from '@mixmark/common';
import { solveLinear } from './homography';
import { fitToneCurve, type ToneCurve } from './tone-curve';

/** What the photo shows of one neutral patch: trimmed means in linear light per channel. */
export type PatchObservation = {
  name: string;
  role: 'ramp' | 'grey';
  /** Printed luminance factor (paper = 1). */
  Y: number;
  /** Centre on the card, mm. */
  x: number;
  y: number;
  linear: [number, number, number];
};

/** A plane over the card, value = a + b·x + c·y (x, y in mm). */
export type LightPlane = [number, number, number];

/** The fitted correction: a table per channel and the light across the card. */
export type ColourCorrection = {
  /** Code value (0..255) → reflectance per channel, before dividing by the light. */
  tables: [Float64Array, Float64Array, Float64Array];
  /** Relative light per channel over the card. */
  light: [LightPlane, LightPlane, LightPlane];
  /** max/min − 1 of the light (luminance) over the mid-grey patches. */
  unevenness: number;
  /** Largest departure of a mid-grey patch from the fitted plane (relative). */
  nonPlanar: number;
};

const planeAt = (p: LightPlane, x: number, y: number): number => p[0] + p[1] * x + p[2] * y;

/** Least-squares plane through (x, y, v); a flat plane at the mean when underdetermined. */
function fitPlane(points: { x: number; y: number; v: number }[]): LightPlane {
  const m = new Float64Array(9);
  const r = new Float64Array(3);
  for (const p of points) {
    const row = [1, p.x, p.y];
    for (let i = 0; i < 3; i++) {
      r[i] += row[i] * p.v;
      for (let j = 0; j < 3; j++) m[i * 3 + j] += row[i] * row[j];
    }
  }
  const s = points.length >= 3 ? solveLinear(m, r, 3) : undefined;
  const mean = points.reduce((sum, p) => sum + p.v, 0) / Math.max(1, points.length);
  return s ? [s[0], s[1], s[2]] : [mean, 0, 0];
}

/** The curve the first pass starts from. */
const identityCurve: ToneCurve = { at: (o) => o };

/** Rec. 709 / sRGB luminance weights (IEC 61966-2-1). */
const luma = [0.2126, 0.7152, 0.0722];

/**
 * Fits the per-channel correction in linear light from the card's neutral patches. The
 * camera is modelled per channel as observed = T_c(light_c(x, y) · reflectance), with T_c
 * unknown and monotone (exposure, white balance, flare, tone curve and the sRGB encoding
 * all fold into it). T_c⁻¹ is fitted through the ramp; the light is a plane per channel fitted
 * to the mid-grey patches, which are printed alike, so their differences are the light's.
 * The two depend on each other, so the fit alternates three times (it settles in two).
 *
 * @param patches - observations of every neutral patch
 * @returns the correction
 */
export function fitColourCorrection(patches: PatchObservation[]): ColourCorrection {
  const ramp = patches.filter((p) => p.role === 'ramp');
  const mid = ramp.reduce((best, p) => (Math.abs(p.Y - 0.18) < Math.abs(best.Y - 0.18) ? p : best));
  const greys = [mid, ...patches.filter((p) => p.role === 'grey')];
  // Mid-greys printed at levels of their own (layout v2) are points of the tone curve too.
  const toneRamp = [...ramp, ...greys.filter((g) => !ramp.some((p) => Math.abs(p.Y - g.Y) < 1e-6))];
  let light: [LightPlane, LightPlane, LightPlane] = [
    [1, 0, 0],
    [1, 0, 0],
    [1, 0, 0],
  ];
  let curves: ToneCurve[] = [identityCurve, identityCurve, identityCurve];
  for (let iteration = 0; iteration < 3; iteration++) {
    curves = [0, 1, 2].map((c) =>
      fitToneCurve(
        toneRamp.map((p) => p.linear[c]),
        toneRamp.map((p) => p.Y * planeAt(light[c], p.x, p.y)),
      ),
    );
    light = [0, 1, 2].map((c) => {
      const plane = fitPlane(
        greys.map((g) => ({ x: g.x, y: g.y, v: curves[c].at(g.linear[c]) / g.Y })),
      );
      const scale = planeAt(plane, mid.x, mid.y);
      return plane.map((v) => v / scale) as LightPlane;
    }) as [LightPlane, LightPlane, LightPlane];
  }
  const lumaAt = (x: number, y: number): number =>
    luma[0] * planeAt(light[0], x, y) +
    luma[1] * planeAt(light[1], x, y) +
    luma[2] * planeAt(light[2], x, y);
  const measured = greys.map((g) =>
    luma.reduce((s, w, c) => s + (w * curves[c].at(g.linear[c])) / g.Y, 0),
  );
  const fitted = greys.map((g) => lumaAt(g.x, g.y));
  const scale = measured[0] / fitted[0];
  const nonPlanar = Math.max(...measured.map((m, i) => Math.abs(m / (fitted[i] * scale) - 1)));
  const unevenness = Math.max(...measured) / Math.max(1e-9, Math.min(...measured)) - 1;
  const tables = curves.map((curve) => {
    const table = new Float64Array(256);
    for (let code = 0; code < 256; code++) table[code] = curve.at(srgb8ToLinearLut[code]);
    return table;
  }) as [Float64Array, Float64Array, Float64Array];
  return { tables, light, unevenness, nonPlanar };
}

/** Relative light of one channel at a card point. */
export const lightAt = planeAt;
