import { describe, expect, it } from 'vitest';
import type { Raster8 } from '../../types/colour.js';
import { seededRandom } from '../fixtures/seeded-random.js';
import { srgbChannelToLinear } from '../srgb/convert-srgb-to-linear.js';
import { rgb8ToLab } from '../srgb/hex-lab.js';
import { srgbToLab } from '../srgb/srgb-lab.js';
import { linearToSrgb } from '../srgb/convert-linear-to-srgb.js';
import { cubeRootUnit } from './cube-root-unit.js';
import { lightnessProfile } from './lightness-profile.js';
import { regionLabStats } from './region-lab-stats.js';
import { regionMeanLab, regionMeanLinear } from './region-mean.js';
import { regionToLab } from './region-to-lab.js';
import { srgb8ToLinearLut } from './srgb8-linear-lut.js';

const randomRaster = (width: number, height: number, channels: 3 | 4, seed: number): Raster8 => {
  const random = seededRandom(seed);
  const data = new Uint8Array(width * height * channels);
  for (let i = 0; i < data.length; i++) data[i] = Math.floor(random() * 256);
  return { data, width, height, channels };
};

describe('srgb8ToLinearLut', () => {
  it('should hold the IEC 61966-2-1 decoding of every code value', () => {
    for (let v = 0; v < 256; v++) expect(srgb8ToLinearLut[v]).toBe(srgbChannelToLinear(v / 255));
  });
});

describe('cubeRootUnit', () => {
  it('should match Math.cbrt to 1e-10 (relative) over [epsilon, 1]', () => {
    for (let t = 0.0088; t <= 1; t += 1e-5) {
      expect(Math.abs(cubeRootUnit(t) - Math.cbrt(t)) / Math.cbrt(t)).toBeLessThan(1e-10);
    }
    expect(cubeRootUnit(1)).toBeCloseTo(1, 12);
  });
});

describe('regionToLab', () => {
  it('should give the same Lab as rgb8ToLab for every pixel (1e-8 in Float64, 1e-4 in Float32)', () => {
    const raster = randomRaster(64, 48, 3, 5);
    const lab64 = regionToLab(raster, undefined, new Float64Array(64 * 48 * 3));
    const lab32 = regionToLab(raster);
    for (let p = 0; p < 64 * 48; p++) {
      const d = raster.data;
      const want = rgb8ToLab({ r: d[3 * p], g: d[3 * p + 1], b: d[3 * p + 2] });
      [want.L, want.a, want.b].forEach((v, k) => {
        expect(Math.abs(lab64[3 * p + k] - v)).toBeLessThan(1e-8);
        expect(Math.abs(lab32[3 * p + k] - v)).toBeLessThan(1e-4);
      });
    }
  });

  it('should read only the rectangle, from RGBA as well as RGB', () => {
    const raster = randomRaster(20, 10, 4, 9);
    const rect = { x: 3, y: 2, width: 5, height: 4 };
    const lab = regionToLab(raster, rect, new Float64Array(60));
    const d = raster.data;
    const i = ((2 + 3) * 20 + (3 + 4)) * 4; // last pixel of the rectangle
    const want = rgb8ToLab({ r: d[i], g: d[i + 1], b: d[i + 2] });
    expect(lab[57]).toBeCloseTo(want.L, 8);
    expect(lab[59]).toBeCloseTo(want.b, 8);
  });
});

describe('regionMeanLinear and regionMeanLab', () => {
  it('should average in linear light: black and white pixels average to linear 0.5', () => {
    const raster: Raster8 = {
      data: Uint8Array.of(0, 0, 0, 255, 255, 255, 0, 0, 0, 255, 255, 255),
      width: 2,
      height: 2,
      channels: 3,
    };
    expect(regionMeanLinear(raster)).toEqual({ r: 0.5, g: 0.5, b: 0.5 });
    // Encoded 0.5 linear is ~188/255, much lighter than the naive 128 average.
    expect(linearToSrgb(regionMeanLinear(raster)).r * 255).toBeCloseTo(187.5, 0);
  });

  it('should equal a direct double-precision mean over a rectangle with odd width', () => {
    const raster = randomRaster(33, 17, 3, 12);
    const rect = { x: 4, y: 3, width: 15, height: 9 };
    let r = 0;
    let g = 0;
    let b = 0;
    for (let y = rect.y; y < rect.y + rect.height; y++) {
      for (let x = rect.x; x < rect.x + rect.width; x++) {
        const i = (y * 33 + x) * 3;
        r += srgbChannelToLinear(raster.data[i] / 255);
        g += srgbChannelToLinear(raster.data[i + 1] / 255);
        b += srgbChannelToLinear(raster.data[i + 2] / 255);
      }
    }
    const n = rect.width * rect.height;
    const mean = regionMeanLinear(raster, rect);
    expect(mean.r).toBeCloseTo(r / n, 13);
    expect(mean.g).toBeCloseTo(g / n, 13);
    expect(mean.b).toBeCloseTo(b / n, 13);
    const lab = regionMeanLab(raster, rect);
    const want = srgbToLab(linearToSrgb({ r: r / n, g: g / n, b: b / n }));
    expect(lab.L).toBeCloseTo(want.L, 9);
    expect(lab.a).toBeCloseTo(want.a, 9);
  });
});

describe('regionLabStats', () => {
  it('should give zero spread for a flat colour and the colour as its mean', () => {
    const data = new Uint8Array(30 * 3);
    for (let i = 0; i < data.length; i += 3) data.set([200, 120, 60], i);
    const stats = regionLabStats({ data, width: 10, height: 3, channels: 3 });
    const want = rgb8ToLab({ r: 200, g: 120, b: 60 });
    expect(stats.mean.L).toBeCloseTo(want.L, 9);
    expect(stats.spread.L).toBeLessThan(1e-6);
    expect(stats.spread.b).toBeLessThan(1e-6);
    expect(stats.pixels).toBe(30);
  });

  it('should give the population standard deviation of per-pixel Lab', () => {
    const raster = randomRaster(16, 16, 3, 21);
    const lab = regionToLab(raster, undefined, new Float64Array(16 * 16 * 3));
    let mean = 0;
    for (let i = 0; i < lab.length; i += 3) mean += lab[i];
    mean /= 256;
    let v = 0;
    for (let i = 0; i < lab.length; i += 3) v += (lab[i] - mean) ** 2;
    expect(regionLabStats(raster).spread.L).toBeCloseTo(Math.sqrt(v / 256), 8);
  });
});

describe('lightnessProfile', () => {
  it('should follow a left-to-right gradient along the long axis', () => {
    const width = 100;
    const height = 10;
    const data = new Uint8Array(width * height * 3);
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++)
        data.fill(250 - 2 * x, (y * width + x) * 3, (y * width + x) * 3 + 3);
    }
    const profile = lightnessProfile({ data, width, height, channels: 3 }, undefined, {
      slices: 10,
    });
    expect(profile).toHaveLength(10);
    for (let k = 1; k < 10; k++) expect(profile[k]).toBeLessThan(profile[k - 1]);
    // First slice: code values 250…232, averaged in linear light.
    let y = 0;
    for (let x = 0; x < 10; x++) y += srgbChannelToLinear((250 - 2 * x) / 255);
    expect(profile[0]).toBeCloseTo(
      srgbToLab(linearToSrgb({ r: y / 10, g: y / 10, b: y / 10 })).L,
      9,
    );
  });

  it('should run along the height for a tall region', () => {
    const data = new Uint8Array(4 * 40 * 3);
    for (let y = 0; y < 40; y++) data.fill(y * 5, y * 12, y * 12 + 12);
    const profile = lightnessProfile({ data, width: 4, height: 40, channels: 3 });
    expect(profile).toHaveLength(40);
    expect(profile[39]).toBeGreaterThan(profile[0]);
  });
});
