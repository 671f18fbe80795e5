import { nearestHueNeighbour } from '../colour/attributes/compare-colours.js';
import { labToLch } from '../colour/lab/lab-lch.js';
import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { aboutSwatch, fixed1 } from './format-numbers.js';
import { markTarget } from './mark-target.js';
import { castRemedy } from './painter-words.js';
import { scoreFromMiss } from './score-curve.js';
import { summarise } from './summarise.js';
import { colourFeedback } from './target-feedback.js';
import { resolveTolerance } from './tolerance-bands.js';

/**
 * Grades a `neutral` drill: a grey mixed from complements at a given value. Reading i is
 * graded against target i (usually one).
 *
 * Checks: `value` (ΔE00 lightness term ≤ tolerance.deltaE) and `neutrality` (C*ab ≤
 * tolerance.maxChroma, scored on the same curve). Hue matters only as the cast's
 * direction, which the feedback names with its remedy, and only when the reading's chroma is
 * over that limit: below it the hue angle of a near-grey is meaningless.
 *
 * @param input - grey target(s), one reading each
 * @returns the mark
 * @example
 * gradeNeutral({ targets: [{ lab: { L: 50, a: 0, b: 0 } }], readings: [{ lab: reading }] });
 */
export function gradeNeutral({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('neutral', tolerance);
  const maxChroma = limits.maxChroma ?? 4;
  const several = targets.length > 1;
  const marks = targets.map((t, i) => markTarget(i, t.lab, readings[i].lab, limits, 'lightness'));
  const checks: MarkCheck[] = [];
  const feedback: FeedbackLine[] = [];
  for (const m of marks) {
    checks.push({
      name: 'value',
      swatch: m.index,
      value: Math.abs(m.parts.lightnessTerm),
      limit: limits.deltaE,
      unit: 'ΔE00',
      score: m.score,
      pass: m.pass,
    });
    if (!m.pass) {
      const lines = colourFeedback(m.index, m.target, m.reading, m.parts, m.judgement, false, {
        lightness: true,
      });
      lines.forEach((line) =>
        feedback.push({ ...line, text: aboutSwatch(line.text, m.index, several) }),
      );
    }
    const { C, h } = labToLch(m.reading);
    const neutral = C <= maxChroma;
    checks.push({
      name: 'neutrality',
      swatch: m.index,
      value: C,
      limit: maxChroma,
      unit: 'C*',
      score: scoreFromMiss(C, maxChroma),
      pass: neutral,
    });
    const numbers = `C* ${fixed1(C)} at h ${fixed1(h)}° (a grey needs C* ≤ ${fixed1(maxChroma)})`;
    // Near C* 0 the hue angle is noise (a C* of 1 at h 30° or 300° looks the same grey), so a
    // cast is named only when the reading's own chroma is over the drill's neutral limit.
    if (!neutral) {
      const cast = nearestHueNeighbour(h);
      feedback.push({
        topic: 'neutrality',
        severity: 'fix',
        swatch: m.index,
        text: aboutSwatch(`still has a ${cast} cast: neutralise it with ${castRemedy[cast]}`, m.index, several),
        numbers,
      });
    } else {
      feedback.push({
        topic: 'neutrality',
        severity: 'praise',
        swatch: m.index,
        text: aboutSwatch(
          C < 1 ? 'a true grey, with no cast to see' : 'reads as a grey: its colour is within the limit, too slight to name a cast',
          m.index,
          several,
        ),
        numbers,
      });
    }
  }
  return summarise('neutral', marks, checks, feedback);
}
