import type { Mark, Reading } from '@mixmark/common';
import type { Attempt, AttemptState, QualityReport } from './entities/attempt.entity';

/** An attempt as the API shows it: the effective mark, and the machine's and teacher's apart. */
export interface AttemptView {
  id: string;
  drill: { id: string; title: string; kind: string };
  assignmentId: string | null;
  student: { id: string; displayName: string };
  state: AttemptState;
  quality: QualityReport;
  failureReason: string | null;
  readings: Reading[] | null;
  mark: Mark | null;
  /** The teacher's score and pass when overridden, else the machine's. */
  score: number | null;
  pass: boolean | null;
  machine: { score: number; pass: boolean } | null;
  override: { score: number; pass: boolean; comment: string; by: string | null; at: Date } | null;
  photoBytes: number;
  hasOverlay: boolean;
  createdAt: Date;
  gradedAt: Date | null;
}

export function toAttemptView(attempt: Attempt, drill: { id: string; title: string; kind: string }, student: { id: string; displayName: string }): AttemptView {
  const overridden = attempt.overrideScore !== null && attempt.overridePass !== null;
  return {
    id: attempt.id,
    drill,
    assignmentId: attempt.assignmentId,
    student,
    state: attempt.state,
    quality: attempt.quality,
    failureReason: attempt.failureReason,
    readings: attempt.readings,
    mark: attempt.mark,
    score: overridden ? attempt.overrideScore : attempt.score,
    pass: overridden ? attempt.overridePass : attempt.pass,
    machine: attempt.score !== null && attempt.pass !== null ? { score: attempt.score, pass: attempt.pass } : null,
    override: overridden
      ? { score: attempt.overrideScore!, pass: attempt.overridePass!, comment: attempt.overrideComment ?? '', by: attempt.overriddenById, at: attempt.overriddenAt! }
      : null,
    photoBytes: attempt.photoBytes,
    hasOverlay: attempt.overlayKey !== null,
    createdAt: attempt.createdAt,
    gradedAt: attempt.gradedAt,
  };
}
