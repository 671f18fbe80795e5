import { describe, expect, it } from 'vitest';
import { D65, illuminantC } from '../constants.js';
import { munsellChromatic, munsellNeutrals } from '../fixtures/reference-values.js';
import { xyzToLab } from '../lab/convert-xyz-to-lab.js';
import { lchToLab } from '../lab/lab-lch.js';
import { yFromLightness } from '../lab/lightness.js';
import { adaptXyz } from '../xyz/bradford.js';
import { compareColours } from './compare-colours.js';
import { greyscaleHex, greyscaleLab } from './greyscale.js';
import { munsellValueFromY, yFromMunsellValue } from './munsell-value.js';
import { warmCoolIndex } from './warm-cool-index.js';

describe('munsellValueFromY (ASTM D1535 inverted by Newton)', () => {
  // Newhall, Nickerson & Judd (1943) Table I neutrals; Y on the MgO scale × 0.975 gives the
  // perfect-diffuser Y that ASTM D1535 uses. The D1535 polynomial fits the renotation
  // to a few hundredths of a value step.
  it.each(munsellNeutrals)('should give value $value for the renotation grey N$value', (n) => {
    expect(Math.abs(munsellValueFromY((n.YRenotation * 0.975) / 100) - n.value)).toBeLessThan(0.01);
  });

  // colour-science's luminance_ASTMD1535 values for the same value levels.
  it.each(munsellNeutrals)('should invert the ASTM D1535 polynomial at value $value', (n) => {
    expect(yFromMunsellValue(n.value) * 100).toBeCloseTo(n.YAstm, 3);
    expect(munsellValueFromY(n.YAstm / 100)).toBeCloseTo(n.value, 4);
  });

  it('should round-trip Y -> V -> Y across the whole scale', () => {
    for (let v = 0.05; v <= 10; v += 0.05) {
      expect(munsellValueFromY(yFromMunsellValue(v))).toBeCloseTo(v, 10);
    }
    expect(munsellValueFromY(0)).toBe(0);
    expect(munsellValueFromY(1)).toBeGreaterThan(9.9);
    expect(munsellValueFromY(1)).toBeLessThan(10);
  });

  it('should put an 18 % grey card between the renotation greys N4 and N5', () => {
    // N4 = 12.00 and N5 = 19.77 (MgO) = 11.70 % and 19.28 % of the perfect diffuser.
    expect(munsellValueFromY(0.18)).toBeGreaterThan(4);
    expect(munsellValueFromY(0.18)).toBeLessThan(5);
    expect(munsellValueFromY(yFromLightness(50))).toBeGreaterThan(munsellValueFromY(0.18));
  });
});

describe('warmCoolIndex (Ou, Luo, Woodcock & Wright 2004)', () => {
  it('should give every neutral −0.5', () => {
    expect(warmCoolIndex({ L: 20, a: 0, b: 0 })).toBe(-0.5);
    expect(warmCoolIndex({ L: 90, a: 0, b: 0 })).toBe(-0.5);
  });

  it('should equal −0.5 + 0.02·C^1.07·cos(h − 50°) with its extremes at 50° and 230°', () => {
    const at = (C: number, h: number) => warmCoolIndex(lchToLab({ L: 50, C, h }));
    expect(at(40, 50)).toBeCloseTo(-0.5 + 0.02 * 40 ** 1.07, 12);
    expect(at(40, 230)).toBeCloseTo(-0.5 - 0.02 * 40 ** 1.07, 12);
    expect(at(40, 140)).toBeCloseTo(-0.5, 12);
    for (let h = 0; h < 360; h += 5) {
      expect(at(40, h)).toBeLessThanOrEqual(at(40, 50) + 1e-12);
      expect(at(40, h)).toBeGreaterThanOrEqual(at(40, 230) - 1e-12);
    }
  });

  it('should rank the Munsell renotation 5/6 hues warm (R, YR, Y) above cool (BG, B, PB)', () => {
    // Renotation xyY is under Illuminant C on the MgO scale: × 0.975, then Bradford to D65.
    const labOf = (munsell: string) => {
      const s = munsellChromatic.find((m) => m.munsell === munsell)!;
      const Y = (s.Y * 0.975) / 100;
      const xyzC = { X: (s.x / s.y) * Y, Y, Z: ((1 - s.x - s.y) / s.y) * Y };
      return xyzToLab(adaptXyz(xyzC, illuminantC, D65));
    };
    const warm = ['5R 5/6', '5YR 5/6', '5Y 5/6'].map((m) => warmCoolIndex(labOf(m)));
    const cool = ['5BG 5/6', '5B 5/6', '5PB 5/6'].map((m) => warmCoolIndex(labOf(m)));
    expect(Math.min(...warm)).toBeGreaterThan(Math.max(...cool));
    expect(warmCoolIndex(labOf('5YR 5/6'))).toBeGreaterThan(0);
    expect(warmCoolIndex(labOf('5B 5/6'))).toBeLessThan(-0.5);
  });
});

describe('compareColours', () => {
  const orange = lchToLab({ L: 60, C: 50, h: 60 });

  it('should call an identical colour the same in every attribute', () => {
    const j = compareColours(orange, orange);
    expect([j.lightness, j.temperature, j.intensity, j.hueLean]).toEqual([
      'same',
      'same',
      'same',
      undefined,
    ]);
  });

  it('should say lighter/darker from L*', () => {
    expect(compareColours(orange, { ...orange, L: 66 }).lightness).toBe('lighter');
    expect(compareColours(orange, { ...orange, L: 54 }).lightness).toBe('darker');
    expect(compareColours(orange, { ...orange, L: 60.3 }).lightness).toBe('same');
  });

  it('should say more/less intense from chroma', () => {
    expect(compareColours(orange, lchToLab({ L: 60, C: 60, h: 60 })).intensity).toBe(
      'more-intense',
    );
    expect(compareColours(orange, lchToLab({ L: 60, C: 35, h: 60 })).intensity).toBe(
      'less-intense',
    );
  });

  it('should see an orange turned toward yellow as leaning yellow and cooler', () => {
    const j = compareColours(orange, lchToLab({ L: 60, C: 50, h: 75 }));
    expect(j.hueLean).toBe('yellow');
    expect(j.temperature).toBe('cooler');
  });

  it('should see a yellow-orange turned toward red as leaning red and warmer (h 80° → 65°)', () => {
    const j = compareColours(lchToLab({ L: 60, C: 50, h: 80 }), lchToLab({ L: 60, C: 50, h: 65 }));
    expect(j.hueLean).toBe('red');
    expect(j.temperature).toBe('warmer');
  });

  it('should name leans correctly across the 0/360 seam and from a hue on an axis', () => {
    const magenta = lchToLab({ L: 50, C: 40, h: 355 });
    // Turning counter-clockwise from 355° to 10° crosses red and heads on toward yellow.
    expect(compareColours(magenta, lchToLab({ L: 50, C: 40, h: 10 })).hueLean).toBe('yellow');
    const scarlet = lchToLab({ L: 50, C: 40, h: 10 });
    expect(compareColours(scarlet, lchToLab({ L: 50, C: 40, h: 355 })).hueLean).toBe('blue');
    expect(compareColours(magenta, lchToLab({ L: 50, C: 40, h: 335 })).hueLean).toBe('blue');
    const yellow = lchToLab({ L: 80, C: 60, h: 90 });
    expect(compareColours(yellow, lchToLab({ L: 80, C: 60, h: 80 })).hueLean).toBe('red');
    expect(compareColours(yellow, lchToLab({ L: 80, C: 60, h: 100 })).hueLean).toBe('green');
  });

  it('should name the cast of a near-neutral by its own hue', () => {
    const grey = { L: 50, a: 0, b: 0 };
    expect(compareColours(grey, { L: 50, a: 1, b: 6 }).hueLean).toBe('yellow');
    expect(compareColours(grey, { L: 50, a: 0, b: -6 }).hueLean).toBe('blue');
    expect(compareColours(grey, { L: 50, a: 0.2, b: 0.2 }).hueLean).toBeUndefined();
  });
});

describe('greyscale preview', () => {
  it('should keep L* and drop the chroma', () => {
    expect(greyscaleLab({ L: 62, a: 30, b: 40 })).toEqual({ L: 62, a: 0, b: 0 });
    // #777777 has L* 50.034439 (reference notes, worked hex examples).
    expect(greyscaleHex({ L: 50.034439, a: 20, b: -10 })).toBe('#777777');
    expect(greyscaleHex({ L: 100, a: 0, b: 90 })).toBe('#ffffff');
  });
});
