export const assignmentStatuses = [
  'not-started',
  'submitted',
  'needs-retake',
  'passed',
  'failed',
  'late',
] as const;

export type AssignmentStatus = (typeof assignmentStatuses)[number];

export type AssignmentView = {
  id: string;
  classId: string;
  className: string;
  drill: { id: string; title: string; kind: string };
  dueAt: string;
  note: string;
  createdAt: string;
  /** For a student: their own status. */
  status?: AssignmentStatus;
  /** For the teacher: how many students stand where. */
  counts?: Record<AssignmentStatus, number>;
};
