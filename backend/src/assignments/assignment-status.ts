/** Where a student stands on an assignment. */
export type AssignmentStatus =
  'not-started' | 'submitted' | 'needs-retake' | 'passed' | 'failed' | 'late';

export interface AttemptFacts {
  state: 'queued' | 'measuring' | 'graded' | 'needs-retake' | 'failed';
  /** The effective pass (the teacher's override when there is one). */
  pass: boolean | null;
  /** Whether `pass` is a teacher's override (which stands whatever the machine made of the photo). */
  overridden?: boolean;
  createdAt: Date;
}

/**
 * A student's status from their attempts (newest first) and the due date. A pass by any attempt
 * stands (a graded one's, or a teacher's on any attempt, a retake included); otherwise the
 * newest attempt decides; nothing handed in after the due date is late.
 */
export function assignmentStatus(
  attempts: AttemptFacts[],
  dueAt: Date,
  now = new Date(),
): AssignmentStatus {
  return statusFromSummary(
    attempts.length
      ? {
          passed: attempts.some((a) => a.pass === true && (a.overridden === true || a.state === 'graded')),
          latestState: attempts[0].state,
        }
      : undefined,
    dueAt,
    now,
  );
}

/** All the status rule needs of a student's attempts: whether any graded one passed, and the newest one's state. */
export interface AttemptSummary {
  passed: boolean;
  latestState: AttemptFacts['state'];
}

/**
 * The same rule from a summary (undefined: no attempts), for lists that let PostgreSQL reduce the
 * attempts to one row per student and assignment.
 */
export function statusFromSummary(
  summary: AttemptSummary | undefined,
  dueAt: Date,
  now = new Date(),
): AssignmentStatus {
  if (summary?.passed) return 'passed';
  if (!summary) return now > dueAt ? 'late' : 'not-started';
  const latest = summary.latestState;
  if (latest === 'queued' || latest === 'measuring') return 'submitted';
  if (latest === 'needs-retake' || latest === 'failed')
    return now > dueAt ? 'late' : 'needs-retake';
  return 'failed';
}
