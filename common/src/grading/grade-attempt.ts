import type { DrillKind } from '../types/drill.js';
import type { GradeInput } from '../types/grade-input.js';
import type { Mark } from '../types/mark.js';
import { gradeFlatWash } from './grade-flat-wash.js';
import { gradeGradedWash } from './grade-graded-wash.js';
import { gradeMatch } from './grade-match.js';
import { gradeNeutral } from './grade-neutral.js';
import { gradeTemperaturePair } from './grade-temperature-pair.js';
import { gradeValueLadder } from './grade-value-ladder.js';

/** The grade function of each drill kind. */
export const gradersByKind: Record<DrillKind, (input: GradeInput) => Mark> = {
  match: gradeMatch,
  'value-ladder': gradeValueLadder,
  'temperature-pair': gradeTemperaturePair,
  neutral: gradeNeutral,
  'graded-wash': gradeGradedWash,
  'flat-wash': gradeFlatWash,
};

const finite = (...values: number[]): boolean => values.every(Number.isFinite);

/**
 * What is wrong with a grading input for a kind, as short codes with a field path
 * (e.g. `readings: expected 2 but received 1`). Empty when the input can be graded.
 *
 * @param kind - the drill kind
 * @param input - targets, readings, tolerance
 * @returns a list of problems, empty when none
 * @example
 * gradeInputProblems('temperature-pair', { targets: [t], readings: [r] });
 * // ['readings: expected 2 but received 1']
 */
export function gradeInputProblems(kind: DrillKind, input: GradeInput): string[] {
  const { targets, readings, tolerance } = input;
  const problems: string[] = [];
  const expectCount = (field: string, got: number, want: number | [number, number]): void => {
    const [min, max] = typeof want === 'number' ? [want, want] : want;
    if (got < min || got > max) {
      const wanted =
        min === max ? `${min}` : max === Infinity ? `at least ${min}` : `${min} to ${max}`;
      problems.push(`${field}: expected ${wanted} but received ${got}`);
    }
  };
  const counts: Record<DrillKind, [number | [number, number], number | 'same']> = {
    match: [[1, Infinity], 'same'],
    'value-ladder': [[3, Infinity], 'same'],
    'temperature-pair': [1, 2],
    neutral: [[1, Infinity], 'same'],
    'graded-wash': [2, 1],
    'flat-wash': [1, 1],
  };
  const [targetCount, readingCount] = counts[kind];
  expectCount('targets', targets.length, targetCount);
  expectCount('readings', readings.length, readingCount === 'same' ? targets.length : readingCount);
  targets.forEach((t, i) => {
    if (!finite(t.lab.L, t.lab.a, t.lab.b)) problems.push(`targets[${i}].lab: not a finite Lab`);
  });
  readings.forEach((r, i) => {
    if (!finite(r.lab.L, r.lab.a, r.lab.b)) problems.push(`readings[${i}].lab: not a finite Lab`);
  });
  if (kind === 'graded-wash' && readings[0] && (readings[0].profile?.length ?? 0) < 3) {
    problems.push('readings[0].profile: a graded wash needs at least 3 profile slices');
  }
  for (const [key, value] of Object.entries(tolerance ?? {})) {
    if (typeof value === 'number' && !(value > 0 && Number.isFinite(value))) {
      problems.push(`tolerance.${key}: expected a positive number but received ${value}`);
    }
  }
  return problems;
}

/**
 * Grades an attempt by its drill kind: checks the input, then calls the kind's grade
 * function.
 *
 * @param kind - the drill kind
 * @param input - targets, readings, tolerance
 * @returns the mark
 * @throws RangeError listing every problem when the input does not fit the kind
 * @example
 * gradeAttempt('match', { targets: [{ lab }], readings: [{ lab }] }).pass; // true
 */
export function gradeAttempt(kind: DrillKind, input: GradeInput): Mark {
  const problems = gradeInputProblems(kind, input);
  if (problems.length > 0) {
    throw new RangeError(`Cannot grade a ${kind} attempt: ${problems.join('; ')}`);
  }
  return gradersByKind[kind](input);
}
