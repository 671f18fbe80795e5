import type { DrillKind, Tolerance } from '../types/drill.js';

/** Bands of ΔE00 in words (docs/grading.md gives where each comes from). */
export type DeltaEBand = 'imperceptible' | 'slight' | 'visible' | 'clear' | 'different';

/**
 * Names a ΔE00 by band: below 1 at or under the threshold of notice; 1–2 slight, seen
 * only side by side by a trained eye; 2–3 visible side by side; 3–5 clearly visible but
 * the same colour family; above 5 another colour. Common practice in colour-matching
 * trades, not a standard (see docs/grading.md).
 *
 * @param deltaE - a ΔE00
 * @returns its band
 * @example
 * deltaEBand(2.4); // 'visible'
 */
export function deltaEBand(deltaE: number): DeltaEBand {
  if (deltaE < 1) return 'imperceptible';
  if (deltaE < 2) return 'slight';
  if (deltaE < 3) return 'visible';
  if (deltaE <= 5) return 'clear';
  return 'different';
}

/** A short phrase for each band, for feedback lines. */
export const deltaEBandWords: Record<DeltaEBand, string> = {
  imperceptible: 'at the threshold of notice',
  slight: 'slight, seen only side by side',
  visible: 'visible side by side',
  clear: 'clearly visible, though the same colour family',
  different: 'big enough to read as another colour',
};

/**
 * Default tolerances per drill kind (Mixmark's choices, explained in docs/grading.md):
 * a phone photo through the card resolves about ±1–2 ΔE00, so limits sit at 3 rather
 * than at the threshold of notice.
 */
export const defaultTolerances: Record<DrillKind, Tolerance> = {
  match: { deltaE: 3 },
  'value-ladder': { deltaE: 3, evenness: 3 },
  'temperature-pair': { deltaE: 3, minSeparation: 3 },
  neutral: { deltaE: 3, maxChroma: 4 },
  'graded-wash': { deltaE: 4, evenness: 2 },
  'flat-wash': { deltaE: 3, evenness: 3 },
};

/**
 * A drill's tolerance with the kind's defaults filled in where the teacher left a
 * limit unset.
 *
 * @param kind - the drill kind
 * @param tolerance - the teacher's limits (any subset)
 * @returns a complete tolerance
 * @example
 * resolveTolerance('neutral', { deltaE: 2 }); // { deltaE: 2, maxChroma: 4 }
 */
export function resolveTolerance(kind: DrillKind, tolerance: Partial<Tolerance> = {}): Tolerance {
  const defined = Object.fromEntries(
    Object.entries(tolerance).filter(([, v]) => v !== undefined),
  ) as Partial<Tolerance>;
  return { ...defaultTolerances[kind], ...defined };
}
