import type { Lab } from '../../types/colour.js';
import { deltaE2000Parts } from '../difference/delta-e-2000.js';
import { labToLch } from '../lab/lab-lch.js';
import { warmCoolIndex } from './warm-cool-index.js';

/** The four hue neighbours painters name, placed on the CIELAB a*, b* half-axes. */
export type HueNeighbour = 'red' | 'yellow' | 'green' | 'blue';

/** How a sample differs from a reference, attribute by attribute, in painter's terms. */
export type ColourJudgement = {
  lightness: 'lighter' | 'darker' | 'same';
  temperature: 'warmer' | 'cooler' | 'same';
  intensity: 'more-intense' | 'less-intense' | 'same';
  /** Which neighbour the sample's hue has turned toward; `undefined` when the hue matches. */
  hueLean: HueNeighbour | undefined;
  /** The numbers behind the words (sample − reference). */
  numbers: {
    deltaE: number;
    deltaL: number;
    deltaC: number;
    deltaHue: number;
    deltaWarmCool: number;
    lightnessTerm: number;
    chromaTerm: number;
    hueTerm: number;
  };
};

/** Thresholds below which an attribute counts as "the same". */
export type JudgementThresholds = {
  /** For the weighted ΔE00 terms; 1 ≈ the threshold of notice (default 1). */
  notice?: number;
  /** For the warm–cool index (default 0.03, see docs/grading.md). */
  warmCool?: number;
  /**
   * Chroma (C*ab) at or below which a colour counts as neutral (default 2): a neutral reference
   * makes any visible hue a cast; a neutral sample has no hue to lean.
   */
  neutralChroma?: number;
};

// Half-axes of CIELAB in order of increasing hue angle: +a* red, +b* yellow, −a* green, −b* blue.
const neighbours: HueNeighbour[] = ['red', 'yellow', 'green', 'blue'];

/**
 * The neighbour a hue rotation heads toward, seen from where the sample ended up: turning
 * counter-clockwise (+Δh) the next half-axis at or above the sample's hue, clockwise the
 * one at or below it. Seen from the sample, a hue that crossed an axis is named by the
 * side it landed on (a red turned past 0° to 355° leans blue, not red).
 */
function neighbourToward(sampleHue: number, direction: number): HueNeighbour {
  const index = direction > 0 ? Math.ceil(sampleHue / 90) : Math.floor(sampleHue / 90);
  return neighbours[index % 4];
}

/** The half-axis nearest a hue angle: the name of a cast on a near-neutral. */
export function nearestHueNeighbour(h: number): HueNeighbour {
  return neighbours[Math.round(h / 90) % 4];
}

/**
 * Judges a sample against a reference the way a painter would say it: lighter or darker
 * (ΔL′ term of ΔE00), more or less intense (ΔC′ term), warmer or cooler (the Ou et al. 2004
 * warm–cool index) and which neighbour the hue leans toward (red, yellow, green, blue by
 * the a*, b* half-axes). Attributes under the threshold of notice are "same".
 *
 * @param reference - the colour to compare against (e.g. the target)
 * @param sample - the colour being judged (e.g. the reading)
 * @param thresholds - when differences count
 * @returns the judgement with its numbers
 * @example
 * compareColours({ L: 50, a: 20, b: 20 }, { L: 58, a: 20, b: 20 }).lightness; // 'lighter'
 */
export function compareColours(
  reference: Lab,
  sample: Lab,
  thresholds: JudgementThresholds = {},
): ColourJudgement {
  const notice = thresholds.notice ?? 1;
  const warmCoolStep = thresholds.warmCool ?? 0.03;
  const neutralChroma = thresholds.neutralChroma ?? 2;
  const parts = deltaE2000Parts(reference, sample);
  const ref = labToLch(reference);
  const smp = labToLch(sample);
  const deltaWarmCool = warmCoolIndex(sample) - warmCoolIndex(reference);

  // A lean is named only when the hue difference is large enough to see: the ΔE00 hue term at
  // least `notice` (1 by default, about the threshold of notice; Mixmark's choice). And only
  // when the sample has a hue at all: with its own chroma under the neutral limit its hue angle
  // is meaningless (a C* of 0.5 may sit at any angle), whatever the reference.
  let hueLean: HueNeighbour | undefined;
  if (smp.C <= neutralChroma) {
    hueLean = undefined;
  } else if (ref.C < neutralChroma) {
    // A near-neutral has no hue to keep: visible chroma is a cast toward the sample's own hue.
    if (Math.abs(parts.chromaTerm) >= notice) hueLean = nearestHueNeighbour(smp.h);
  } else if (Math.abs(parts.hueTerm) >= notice) {
    hueLean = neighbourToward(smp.h, parts.deltahPrime);
  }

  const sign = (term: number): number => (Math.abs(term) < notice ? 0 : Math.sign(term));
  const l = sign(parts.lightnessTerm);
  const c = sign(parts.chromaTerm);
  const t = Math.abs(deltaWarmCool) < warmCoolStep ? 0 : Math.sign(deltaWarmCool);
  return {
    lightness: l > 0 ? 'lighter' : l < 0 ? 'darker' : 'same',
    temperature: t > 0 ? 'warmer' : t < 0 ? 'cooler' : 'same',
    intensity: c > 0 ? 'more-intense' : c < 0 ? 'less-intense' : 'same',
    hueLean,
    numbers: {
      deltaE: parts.deltaE,
      deltaL: sample.L - reference.L,
      deltaC: smp.C - ref.C,
      deltaHue: parts.deltahPrime,
      deltaWarmCool,
      lightnessTerm: parts.lightnessTerm,
      chromaTerm: parts.chromaTerm,
      hueTerm: parts.hueTerm,
    },
  };
}
