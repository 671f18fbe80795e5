import type { AttemptView } from '@mixmark/common';
import type { Attempt } from './entities/attempt.entity';

export type { AttemptView };

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
