import { describe, expect, it } from '@jest/globals';
import { deltaE2000, labToSrgb } from '@mixmark/common';
import { quantile } from './robust-statistics';
import {
  accuracyScene as scene,
  accuracySceneCount as sceneCount,
  accuracySceneSize as sizeOf,
} from './testing/accuracy-scenes';
import { renderScene } from './testing/photo-scene';
import { runMeasureCli } from './testing/run-measure-cli';

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

  // Every scene's card is found with all four corner codes (scene 20, a small ~1 MP card at
  // −1.2 EV whose other codes the half-size finder scan half-missed, reads since the
  // working-size scan is run for the codes still missing).
  it('finds the card in every scene', () => {
    expect(missed).toEqual([]);
  });

  it('meets median ΔE00 ≤ 1.0 over the suite (issue 4)', () => {
    expect(errors.length).toBeGreaterThanOrEqual(150);
    expect(summary().median).toBeLessThanOrEqual(1.0);
  });

  // Issue 4 asks for a 95th percentile ≤ 2.0. Over these 64 scenes (184 readings, card layout
  // v2) it read 2.02 (2.21 / 1.99 on seed sets 2000 / 3000, testing/accuracy-seeds.ts) while
  // every flat patch and window was read with JPEG's rounding of its chroma; with flat areas
  // snapped to the file's own chroma DC lattice (jpeg-lattice.ts) it reads 1.77 here and
  // 2.00 / 1.82 on the other sets (docs/measurement.md). The margin on set 2000 is nil, so
  // this guards the target, not more.
  it('keeps the 95th percentile ΔE00 at or under 2.0 (issue 4)', () => {
    expect(quantile(errors, 0.95)).toBeLessThanOrEqual(2.0);
  });
});
