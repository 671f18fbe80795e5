import type { ColourJudgement } from '../colour/attributes/compare-colours.js';
import type { DeltaE2000Parts } from '../colour/difference/delta-e-2000.js';
import type { Lab } from './colour.js';
import type { DrillKind } from './drill.js';

/** What a feedback line is about. */
export type FeedbackTopic =
  | 'overall'
  | 'lightness'
  | 'chroma'
  | 'hue'
  | 'temperature'
  | 'steps'
  | 'order'
  | 'smoothness'
  | 'uniformity'
  | 'separation'
  | 'neutrality';

/**
 * One line of feedback: plain painter's words, and the numbers behind them for those
 * who want them (PRODUCT.md principles).
 */
export type FeedbackLine = {
  topic: FeedbackTopic;
  /** `praise`: well done; `tip`: passes, could be closer; `fix`: why it did not pass. */
  severity: 'praise' | 'tip' | 'fix';
  /** Index into the drill's readings (or targets) the line is about, when it is about one. */
  swatch?: number;
  /** The advice, in painter's words. */
  text: string;
  /** The measurements behind it, e.g. "L* 62.1 vs 55.0 target (ΔL′ +7.1)". */
  numbers: string;
};

/** How one reading compares with its target. */
export type TargetMark = {
  /** Index of the target (and of the reading compared with it). */
  index: number;
  target: Lab;
  reading: Lab;
  /** ΔE00 from target to reading. */
  deltaE: number;
  /** ΔE00 with its parts (reading − target). */
  parts: DeltaE2000Parts;
  /** The painter's judgement of the reading against the target. */
  judgement: ColourJudgement;
  /** 0–100 for this target under the drill's rule (e.g. lightness only in a value ladder). */
  score: number;
  pass: boolean;
};

/** A named criterion of a drill kind (evenness of a ladder, neutrality of a grey …). */
export type MarkCheck = {
  name:
    | 'colour'
    | 'value'
    | 'steps'
    | 'order'
    | 'direction'
    | 'separation'
    | 'neutrality'
    | 'start'
    | 'end'
    | 'smoothness'
    | 'uniformity'
    | 'drift';
  /** Index of the swatch the check is about, when it is about one. */
  swatch?: number;
  /** The measured quantity, in `unit`. */
  value: number;
  /** The pass limit, in `unit` (inclusive; a minimum for `separation`). */
  limit: number;
  unit: 'ΔE00' | 'L*' | 'C*' | 'WC' | 'ΔE*ab' | 'count';
  score: number;
  pass: boolean;
};

/** A teacher's override of a computed mark; set by the backend, never by grading. */
export type MarkOverride = {
  score: number;
  pass: boolean;
  comment?: string;
};

/** The grade of one attempt. */
export type Mark = {
  kind: DrillKind;
  /** 0–100, rounded to an integer. */
  score: number;
  pass: boolean;
  /** Per-target ΔE00 with its parts. */
  targets: TargetMark[];
  /** The kind's criteria, each with its own score. */
  checks: MarkCheck[];
  /** Most important first. */
  feedback: FeedbackLine[];
  override?: MarkOverride;
};
