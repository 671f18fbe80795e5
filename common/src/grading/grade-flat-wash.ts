import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { fixed1 } from './format-numbers.js';
import { markTarget } from './mark-target.js';
import { scoreFromMiss } from './score-curve.js';
import { summarise } from './summarise.js';
import { colourFeedback } from './target-feedback.js';
import { deltaEBand, deltaEBandWords, resolveTolerance } from './tolerance-bands.js';

/**
 * Grades a `flat-wash` drill: one window that should be a single even colour.
 *
 * Checks: `colour` (ΔE00 of the mean to the target ≤ tolerance.deltaE); `uniformity`
 * (RMS spread of the pixels, √(σL² + σa² + σb²) in ΔE*ab, ≤ tolerance.evenness) when
 * the reading has a spread; `drift` (range of L* along the long axis ≤
 * tolerance.evenness) when it has a profile.
 *
 * @param input - one target; one reading (with spread and/or profile)
 * @returns the mark
 * @example
 * gradeFlatWash({ targets: [{ lab }], readings: [{ lab, spread, profile }] });
 */
export function gradeFlatWash({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('flat-wash', tolerance);
  const evenness = limits.evenness ?? 3;
  const reading = readings[0];
  const m = markTarget(0, targets[0].lab, reading.lab, limits);
  const checks: MarkCheck[] = [
    {
      name: 'colour',
      swatch: 0,
      value: m.deltaE,
      limit: limits.deltaE,
      unit: 'ΔE00',
      score: m.score,
      pass: m.pass,
    },
  ];
  const feedback: FeedbackLine[] = colourFeedback(
    0,
    m.target,
    m.reading,
    m.parts,
    m.judgement,
    m.pass,
  );
  feedback.unshift({
    topic: 'overall',
    severity: m.pass ? 'praise' : 'fix',
    text: m.pass
      ? `The colour is right: the difference is ${deltaEBandWords[deltaEBand(m.deltaE)]}`
      : `The colour is off: the difference is ${deltaEBandWords[deltaEBand(m.deltaE)]}`,
    numbers: `ΔE00 ${m.deltaE.toFixed(2)} (passes at ≤ ${fixed1(limits.deltaE)})`,
  });

  if (reading.spread) {
    const { L, a, b } = reading.spread;
    const rms = Math.sqrt(L * L + a * a + b * b);
    const pass = rms <= evenness;
    checks.push({
      name: 'uniformity',
      value: rms,
      limit: evenness,
      unit: 'ΔE*ab',
      score: scoreFromMiss(rms, evenness),
      pass,
    });
    feedback.push({
      topic: 'uniformity',
      severity: pass ? 'praise' : 'fix',
      text: pass
        ? 'Even across the window'
        : L >= Math.max(a, b)
          ? 'Patchy in value: work wet into wet with a fully loaded brush, and do not go back into drying paint'
          : 'Patchy in colour: mix enough of one batch and stir it before each stroke',
      numbers: `spread ${fixed1(rms)} ΔE*ab RMS (σL* ${fixed1(L)}, σa* ${fixed1(a)}, σb* ${fixed1(b)}; allowed ${fixed1(evenness)})`,
    });
  }

  if (reading.profile && reading.profile.length > 1) {
    const p = reading.profile;
    const range = Math.max(...p) - Math.min(...p);
    const pass = range <= evenness;
    checks.push({
      name: 'drift',
      value: range,
      limit: evenness,
      unit: 'L*',
      score: scoreFromMiss(range, evenness),
      pass,
    });
    if (!pass) {
      const darkerAtEnd = p[p.length - 1] < p[0];
      feedback.push({
        topic: 'uniformity',
        severity: 'fix',
        text: darkerAtEnd
          ? 'The wash gets darker toward the end: paint pooled there; keep the bead even and lift the excess at the bottom'
          : 'The wash gets lighter toward the end: the brush ran short; mix more than you need and reload before it runs dry',
        numbers: `L* ${fixed1(p[0])} at the start, ${fixed1(p[p.length - 1])} at the end (range ${fixed1(range)}, allowed ${fixed1(evenness)})`,
      });
    }
  }
  return summarise('flat-wash', [m], checks, feedback);
}
