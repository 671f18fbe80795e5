import type { GradeInput } from '../types/grade-input.js';
import type { FeedbackLine, Mark, MarkCheck } from '../types/mark.js';
import { fitQuadratic } from './fit-quadratic.js';
import { fixed1, signed1 } from './format-numbers.js';
import { lightnessTerm, markTarget } from './mark-target.js';
import { scoreFromMiss } from './score-curve.js';
import { summarise } from './summarise.js';
import { resolveTolerance } from './tolerance-bands.js';

/** How far (L*) a graded wash may turn back before it counts as a reversal (Mixmark's choice). */
export const reversalLimit = 1;

/**
 * Grades a `graded-wash` drill: one window whose L* should change smoothly and in one
 * direction from the start target (targets[0]) to the end target (targets[1]). Needs the
 * reading's `profile` (L* along the long axis, at least 3 slices).
 *
 * Checks: `start` and `end` (ΔE00 lightness term of the first and last slice against the
 * targets' L* ≤ tolerance.deltaE); `smoothness` (largest departure of the profile from a
 * least-squares quadratic, L* ≤ tolerance.evenness); `order` (largest turn back against
 * the wash's direction ≤ 1 L*).
 *
 * @param input - targets [start, end]; one reading with a profile
 * @returns the mark
 * @example
 * gradeGradedWash({ targets: [{ lab: light }, { lab: dark }], readings: [{ lab, profile }] });
 */
export function gradeGradedWash({ targets, readings, tolerance }: GradeInput): Mark {
  const limits = resolveTolerance('graded-wash', tolerance);
  const evenness = limits.evenness ?? 2;
  const kL = limits.weights?.kL ?? 1;
  const reading = readings[0];
  const profile = reading.profile ?? [];
  const n = profile.length;
  const [start, end] = [targets[0].lab, targets[1].lab];
  const direction = Math.sign(end.L - start.L) || -1;
  const checks: MarkCheck[] = [];
  const feedback: FeedbackLine[] = [];

  // Ends: the first and last slices against the targets' lightness.
  const ends = [
    { name: 'start' as const, target: start, L: profile[0], label: 'start' },
    { name: 'end' as const, target: end, L: profile[n - 1], label: 'end' },
  ];
  for (const e of ends) {
    const term = lightnessTerm(e.target.L, e.L, kL);
    const pass = Math.abs(term) <= limits.deltaE;
    checks.push({
      name: e.name,
      value: Math.abs(term),
      limit: limits.deltaE,
      unit: 'ΔE00',
      score: scoreFromMiss(term, limits.deltaE),
      pass,
    });
    if (!pass) {
      const lighter = term > 0;
      const advice =
        e.name === 'start'
          ? lighter
            ? 'begin with a stronger mix'
            : 'begin with a paler mix (more water)'
          : lighter
            ? 'charge the last strokes with more pigment'
            : 'let the last strokes carry more water';
      feedback.push({
        topic: 'lightness',
        severity: 'fix',
        text: `The ${e.label} of the wash is too ${lighter ? 'light' : 'dark'}: ${advice}`,
        numbers: `L* ${fixed1(e.L)} vs ${fixed1(e.target.L)} target (ΔE00 lightness term ${signed1(term)}, allowed ${fixed1(limits.deltaE)})`,
      });
    }
  }

  // Smoothness: bumps off a smooth curve.
  const fitted = fitQuadratic(profile);
  let worst = 0;
  profile.forEach((L, k) => {
    if (Math.abs(L - fitted[k]) > Math.abs(profile[worst] - fitted[worst])) worst = k;
  });
  const bump = profile[worst] - fitted[worst];
  const smooth = Math.abs(bump) <= evenness;
  checks.push({
    name: 'smoothness',
    value: Math.abs(bump),
    limit: evenness,
    unit: 'L*',
    score: scoreFromMiss(bump, evenness),
    pass: smooth,
  });
  const where = (k: number): string =>
    `about ${Math.round((100 * k) / Math.max(1, n - 1))} % of the way along`;
  if (!smooth) {
    feedback.push({
      topic: 'smoothness',
      severity: 'fix',
      text:
        bump < 0
          ? `A dark band ${where(worst)}: the mix changed too fast there; change it in smaller, even amounts`
          : `A light band ${where(worst)}: water crept back or the mix was weakened in one go; keep the bead moving and change the mix in small, even amounts`,
      numbers: `L* ${fixed1(profile[worst])} where a smooth wash would have ${fixed1(fitted[worst])} (${signed1(bump)}, allowed ±${fixed1(evenness)})`,
    });
  }

  // Order: the largest turn back against the wash's direction.
  let reversal = 0;
  let reversalAt = 0;
  let extreme = profile[0];
  profile.forEach((L, k) => {
    const back = (extreme - L) * direction;
    if (back > reversal) {
      reversal = back;
      reversalAt = k;
    }
    if ((L - extreme) * direction > 0) extreme = L;
  });
  const ordered = reversal <= reversalLimit;
  checks.push({
    name: 'order',
    value: reversal,
    limit: reversalLimit,
    unit: 'L*',
    score: scoreFromMiss(reversal, reversalLimit),
    pass: ordered,
  });
  if (!ordered) {
    feedback.push({
      topic: 'order',
      severity: 'fix',
      text: `The wash turns back ${where(reversalAt)}: it gets ${direction < 0 ? 'lighter' : 'darker'} again where it should keep ${direction < 0 ? 'darkening' : 'lightening'}`,
      numbers: `turns back by ${fixed1(reversal)} L* (allowed ${fixed1(reversalLimit)})`,
    });
  }

  const marks = [
    markTarget(0, start, { ...reading.lab, L: profile[0] }, limits, 'lightness'),
    markTarget(1, end, { ...reading.lab, L: profile[n - 1] }, limits, 'lightness'),
  ];
  const mark = summarise('graded-wash', marks, checks, feedback);
  if (mark.pass) {
    mark.feedback.unshift({
      topic: 'smoothness',
      severity: 'praise',
      text: 'A smooth wash from end to end, in one direction',
      numbers: `L* ${fixed1(profile[0])} to ${fixed1(profile[n - 1])}; largest bump ${fixed1(Math.abs(bump))} L*`,
    });
  }
  return mark;
}
