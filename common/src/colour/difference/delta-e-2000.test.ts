import { differenceCiede2000 } from 'culori';
import Color from 'colorjs.io';
import { describe, expect, it } from 'vitest';
import type { Lab } from '../../types/colour.js';
import { seededRandom } from '../fixtures/seeded-random.js';
import { deltaE2000, deltaE2000Batch, deltaE2000Parts } from './delta-e-2000.js';
import { deltaE76 } from './delta-e-76.js';
import { sharma2005Pairs } from './fixtures/sharma-2005.js';

const lab = ([L, a, b]: [number, number, number]): Lab => ({ L, a, b });
const culoriDe = differenceCiede2000();
// culori's ΔE00 converts its inputs to lab65 first; giving it lab65 objects feeds raw Lab.
const culori2000 = (x: Lab, y: Lab): number =>
  culoriDe({ mode: 'lab65', l: x.L, a: x.a, b: x.b }, { mode: 'lab65', l: y.L, a: y.a, b: y.b });
// colorjs.io's deltaE2000 works in its own 'lab' space; colours created in 'lab' are not
// converted, so the raw numbers go straight into the formula (STACK.md note).
const colorjs2000 = (x: Lab, y: Lab): number =>
  new Color('lab', [x.L, x.a, x.b]).deltaE2000(new Color('lab', [y.L, y.a, y.b]));

describe('deltaE2000 against Sharma, Wu & Dalal (2005) Table 1', () => {
  it.each(sharma2005Pairs)('should give the published ΔE00 of pair $pair to 4 decimals', (p) => {
    expect(deltaE2000(lab(p.lab1), lab(p.lab2)).toFixed(4)).toBe(p.dE00.toFixed(4));
  });

  it.each(sharma2005Pairs)('should give pair $pair to 4 decimals in reverse order', (p) => {
    expect(deltaE2000(lab(p.lab2), lab(p.lab1)).toFixed(4)).toBe(p.dE00.toFixed(4));
  });

  // Sharma's notes: pairs 21–24 intermediates were computed from unrounded inputs.
  const checkable = sharma2005Pairs.filter((p) => p.pair < 21 || p.pair > 24);
  it.each(checkable)('should match the published intermediates of pair $pair', (p) => {
    const { intermediate: i } = deltaE2000Parts(lab(p.lab1), lab(p.lab2));
    // The table prints 4 decimals, so a correct value sits within half a unit of the last place.
    const near = (got: number, published: number): void =>
      expect(Math.abs(got - published)).toBeLessThanOrEqual(5e-5 + 1e-9);
    near(i.a1Prime, p.a1p);
    near(i.a2Prime, p.a2p);
    near(i.C1Prime, p.C1p);
    near(i.C2Prime, p.C2p);
    near(i.h1Prime, p.h1p);
    near(i.h2Prime, p.h2p);
    near(i.hBarPrime, p.hbarp);
    near(i.G, p.G);
    near(i.T, p.T);
    near(i.SL, p.SL);
    near(i.SC, p.SC);
    near(i.SH, p.SH);
    near(i.RT, p.RT);
  });
});

describe('deltaE2000Parts', () => {
  it('should give a total equal to deltaE2000 and to the terms of Sharma eq. (22)', () => {
    const random = seededRandom(7);
    for (let n = 0; n < 1000; n++) {
      const x = { L: random() * 100, a: random() * 200 - 100, b: random() * 200 - 100 };
      const y = { L: random() * 100, a: random() * 200 - 100, b: random() * 200 - 100 };
      const p = deltaE2000Parts(x, y);
      expect(p.deltaE).toBe(deltaE2000(x, y));
      const sum = p.lightnessTerm ** 2 + p.chromaTerm ** 2 + p.hueTerm ** 2 + p.rotationTerm;
      expect(Math.sqrt(sum)).toBeCloseTo(p.deltaE, 12);
      expect(p.lightnessTerm).toBeCloseTo(p.deltaLPrime / p.intermediate.SL, 12);
      expect(p.chromaTerm).toBeCloseTo(p.deltaCPrime / p.intermediate.SC, 12);
      expect(p.hueTerm).toBeCloseTo(p.deltaHPrime / p.intermediate.SH, 12);
    }
  });

  it('should sign the differences as sample minus reference', () => {
    const target = { L: 50, a: 30, b: 10 };
    const p = deltaE2000Parts(target, { L: 56, a: 40, b: 13.333 });
    expect(p.deltaLPrime).toBeCloseTo(6, 12);
    expect(p.deltaCPrime).toBeGreaterThan(0);
    expect(Math.abs(p.deltaHPrime)).toBeLessThan(0.01);
    const q = deltaE2000Parts(target, { L: 50, a: 30, b: 20 });
    expect(q.deltahPrime).toBeGreaterThan(0); // b* up from a red: hue angle grows
  });

  it('should divide each term by its parametric factor k', () => {
    const x = { L: 40, a: 20, b: -30 };
    const y = { L: 46, a: 25, b: -20 };
    const base = deltaE2000Parts(x, y);
    const weighted = deltaE2000Parts(x, y, { kL: 2, kC: 1.5, kH: 0.5 });
    expect(weighted.lightnessTerm).toBeCloseTo(base.lightnessTerm / 2, 12);
    expect(weighted.chromaTerm).toBeCloseTo(base.chromaTerm / 1.5, 12);
    expect(weighted.hueTerm).toBeCloseTo(base.hueTerm / 0.5, 12);
    expect(deltaE2000(x, y, { kL: 2 })).toBeLessThan(deltaE2000(x, y));
  });
});

describe('deltaE2000 properties and edge cases', () => {
  const edgeCases: [string, Lab, Lab][] = [
    ['two neutrals', { L: 50, a: 0, b: 0 }, { L: 60, a: 0, b: 0 }],
    ['a neutral and a colour', { L: 50, a: 0, b: 0 }, { L: 50, a: 10, b: 10 }],
    ['identical neutrals', { L: 30, a: 0, b: 0 }, { L: 30, a: 0, b: 0 }],
    ['hue across 0/360 (359° vs 1°)', { L: 50, a: 40, b: -0.7 }, { L: 50, a: 40, b: 0.7 }],
    ['hue across 0/360, large chroma', { L: 60, a: 80, b: -5 }, { L: 62, a: 78, b: 6 }],
    ['a* = 0 with b* > 0', { L: 70, a: 0, b: 40 }, { L: 70, a: 2, b: 40 }],
    ['a* = 0 with b* < 0', { L: 30, a: 0, b: -40 }, { L: 31, a: -2, b: -42 }],
    ['opposite hues', { L: 50, a: 0, b: 30 }, { L: 50, a: 0, b: -30 }],
    ['out-of-gamut Lab', { L: 50, a: 150, b: -140 }, { L: 95, a: -128, b: 127 }],
    ['black and white', { L: 0, a: 0, b: 0 }, { L: 100, a: 0, b: 0 }],
  ];

  it.each(edgeCases)('should agree with culori and colorjs.io for %s', (_, x, y) => {
    const ours = deltaE2000(x, y);
    expect(Number.isFinite(ours)).toBe(true);
    expect(Math.abs(ours - culori2000(x, y))).toBeLessThan(1e-4);
    expect(Math.abs(ours - colorjs2000(x, y))).toBeLessThan(1e-4);
    expect(deltaE2000(y, x)).toBeCloseTo(ours, 12);
  });

  it('should be zero for identical colours and positive otherwise', () => {
    expect(deltaE2000({ L: 42, a: -3, b: 17 }, { L: 42, a: -3, b: 17 })).toBe(0);
    expect(deltaE2000({ L: 42, a: -3, b: 17 }, { L: 42, a: -3, b: 17.01 })).toBeGreaterThan(0);
  });

  it('should equal the lightness difference alone for neutrals at L* = 50 (SL = 1)', () => {
    expect(deltaE2000({ L: 49, a: 0, b: 0 }, { L: 51, a: 0, b: 0 })).toBeCloseTo(2, 12);
  });

  it('should agree with culori (lab65) and colorjs.io on 10,000 seeded random Lab pairs to 1e-4', () => {
    const random = seededRandom(2005);
    let worstCuloriGap = 0;
    let worstColorjsGap = 0;
    for (let n = 0; n < 10000; n++) {
      // A wide box (a*, b* ±128) with some close pairs, where grading lives.
      const x = { L: random() * 100, a: random() * 256 - 128, b: random() * 256 - 128 };
      const close = n % 2 === 0;
      const y = close
        ? { L: x.L + random() * 6 - 3, a: x.a + random() * 6 - 3, b: x.b + random() * 6 - 3 }
        : { L: random() * 100, a: random() * 256 - 128, b: random() * 256 - 128 };
      const ours = deltaE2000(x, y);
      worstCuloriGap = Math.max(worstCuloriGap, Math.abs(ours - culori2000(x, y)));
      if (n % 5 === 0)
        worstColorjsGap = Math.max(worstColorjsGap, Math.abs(ours - colorjs2000(x, y)));
      expect(Math.abs(deltaE2000(y, x) - ours)).toBeLessThan(1e-9);
    }
    expect(worstCuloriGap).toBeLessThan(1e-4);
    expect(worstColorjsGap).toBeLessThan(1e-4);
  });
});

describe('deltaE2000Batch', () => {
  it('should give the same values as deltaE2000, pair by pair', () => {
    const first = Float64Array.from(sharma2005Pairs.flatMap((p) => p.lab1));
    const second = Float64Array.from(sharma2005Pairs.flatMap((p) => p.lab2));
    const out = deltaE2000Batch(first, second, new Float64Array(sharma2005Pairs.length));
    sharma2005Pairs.forEach((p, i) => expect(out[i]).toBe(deltaE2000(lab(p.lab1), lab(p.lab2))));
  });
});

describe('deltaE76', () => {
  it('should be the Euclidean distance in CIELAB (CIE 15:2004 §8.2.1.3)', () => {
    expect(deltaE76({ L: 50, a: 0, b: 0 }, { L: 53, a: 4, b: 0 })).toBe(5);
    expect(deltaE76({ L: 10, a: 20, b: 30 }, { L: 10, a: 20, b: 30 })).toBe(0);
  });
});

describe('the short sine series inside deltaE2000', () => {
  it('should keep ΔE00 within 1e-12 of the textbook formula across the blue region', () => {
    // Recompute RT with Math.sin from the reported parts (Sharma eqs. 16–22).
    for (let h = 180; h <= 360; h += 1) {
      const x = {
        L: 50,
        a: 40 * Math.cos((h * Math.PI) / 180),
        b: 40 * Math.sin((h * Math.PI) / 180),
      };
      const y = { L: 52, a: x.a * 1.1 + 1, b: x.b * 0.9 - 1 };
      const p = deltaE2000Parts(x, y);
      const { hBarPrime, C1Prime, C2Prime } = p.intermediate;
      const dTheta = 30 * Math.exp(-(((hBarPrime - 275) / 25) ** 2));
      const Cbar7 = ((C1Prime + C2Prime) / 2) ** 7;
      const RT = -Math.sin((2 * dTheta * Math.PI) / 180) * 2 * Math.sqrt(Cbar7 / (Cbar7 + 25 ** 7));
      expect(Math.abs(p.intermediate.RT - RT)).toBeLessThan(1e-12);
    }
  });
});
