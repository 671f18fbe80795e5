import type { Lab } from '@mixmark/common';
import type { CardKind } from '../../cards/card-layout.types';
import { casts, type SceneOptions } from './photo-scene';
import { seededRandom } from './seeded-random';

/** Swatch colours a painting class mixes: earths, a blue, greens, greys, pale and deep
 * values (test choices, all inside the sRGB gamut so the truth is printable on screen). */
export const palette: Lab[] = [
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

/** The suite's seed set: scene i draws its pose and light from seed 1000 + i and its noise
 * from seed i. Other sets (`seedBase` 2000, 3000, …) draw the same ranges from other seeds,
 * to check that a change holds beyond the suite's own scenes. */
export const suiteSeedBase = 1000;

/** A varied but reproducible scene: rotation anywhere, tilt up to 35°, −1.5 to +1 EV, every
 * cast, cross-talk, flare, vignetting, noise and JPEG quality 60–95 (issue 4's ranges). */
export function accuracyScene(
  index: number,
  size: [number, number],
  seedBase = suiteSeedBase,
): SceneOptions {
  const random = seededRandom(seedBase + index);
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
    seed: index + (seedBase - suiteSeedBase),
  };
}

/** Scenes in the suite: enough that the 95th percentile is not one or two readings (about
 * 170 readings; over 33 it moved from 1.8 to 2.7 with the seeds). */
export const accuracySceneCount = 64;

/** Frame size by formula, not by outcome: every 25th scene (12, 37, 62) is a 12 MP photo,
 * the rest alternate 900 × 1200 portrait and 1200 × 900 landscape. */
export const accuracySceneSize = (index: number): [number, number] =>
  index % 25 === 12 ? [4000, 3000] : index % 2 ? [1200, 900] : [900, 1200];
