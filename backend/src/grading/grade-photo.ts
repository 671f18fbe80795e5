import { gradeAttempt, type Mark, type Reading } from '@mixmark/common';
import type { Drill } from '../drills/entities/drill.entity';
import type { MeasurementIssue } from '../measurement/measurement-issue';
import type { MeasurementResult } from '../measurement/measure-photo';

export type PhotoOutcome =
  | { kind: 'graded'; readings: Reading[]; mark: Mark; warnings: MeasurementIssue[] }
  | { kind: 'needs-retake'; errors: { code: string; message: string }[]; warnings: MeasurementIssue[] };

/** Windows a drill's card has: one per target, except the fixed layouts. */
export function windowsFor(drill: Pick<Drill, 'kind' | 'targets'>): number {
  if (drill.kind === 'temperature-pair') return 2;
  if (drill.kind === 'graded-wash') return 1;
  return drill.targets.length;
}

/**
 * Turns a measurement into a mark for the drill, or into a retake request: the photo's own
 * quality errors, or a card printed for another kind of drill.
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
  const readings: Reading[] = [...result.readings]
    .sort((x, y) => x.window - y.window)
    .map((r) => ({ lab: r.lab, spread: { L: r.spread.L, a: r.spread.a, b: r.spread.b }, profile: r.profile, pixels: r.pixels }));
  const mark = gradeAttempt(drill.kind, { targets: drill.targets, readings, tolerance: drill.tolerance });
  return { kind: 'graded', readings, mark, warnings: result.warnings };
}
