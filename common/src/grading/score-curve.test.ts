import { describe, expect, it } from 'vitest';
import { passScore, scoreFromMiss } from './score-curve.js';
import { deltaEBand, resolveTolerance } from './tolerance-bands.js';

describe('scoreFromMiss (Mixmark scoring curve, docs/grading.md)', () => {
  it('should give 100 for no miss and the pass score at the limit', () => {
    expect(scoreFromMiss(0, 3)).toBe(100);
    expect(scoreFromMiss(3, 3)).toBeCloseTo(passScore, 12);
    expect(scoreFromMiss(-3, 3)).toBeCloseTo(passScore, 12);
  });

  it('should fall monotonically, to about 24 at twice and 4 at three times the limit', () => {
    let previous = 101;
    for (let x = 0; x <= 12; x += 0.25) {
      const s = scoreFromMiss(x, 3);
      expect(s).toBeLessThan(previous);
      previous = s;
    }
    expect(scoreFromMiss(6, 3)).toBeCloseTo(100 * 0.7 ** 4, 10);
    expect(scoreFromMiss(9, 3)).toBeCloseTo(100 * 0.7 ** 9, 10);
  });

  it('should cost little below the threshold of notice (ΔE00 1 at a limit of 3 keeps > 95)', () => {
    expect(scoreFromMiss(1, 3)).toBeGreaterThan(95);
  });
});

describe('deltaEBand (common practice, docs/grading.md)', () => {
  it.each([
    [0.4, 'imperceptible'],
    [1.5, 'slight'],
    [2.5, 'visible'],
    [4, 'clear'],
    [5.01, 'different'],
  ] as const)('should call ΔE00 %d %s', (dE, band) => {
    expect(deltaEBand(dE)).toBe(band);
  });
});

describe('resolveTolerance', () => {
  it('should fill unset limits from the kind defaults and keep the teacher’s', () => {
    expect(resolveTolerance('neutral', { deltaE: 2 })).toEqual({ deltaE: 2, maxChroma: 4 });
    expect(resolveTolerance('match')).toEqual({ deltaE: 3 });
    expect(resolveTolerance('flat-wash', { evenness: undefined })).toEqual({
      deltaE: 3,
      evenness: 3,
    });
  });
});
