import { describe, expect, it } from '@jest/globals';
import { gradeAttempt, type Lab } from '@mixmark/common';
import { measurePhoto } from './measure-photo';
import { renderScene } from './testing/photo-scene';

// A flat swatch under the graded-wash card's long window (110 × 24 mm): the L* profile along the
// window must exist at any photo size, and read flat. Found by trying the app: on photos larger
// than about 1600 px the sample grid was capped to 160 × 160, lost the window's shape, and the
// wash could not be graded at all.
const paint: Lab = { L: 61, a: 9, b: -24 }; // an invented mid blue

describe('the graded-wash window', () => {
  it.each([
    [1200, 900],
    [4000, 3000],
  ])('should read an L* profile along the long window of a %i × %i photo', async (width, height) => {
    const { jpeg } = await renderScene({
      kind: 'graded-wash', swatches: [paint], width, height, cardFraction: 0.5, rotation: 7, tiltX: 6, tiltY: -5,
      ev: 0, cast: 'shade', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 88, seed: 77,
    });
    const { result } = await measurePhoto(jpeg);
    expect(result.errors).toEqual([]);
    const [reading] = result.readings;
    expect(reading.profile).toHaveLength(16);
    // Flat paint: every slice within 2 L* of the window's mean (vignetting and the light plane
    // leave a little slope; the bound is ours, not a standard's).
    for (const L of reading.profile!) expect(Math.abs(L - reading.lab.L)).toBeLessThan(2);
    // And the grading rule accepts it (a flat wash between two targets fails, with a mark).
    const mark = gradeAttempt('graded-wash', { targets: [{ lab: { L: 80, a: 4, b: -12 } }, { lab: { L: 40, a: 12, b: -34 } }], readings: [reading], tolerance: undefined });
    expect(mark.pass).toBe(false);
    expect(mark.score).toBeGreaterThanOrEqual(0);
  });
});
