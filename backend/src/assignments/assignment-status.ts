/** Where a student stands on an assignment. */
export type AssignmentStatus = 'not-started' | 'submitted' | 'needs-retake' | 'passed' | 'failed' | 'late';

export interface AttemptFacts {
  state: 'queued' | 'measuring' | 'graded' | 'needs-retake' | 'failed';
  /** The effective pass (the teacher's override when there is one). */
  pass: boolean | null;
  createdAt: Date;
}

/**
 * A student's status from their attempts (newest first) and the due date. A pass by any attempt
 * stands; otherwise the newest attempt decides; nothing handed in after the due date is late.
 */
export function assignmentStatus(attempts: AttemptFacts[], dueAt: Date, now = new Date()): AssignmentStatus {
  if (attempts.some((a) => a.state === 'graded' && a.pass === true)) return 'passed';
  const latest = attempts[0];
  if (!latest) return now > dueAt ? 'late' : 'not-started';
  if (latest.state === 'queued' || latest.state === 'measuring') return 'submitted';
  if (latest.state === 'needs-retake' || latest.state === 'failed') return now > dueAt ? 'late' : 'needs-retake';
  return 'failed';
}
