import { gradeAttempt, gradeInputProblems, type Mark, type Reading } from '@mixmark/common';
import type { Drill } from '../drills/entities/drill.entity';
import type { MeasurementIssue } from '../measurement/measurement-issue';
import type { MeasurementResult } from '../measurement/measure-photo';

export type PhotoOutcome =
  | { kind: 'graded'; readings: Reading[]; mark: Mark; warnings: MeasurementIssue[] }
  | { kind: 'needs-retake'; errors: { code: string; message: string; window?: number }[]; warnings: MeasurementIssue[] };

/**
 * Grading's own retake codes and their sentences (the photo's own are in
 * measurement/issue-messages.ts). READING_INCOMPLETE: the card was found and is the right one,
 * but its readings cannot be graded (a window without a usable reading, a graded wash too short
 * to profile). Retrying the same photo gives the same answer, so the student is asked for a new one.
 */
export const gradingRetakeMessages = {
  READING_INCOMPLETE:
    'Not every window of the card could be read, so this attempt cannot be marked. Photograph the card again with each dry swatch filling its whole window, the card flat and evenly lit.',
} as const;

/** Windows a drill's card has: one per target, except the fixed layouts. */
export function windowsFor(drill: Pick<Drill, 'kind' | 'targets'>): number {
  if (drill.kind === 'temperature-pair') return 2;
  if (drill.kind === 'graded-wash') return 1;
  return drill.targets.length;
}

/**
 * Turns a measurement into a mark for the drill, or into a retake request: the photo's own
 * quality errors, a card printed for another kind of drill, or readings that cannot be graded
 * (READING_INCOMPLETE, with the window when one is named).
 */
export function gradeMeasurement(drill: Pick<Drill, 'kind' | 'targets' | 'tolerance'>, result: MeasurementResult): PhotoOutcome {
  if (!result.ok) return { kind: 'needs-retake', errors: result.errors, warnings: result.warnings };
  const card = result.card;
  const windows = windowsFor(drill);
  if (!card || card.kind !== drill.kind || result.readings.length !== windows) {
    return {
      kind: 'needs-retake',
      warnings: result.warnings,
      errors: [
        {
          code: 'CARD_WRONG_DRILL',
          message: `This card is for a ${card?.kind ?? 'different'} drill${card ? ` with ${card.steps} window${card.steps === 1 ? '' : 's'}` : ''}, but this drill needs the ${drill.kind} card with ${windows} window${windows === 1 ? '' : 's'}. Print the card from the drill page and photograph it again.`,
        },
      ],
    };
  }
  const sorted = [...result.readings].sort((x, y) => x.window - y.window);
  const readings: Reading[] = sorted.map((r) => ({ lab: r.lab, spread: { L: r.spread.L, a: r.spread.a, b: r.spread.b }, profile: r.profile, pixels: r.pixels }));
  const input = { targets: drill.targets, readings, tolerance: drill.tolerance };
  // Problems with the readings are the photo's: a retake, not a retry. Problems with the
  // drill's own targets or tolerance stay errors (gradeAttempt throws; the job is retried, then failed).
  const readingProblems = gradeInputProblems(drill.kind, input).filter((problem) => problem.startsWith('readings'));
  if (readingProblems.length > 0) {
    return {
      kind: 'needs-retake',
      warnings: result.warnings,
      errors: [...new Set(readingProblems.map((problem) => /^readings\[(\d+)\]/.exec(problem)?.[1]))].map((index) => {
        const error = { code: 'READING_INCOMPLETE', message: gradingRetakeMessages.READING_INCOMPLETE };
        return index === undefined ? error : { ...error, window: sorted[Number(index)].window };
      }),
    };
  }
  const mark = gradeAttempt(drill.kind, input);
  return { kind: 'graded', readings, mark, warnings: result.warnings };
}
