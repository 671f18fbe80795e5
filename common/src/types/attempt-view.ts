import type { Mark } from './mark.js';
import type { Reading } from './reading.js';

/** Where an attempt is in its life: waiting, being measured, graded, to retake, or failed. */
export type AttemptState = 'queued' | 'measuring' | 'graded' | 'needs-retake' | 'failed';

/** The photo's quality gates: errors (why it could not be graded) and milder warnings. */
export interface QualityReport {
  errors: { code: string; message: string }[];
  warnings: { code: string; message: string }[];
}

/** An attempt as the API sends it: the effective mark, and the machine's and teacher's apart. */
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
  override: { score: number; pass: boolean; comment: string; by: string | null; at: Date | string } | null;
  photoBytes: number;
  hasOverlay: boolean;
  createdAt: Date | string;
  gradedAt: Date | string | null;
}
