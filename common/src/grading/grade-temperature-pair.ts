import { warmCoolIndex } from '../colour/attributes/warm-cool-index.js';
import { deltaE2000 } from '../colour/difference/delta-e-2000.js';
import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { fixed1, fixed2, signed1 } from './format-numbers.js';
import { markTarget } from './mark-target.js';
import { scoreFromMiss } from './score-curve.js';
import { summarise } from './summarise.js';
import { words } from './painter-words.js';
import { resolveTolerance } from './tolerance-bands.js';

/**
 * The warm–cool index difference that counts as a temperature shift: about what a
 * just-noticeable hue turn changes at moderate chroma (Mixmark's estimate, docs/grading.md).
 */
export const warmCoolStep = 0.03;

const roles = ['warm', 'cool'] as const;

/**
 * Grades a `temperature-pair` drill: from one base (targets[0]) the student paints a
 * warmer version (readings[0]) and a cooler one (readings[1]) at the base's value.
 *
 * Checks: `value` for each swatch (ΔE00 lightness term to the base ≤ tolerance.deltaE);
 * `direction` for each (its warm–cool index of Ou et al. 2004 above the base's for the
 * warm one, below for the cool one, by at least 0.03); `separation` (ΔE00 between the two
 * ≥ tolerance.minSeparation, so the pair is visibly different side by side).
 *
 * @param input - one base target; readings [warmer, cooler]
 * @returns the mark
 * @example
 * gradeTemperaturePair({ targets: [{ lab: base }], readings: [{ lab: warm }, { lab: cool }] });
 */
export function gradeTemperaturePair({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('temperature-pair', tolerance);
  const minSeparation = limits.minSeparation ?? 3;
  const base = targets[0].lab;
  const baseIndex = warmCoolIndex(base);
  const marks = roles.map((_, i) => markTarget(i, base, readings[i].lab, limits, 'lightness'));
  const checks: MarkCheck[] = [];
  const feedback: FeedbackLine[] = [];

  marks.forEach((m, i) => {
    const role = roles[i];
    checks.push({
      name: 'value',
      swatch: i,
      value: Math.abs(m.parts.lightnessTerm),
      limit: limits.deltaE,
      unit: 'ΔE00',
      score: m.score,
      pass: m.pass,
    });
    if (!m.pass) {
      const fix = m.parts.deltaLPrime > 0 ? words.tooLight : words.tooDark;
      feedback.push({
        topic: 'lightness',
        severity: 'fix',
        swatch: i,
        text: `The ${role} swatch has moved off the base's value; it is ${fix}`,
        numbers: `L* ${fixed1(m.reading.L)} vs base ${fixed1(base.L)} (ΔE00 lightness term ${signed1(m.parts.lightnessTerm)}, allowed ${fixed1(limits.deltaE)})`,
      });
    }
    const shift = warmCoolIndex(m.reading) - baseIndex;
    const wanted = role === 'warm' ? shift >= warmCoolStep : shift <= -warmCoolStep;
    checks.push({
      name: 'direction',
      swatch: i,
      value: shift,
      limit: role === 'warm' ? warmCoolStep : -warmCoolStep,
      unit: 'WC',
      score: wanted ? 100 : 0,
      pass: wanted,
    });
    if (!wanted) {
      const sameTemperature = Math.abs(shift) < warmCoolStep;
      feedback.push({
        topic: 'temperature',
        severity: 'fix',
        swatch: i,
        text:
          role === 'warm'
            ? `The warm swatch is ${sameTemperature ? 'no warmer than' : 'cooler than'} the base: add a touch of a paint that leans toward red-orange, such as a warm red`
            : `The cool swatch is ${sameTemperature ? 'no cooler than' : 'warmer than'} the base: add a touch of a paint that leans toward blue-green, such as a cool blue`,
        numbers: `warm–cool index ${fixed2(warmCoolIndex(m.reading))} vs base ${fixed2(baseIndex)} (change ${shift >= 0 ? '+' : '−'}${Math.abs(shift).toFixed(2)})`,
      });
    }
  });

  const separation = deltaE2000(readings[0].lab, readings[1].lab, limits.weights);
  const separated = separation >= minSeparation;
  checks.push({
    name: 'separation',
    value: separation,
    limit: minSeparation,
    unit: 'ΔE00',
    score: separated ? 100 : scoreFromMiss(minSeparation - separation, minSeparation),
    pass: separated,
  });
  if (!separated) {
    feedback.push({
      topic: 'separation',
      severity: 'fix',
      text: 'The two swatches are too alike: push the warm one warmer and the cool one cooler',
      numbers: `ΔE00 between them ${separation.toFixed(2)} (needs ≥ ${fixed1(minSeparation)})`,
    });
  }

  const mark = summarise('temperature-pair', marks, checks, feedback);
  if (mark.pass) {
    mark.feedback.unshift({
      topic: 'temperature',
      severity: 'praise',
      text: 'A clear warm and cool pair at one value',
      numbers: `warm–cool index ${fixed2(warmCoolIndex(readings[0].lab))} / ${fixed2(warmCoolIndex(readings[1].lab))} around base ${fixed2(baseIndex)}; ΔE00 between them ${separation.toFixed(2)}`,
    });
  }
  return mark;
}
