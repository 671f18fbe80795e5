import { compareColours } from '../colour/attributes/compare-colours.js';
import { deltaE2000Parts } from '../colour/difference/delta-e-2000.js';
import type { Lab } from '../types/colour.js';
import type { Tolerance } from '../types/drill.js';
import type { TargetMark } from '../types/mark.js';
import { scoreFromMiss } from './score-curve.js';

/**
 * ΔE00 (with parts) and the painter's judgement of one reading against its target,
 * scored on `miss` (default: the full ΔE00) against the tolerance's ΔE00 limit.
 *
 * @param index - the target's index
 * @param target - target Lab
 * @param reading - measured Lab
 * @param tolerance - the drill's tolerance
 * @param miss - which quantity the score uses: 'deltaE' or only the 'lightness' term
 * @returns the target's mark
 * @example
 * markTarget(0, { L: 50, a: 10, b: 10 }, { L: 50, a: 10, b: 10 }, { deltaE: 3 }).score; // 100
 */
export function markTarget(
  index: number,
  target: Lab,
  reading: Lab,
  tolerance: Tolerance,
  miss: 'deltaE' | 'lightness' = 'deltaE',
): TargetMark {
  const parts = deltaE2000Parts(target, reading, tolerance.weights);
  const size = miss === 'deltaE' ? parts.deltaE : Math.abs(parts.lightnessTerm);
  return {
    index,
    target,
    reading,
    deltaE: parts.deltaE,
    parts,
    judgement: compareColours(target, reading),
    score: scoreFromMiss(size, tolerance.deltaE),
    pass: size <= tolerance.deltaE,
  };
}

/**
 * The ΔE00 lightness term between two lightnesses alone (a and b equal): ΔL′/(kL·SL).
 * Used for value checks on profiles, where only L* is known.
 *
 * @param from - reference L*
 * @param to - sample L*
 * @param kL - parametric factor (default 1)
 * @returns the signed lightness term
 * @example
 * lightnessTerm(50, 53); // 3 (SL = 1 at L* = 50)
 */
export function lightnessTerm(from: number, to: number, kL = 1): number {
  return deltaE2000Parts({ L: from, a: 0, b: 0 }, { L: to, a: 0, b: 0 }, { kL }).lightnessTerm;
}
