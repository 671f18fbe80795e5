import Color from 'colorjs.io';
import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import type { Lab } from '../../types/colour.js';
import { workedHexExamples } from '../fixtures/reference-values.js';
import { seededRandom } from '../fixtures/seeded-random.js';
import { labD65ToD50 } from '../lab/lab-d50.js';
import { hexToLab, labToHex, labToRgb8, rgb8ToLab } from './hex-lab.js';
import { labToSrgb, srgbToLab } from './srgb-lab.js';

const toLab65 = converter('lab65');
const toRgb = converter('rgb');

const expectLab = (got: Lab, [L, a, b]: number[], tolerance: number): void => {
  expect(Math.abs(got.L - L)).toBeLessThan(tolerance);
  expect(Math.abs(got.a - a)).toBeLessThan(tolerance);
  expect(Math.abs(got.b - b)).toBeLessThan(tolerance);
};

describe('hexToLab and labToHex', () => {
  // Values from Mixmark's reference notes (exact IEC matrix, CIE 15:2004 xy whites).
  it.each(workedHexExamples)('should convert $hex to the reference D65 and D50 Lab', (ex) => {
    const got = hexToLab(ex.hex);
    expect(got).toBeDefined();
    expectLab(got!, ex.LabD65, 1e-6);
    expectLab(labD65ToD50(got!), ex.LabD50, 1e-6);
    expect(labToHex(got!)).toBe(ex.hex.toLowerCase());
  });

  it('should return undefined for text that is not a hex colour', () => {
    expect(hexToLab('not a colour')).toBeUndefined();
  });

  it('should round-trip all 8-bit greys and a seeded sample of colours exactly', () => {
    for (let v = 0; v <= 255; v++) {
      expect(labToRgb8(rgb8ToLab({ r: v, g: v, b: v }))).toEqual({ r: v, g: v, b: v });
    }
    const random = seededRandom(11);
    for (let n = 0; n < 2000; n++) {
      const rgb8 = {
        r: Math.floor(random() * 256),
        g: Math.floor(random() * 256),
        b: Math.floor(random() * 256),
      };
      expect(labToRgb8(rgb8ToLab(rgb8))).toEqual(rgb8);
    }
  });

  it('should give sRGB white L* = 100 and a* = b* = 0 exactly enough (xy-derived white)', () => {
    expectLab(hexToLab('#fff')!, [100, 0, 0], 1e-12);
  });
});

describe('srgbToLab against culori and colorjs.io', () => {
  it('should agree on 10,000 seeded random sRGB colours to 1e-6', () => {
    const random = seededRandom(61966);
    for (let n = 0; n < 10000; n++) {
      const rgb = { r: random(), g: random(), b: random() };
      const ours = srgbToLab(rgb);
      const c = toLab65({ mode: 'rgb', ...rgb });
      expectLab(ours, [c.l, c.a, c.b], 1e-6);
      if (n % 10 === 0) {
        const [L, a, b] = new Color('srgb', [rgb.r, rgb.g, rgb.b]).to('lab-d65').coords;
        expectLab(ours, [L as number, a as number, b as number], 1e-6);
      }
    }
  });
});

describe('labToSrgb', () => {
  it('should agree with culori on 10,000 seeded random Lab colours, in or out of gamut, to 1e-6', () => {
    const random = seededRandom(1976);
    let outside = 0;
    for (let n = 0; n < 10000; n++) {
      const lab = { L: random() * 100, a: random() * 200 - 100, b: random() * 200 - 100 };
      const { unclipped, inGamut, rgb } = labToSrgb(lab);
      const c = toRgb({ mode: 'lab65', l: lab.L, a: lab.a, b: lab.b });
      expect(Math.abs(unclipped.r - c.r)).toBeLessThan(1e-6);
      expect(Math.abs(unclipped.g - c.g)).toBeLessThan(1e-6);
      expect(Math.abs(unclipped.b - c.b)).toBeLessThan(1e-6);
      const inside = [c.r, c.g, c.b].every((v) => v >= -1e-9 && v <= 1 + 1e-9);
      expect(inGamut).toBe(inside);
      if (!inGamut) outside++;
      for (const v of [rgb.r, rgb.g, rgb.b]) expect(v >= 0 && v <= 1).toBe(true);
    }
    expect(outside).toBeGreaterThan(1000); // the box reaches well outside sRGB
  });

  it('should flag an out-of-gamut Lab and fall back to a clipped colour', () => {
    const result = labToSrgb({ L: 50, a: 0, b: 120 });
    expect(result.inGamut).toBe(false);
    expect(result.unclipped.b).toBeLessThan(0);
    expect(result.rgb.b).toBe(0);
  });

  it('should round-trip in-gamut colours: sRGB -> Lab -> sRGB to 1e-9', () => {
    const random = seededRandom(3);
    for (let n = 0; n < 1000; n++) {
      const rgb = { r: random(), g: random(), b: random() };
      const back = labToSrgb(srgbToLab(rgb));
      expect(back.inGamut).toBe(true);
      expect(back.rgb.r).toBeCloseTo(rgb.r, 9);
      expect(back.rgb.g).toBeCloseTo(rgb.g, 9);
      expect(back.rgb.b).toBeCloseTo(rgb.b, 9);
    }
  });
});
