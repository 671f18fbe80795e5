import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { fixed1, sentence, signed1, swatchName } from './format-numbers.js';
import { markTarget } from './mark-target.js';
import { scoreFromMiss } from './score-curve.js';
import { summarise } from './summarise.js';
import { colourFeedback } from './target-feedback.js';
import { resolveTolerance } from './tolerance-bands.js';

/** A step of less than this many L* counts as "no step at all" (Mixmark's choice). */
const flatStep = 1;

/**
 * Grades a `value-ladder` drill: N swatches that should step evenly from light to dark
 * (or dark to light, following the targets). Only value is graded; hue and chroma are
 * reported in the per-target parts but do not count.
 *
 * Checks: `value` per swatch (ΔE00 lightness term ≤ tolerance.deltaE), `steps` (largest
 * difference between a painted step and the target step, in L*, ≤ tolerance.evenness),
 * `order` (every step goes the same way as the targets' and by at least 1 L*).
 *
 * @param input - targets lightest first (or darkest first), one reading per target
 * @returns the mark; feedback names the uneven step and the swatch to change
 * @example
 * gradeValueLadder({ targets: steps, readings }).checks.find((c) => c.name === 'steps');
 */
export function gradeValueLadder({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('value-ladder', tolerance);
  const evenness = limits.evenness ?? limits.deltaE;
  const marks = targets.map((t, i) => markTarget(i, t.lab, readings[i].lab, limits, 'lightness'));
  const checks: MarkCheck[] = marks.map((m) => ({
    name: 'value',
    swatch: m.index,
    value: Math.abs(m.parts.lightnessTerm),
    limit: limits.deltaE,
    unit: 'ΔE00',
    score: m.score,
    pass: m.pass,
  }));
  const feedback: FeedbackLine[] = [];

  // Steps between neighbours: painted against target, in L*.
  const steps = marks.slice(1).map((m, k) => {
    const painted = m.reading.L - marks[k].reading.L;
    const wanted = m.target.L - marks[k].target.L;
    return { from: k, painted, wanted, error: painted - wanted };
  });
  if (steps.length > 0) {
    const worst = steps.reduce((w, s) => (Math.abs(s.error) > Math.abs(w.error) ? s : w));
    const stepsPass = Math.abs(worst.error) <= evenness;
    checks.push({
      name: 'steps',
      swatch: worst.from,
      value: Math.abs(worst.error),
      limit: evenness,
      unit: 'L*',
      score: scoreFromMiss(worst.error, evenness),
      pass: stepsPass,
    });
    const reversed = steps.filter(
      (s) => Math.sign(s.painted) !== Math.sign(s.wanted) || Math.abs(s.painted) < flatStep,
    );
    checks.push({
      name: 'order',
      value: reversed.length,
      limit: 0,
      unit: 'count',
      score: 100 * (1 - reversed.length / steps.length),
      pass: reversed.length === 0,
    });

    for (const s of reversed) {
      const a = swatchName(s.from);
      const b = swatchName(s.from + 1);
      const darker = s.wanted < 0;
      feedback.push({
        topic: 'order',
        severity: 'fix',
        swatch: s.from + 1,
        text:
          Math.abs(s.painted) < flatStep
            ? `${sentence(a)} and ${b} are the same value: ${b} should be clearly ${darker ? 'darker' : 'lighter'}`
            : `${sentence(a)} and ${b} are the wrong way round: ${b} should be ${darker ? 'darker' : 'lighter'} than ${a}`,
        numbers: `L* ${fixed1(marks[s.from].reading.L)} then ${fixed1(marks[s.from + 1].reading.L)}; target step ${signed1(s.wanted)}`,
      });
    }
    if (!stepsPass && !reversed.includes(worst)) {
      const tooSmall = Math.abs(worst.painted) < Math.abs(worst.wanted);
      // Blame the swatch of the pair that is further from its own target value.
      const left = marks[worst.from];
      const right = marks[worst.from + 1];
      const culprit =
        Math.abs(left.parts.deltaLPrime) > Math.abs(right.parts.deltaLPrime) ? left : right;
      const fix = culprit.parts.deltaLPrime > 0 ? 'too light' : 'too dark';
      feedback.push({
        topic: 'steps',
        severity: 'fix',
        swatch: culprit.index,
        text: `The step from ${swatchName(worst.from)} to ${swatchName(worst.from + 1)} is too ${tooSmall ? 'small' : 'big'}: ${swatchName(culprit.index)} is ${fix}`,
        numbers: `step ${signed1(worst.painted)} L* against ${signed1(worst.wanted)} (off by ${fixed1(Math.abs(worst.error))}, allowed ${fixed1(evenness)})`,
      });
    }
  }

  for (const m of marks) {
    if (m.pass) continue;
    const lines = colourFeedback(m.index, m.target, m.reading, m.parts, m.judgement, false, {
      lightness: true,
    });
    for (const line of lines) {
      feedback.push({
        ...line,
        text: `${sentence(swatchName(m.index))} is ${line.text.charAt(0).toLowerCase()}${line.text.slice(1)}`,
      });
    }
  }
  const mark = summarise('value-ladder', marks, checks, feedback);
  if (mark.pass) {
    mark.feedback.unshift({
      topic: 'steps',
      severity: 'praise',
      text: 'Even steps of value, each swatch where it should be',
      numbers: `largest step error ${fixed1(Math.max(0, ...steps.map((s) => Math.abs(s.error))))} L*`,
    });
  }
  return mark;
}
