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

export type GradebookCell = {
  status: AssignmentStatus;
  attempts: number;
  latestScore: number | null;
  bestScore: number | null;
  latestAttemptId: string | null;
};

/** A class's marks: one row per student, one column per assignment. */
export type Gradebook = {
  classId: string;
  className: string;
  assignments: { id: string; drillTitle: string; kind: string; dueAt: string }[];
  students: { id: string; displayName: string; email: string; cells: Record<string, GradebookCell> }[];
};
