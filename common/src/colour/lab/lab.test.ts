import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import { epsilon, kappa } from '../constants.js';
import { greyCard, labCheckValues, lightnessCheckValues } from '../fixtures/reference-values.js';
import { seededRandom } from '../fixtures/seeded-random.js';
import { labToXyz } from './convert-lab-to-xyz.js';
import { xyzToLab } from './convert-xyz-to-lab.js';
import { labToLch, lchToLab } from './lab-lch.js';
import { labD50ToD65, labD65ToD50 } from './lab-d50.js';
import { lightnessFromY, yFromLightness } from './lightness.js';

const toLch65 = converter('lch65');

describe('CIE 1976 constants (CIE 15:2004 §8.2.1.1)', () => {
  it('should use the exact rationals epsilon = (6/29)^3 and kappa = (29/3)^3', () => {
    expect(epsilon).toBeCloseTo((6 / 29) ** 3, 17);
    expect(kappa).toBeCloseTo((29 / 3) ** 3, 12);
    expect(epsilon).toBeCloseTo(0.008856451679035631, 17);
    expect(kappa).toBeCloseTo(903.2962962962963, 12);
  });
});

describe('lightnessFromY', () => {
  it('should give an 18 % grey card L* ≈ 49.5 (CIE 1976: 116·0.18^(1/3) − 16)', () => {
    expect(lightnessFromY(greyCard.Y)).toBeCloseTo(greyCard.Lstar, 6);
    expect(lightnessFromY(greyCard.Y).toFixed(1)).toBe('49.5');
    expect(yFromLightness(50)).toBeCloseTo(greyCard.YForLstar50, 6);
  });

  // colour-science test_lightness.py (test_lightness_CIE1976): Y relative to Yn.
  it.each(lightnessCheckValues)(
    'should give L* $Lstar for Y $Y with Yn $Yn',
    ({ Y, Yn, Lstar }) => {
      expect(lightnessFromY(Y / Yn)).toBeCloseTo(Lstar, 9);
      expect(yFromLightness(Lstar)).toBeCloseTo(Y / Yn, 12);
    },
  );

  it('should be continuous at the join of the two segments', () => {
    expect(lightnessFromY(epsilon)).toBeCloseTo(lightnessFromY(epsilon * (1 + 1e-12)), 9);
    expect(lightnessFromY(epsilon)).toBeCloseTo(8, 12);
  });
});

describe('xyzToLab and labToXyz', () => {
  // colour-science test_cie_lab.py; the white changes without adapting the sample.
  it.each(labCheckValues)('should give the colour-science Lab for white xy $whiteXy', (c) => {
    const [x, y] = c.whiteXy;
    const white = { X: x / y, Y: 1, Z: (1 - x - y) / y };
    const lab = xyzToLab({ X: c.XYZ[0], Y: c.XYZ[1], Z: c.XYZ[2] }, white);
    expect(lab.L).toBeCloseTo(c.Lab[0], 7);
    expect(lab.a).toBeCloseTo(c.Lab[1], 7);
    expect(lab.b).toBeCloseTo(c.Lab[2], 7);
    const back = labToXyz(lab, white);
    expect(back.X).toBeCloseTo(c.XYZ[0], 12);
    expect(back.Z).toBeCloseTo(c.XYZ[2], 12);
  });

  it('should round-trip lab -> xyz -> lab, including dark colours below L* = 8', () => {
    const random = seededRandom(15);
    for (let n = 0; n < 2000; n++) {
      const lab = { L: random() * 100, a: random() * 200 - 100, b: random() * 200 - 100 };
      if (n % 4 === 0) lab.L = random() * 8;
      const back = xyzToLab(labToXyz(lab));
      expect(back.L).toBeCloseTo(lab.L, 10);
      expect(back.a).toBeCloseTo(lab.a, 10);
      expect(back.b).toBeCloseTo(lab.b, 10);
    }
  });

  it('should map black and white to L* 0 and 100 with a* = b* = 0', () => {
    const white = xyzToLab(labToXyz({ L: 100, a: 0, b: 0 }));
    expect(white.L).toBeCloseTo(100, 12);
    expect(xyzToLab({ X: 0, Y: 0, Z: 0 })).toEqual({ L: 0, a: 0, b: 0 });
  });

  it('should round-trip D65 Lab through D50 Lab (Bradford)', () => {
    const lab = { L: 42, a: 20, b: -30 };
    const back = labD50ToD65(labD65ToD50(lab));
    expect(back.L).toBeCloseTo(42, 10);
    expect(back.a).toBeCloseTo(20, 10);
    expect(back.b).toBeCloseTo(-30, 10);
  });
});

describe('labToLch and lchToLab', () => {
  it('should agree with culori lch65 on seeded random colours to 1e-6', () => {
    const random = seededRandom(8);
    for (let n = 0; n < 10000; n++) {
      const lab = { L: random() * 100, a: random() * 256 - 128, b: random() * 256 - 128 };
      const ours = labToLch(lab);
      const c = toLch65({ mode: 'lab65', l: lab.L, a: lab.a, b: lab.b });
      expect(Math.abs(ours.C - c.c)).toBeLessThan(1e-6);
      expect(Math.abs(ours.h - (c.h ?? 0))).toBeLessThan(1e-6);
      const back = lchToLab(ours);
      expect(back.a).toBeCloseTo(lab.a, 10);
      expect(back.b).toBeCloseTo(lab.b, 10);
    }
  });

  it('should give h in [0, 360) across the 0/360 seam, 90° for a* = 0 with b* > 0, 0 for neutrals', () => {
    expect(labToLch({ L: 50, a: 10, b: -1e-9 }).h).toBeGreaterThan(359.99);
    expect(labToLch({ L: 50, a: 10, b: -1e-9 }).h).toBeLessThan(360);
    expect(labToLch({ L: 50, a: 0, b: 5 }).h).toBe(90);
    expect(labToLch({ L: 50, a: 0, b: -5 }).h).toBe(270);
    expect(labToLch({ L: 50, a: 0, b: 0 })).toEqual({ L: 50, C: 0, h: 0 });
  });
});
