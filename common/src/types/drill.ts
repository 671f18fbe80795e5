import type { DeltaE2000Weights } from '../colour/difference/delta-e-2000.js';
import type { Lab } from './colour.js';

/** The drill kinds of PRODUCT.md, as used in code, API and screens. */
export const drillKinds = [
  'match',
  'value-ladder',
  'temperature-pair',
  'neutral',
  'graded-wash',
  'flat-wash',
] as const;

/** One of the six drill kinds. */
export type DrillKind = (typeof drillKinds)[number];

/**
 * A target colour of a drill, always held as CIELAB (D65) whatever the teacher typed.
 * Its meaning depends on the kind (see docs/grading.md):
 * - `match`: one target per swatch;
 * - `value-ladder`: one per step, lightest first;
 * - `temperature-pair`: one, the base both swatches are varied from;
 * - `neutral`: one, the grey to reach (its a*, b* are usually 0);
 * - `graded-wash`: two, the colour at the start and at the end of the wash;
 * - `flat-wash`: one, the colour the whole wash should have.
 */
export type Target = {
  lab: Lab;
  /** Optional name shown to students ("step 3", "shadow side"). */
  label?: string;
  /** How the teacher entered it; for display only. */
  enteredAs?: 'hex' | 'lab' | 'lch' | 'measured';
};

/**
 * How strict a drill is. Every limit is an inclusive pass limit; see docs/grading.md for
 * the defaults of each kind and where they come from.
 */
export type Tolerance = {
  /** ΔE00 (or, for value checks, the ΔE00 lightness term) still passing per target. */
  deltaE: number;
  /** CIEDE2000 parametric factors (default kL = kC = kH = 1). */
  weights?: DeltaE2000Weights;
  /** `neutral`: the highest C*ab that still reads as grey. */
  maxChroma?: number;
  /**
   * `value-ladder`: largest step error (L*); `graded-wash`: largest bump off a smooth
   * curve (L*); `flat-wash`: largest spread / drift across the wash (ΔE*ab RMS, L*).
   */
  evenness?: number;
  /** `temperature-pair`: the smallest ΔE00 between the warm and the cool swatch. */
  minSeparation?: number;
};
