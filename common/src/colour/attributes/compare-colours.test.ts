import { describe, expect, it } from 'vitest';
import { compareColours } from './compare-colours.js';

describe('compareColours hue lean', () => {
  it('should name no lean when the hue difference is too small to see (ΔE00 hue term under 1, Mixmark’s choice)', () => {
    // Same chroma (C* 30), hue 40° vs 40.5°: ΔH′ ≈ 0.26, far under the threshold of notice.
    const rad = (deg: number) => (deg * Math.PI) / 180;
    const at = (h: number) => ({ L: 50, a: 30 * Math.cos(rad(h)), b: 30 * Math.sin(rad(h)) });
    const judgement = compareColours(at(40), at(40.5));
    expect(Math.abs(judgement.numbers.hueTerm)).toBeLessThan(1);
    expect(judgement.hueLean).toBeUndefined();
    // Turned 15° toward +b*: a visible hue term, named as a lean toward yellow.
    const turned = compareColours(at(40), at(55));
    expect(Math.abs(turned.numbers.hueTerm)).toBeGreaterThanOrEqual(1);
    expect(turned.hueLean).toBe('yellow');
  });

  it('should name no lean for a sample whose own chroma is under the neutral limit, whatever its hue angle', () => {
    // A muted orange reference against a sample at C* ≈ 1.4: its hue angle (135°) means nothing.
    const judgement = compareColours({ L: 50, a: 4, b: 4 }, { L: 50, a: -1, b: 1 });
    expect(judgement.hueLean).toBeUndefined();
    expect(compareColours({ L: 50, a: 0, b: 0 }, { L: 50, a: 1.2, b: -1.2 }).hueLean).toBeUndefined();
  });

  it('should name the cast of a neutral reference when the sample’s chroma is over the limit', () => {
    expect(compareColours({ L: 50, a: 0, b: 0 }, { L: 50, a: 0.5, b: 6 }).hueLean).toBe('yellow');
    expect(compareColours({ L: 50, a: 0, b: 0 }, { L: 50, a: -5, b: 0.3 }).hueLean).toBe('green');
  });
});
