import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { aboutSwatch, fixed1 } from './format-numbers.js';
import { markTarget } from './mark-target.js';
import { summarise } from './summarise.js';
import { colourFeedback } from './target-feedback.js';
import { deltaEBand, deltaEBandWords, resolveTolerance } from './tolerance-bands.js';

/**
 * Grades a `match` drill: reading i against target i by ΔE00. Each swatch scores on the
 * curve of `scoreFromMiss` and passes at ΔE00 ≤ tolerance; the attempt passes when every
 * swatch does.
 *
 * @param input - targets, one reading per target, tolerance (default ΔE00 ≤ 3)
 * @returns the mark
 * @example
 * gradeMatch({ targets: [{ lab }], readings: [{ lab }] }).score; // 100
 */
export function gradeMatch({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('match', tolerance);
  const several = targets.length > 1;
  const marks = targets.map((t, i) => markTarget(i, t.lab, readings[i].lab, limits));
  const checks: MarkCheck[] = marks.map((m) => ({
    name: 'colour',
    swatch: m.index,
    value: m.deltaE,
    limit: limits.deltaE,
    unit: 'ΔE00',
    score: m.score,
    pass: m.pass,
  }));
  const feedback: FeedbackLine[] = [];
  for (const m of marks) {
    const band = deltaEBandWords[deltaEBand(m.deltaE)];
    const numbers = `ΔE00 ${m.deltaE.toFixed(2)} (passes at ≤ ${fixed1(limits.deltaE)})`;
    const lines = colourFeedback(m.index, m.target, m.reading, m.parts, m.judgement, m.pass);
    if (m.pass && lines.length === 0) {
      const text = aboutSwatch(`a match: the difference is ${band}`, m.index, several);
      feedback.push({ topic: 'overall', severity: 'praise', swatch: m.index, text, numbers });
    } else if (m.pass) {
      const text = aboutSwatch(`passes: the difference is ${band}`, m.index, several);
      feedback.push({ topic: 'overall', severity: 'praise', swatch: m.index, text, numbers });
    } else {
      const text = aboutSwatch(`not a match yet: the difference is ${band}`, m.index, several);
      feedback.push({ topic: 'overall', severity: 'fix', swatch: m.index, text, numbers });
    }
    for (const line of lines) {
      feedback.push({ ...line, text: aboutSwatch(line.text, m.index, several) });
    }
  }
  return summarise('match', marks, checks, feedback);
}
