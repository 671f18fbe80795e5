import type { Mark, Reading } from '@mixmark/common';

export type AttemptState = 'queued' | 'measuring' | 'graded' | 'needs-retake' | 'failed';

export type QualityReport = {
  errors: { code: string; message: string }[];
  warnings: { code: string; message: string }[];
};

export type Attempt = {
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
  override: { score: number; pass: boolean; comment: string; by: string | null; at: string } | null;
  photoBytes: number;
  hasOverlay: boolean;
  createdAt: string;
  gradedAt: string | null;
};

/** Still with the server: keep asking. */
export const isPending = (state: AttemptState) => state === 'queued' || state === 'measuring';
