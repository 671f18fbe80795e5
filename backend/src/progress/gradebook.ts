import { assignmentStatusLabel } from '@mixmark/common';
import type { AssignmentStatus } from '../assignments/assignment-status';

export interface GradebookCell {
  status: AssignmentStatus;
  attempts: number;
  latestScore: number | null;
  bestScore: number | null;
  latestAttemptId: string | null;
}

export interface Gradebook {
  classId: string;
  className: string;
  assignments: { id: string; drillTitle: string; kind: string; dueAt: Date }[];
  students: { id: string; displayName: string; email: string; cells: Record<string, GradebookCell> }[];
}

/** A CSV field per RFC 4180: quoted when it holds a comma, quote or line break. */
function csvField(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  // A leading =, +, - or @ would run as a formula in a spreadsheet: prefix it (OWASP CSV injection).
  const safe = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** The gradebook as CSV: one row per student, best score and status (in the screen's words) per assignment. */
export function gradebookCsv(book: Gradebook): string {
  const header = ['Student', 'E-mail', ...book.assignments.flatMap((a) => [`${a.drillTitle} (due ${a.dueAt.toISOString().slice(0, 10)}) best`, `${a.drillTitle} status`])];
  const rows = book.students.map((s) => [
    s.displayName,
    s.email,
    // A student with no cell has handed nothing in: "Not started", as the screen shows it.
    ...book.assignments.flatMap((a) => [s.cells[a.id]?.bestScore ?? '', assignmentStatusLabel(s.cells[a.id]?.status ?? 'not-started')]),
  ]);
  return [header, ...rows].map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n';
}
