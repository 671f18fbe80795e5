import type { AttemptState, Mark, QualityReport, Reading } from '@mixmark/common';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { OverlayPlan } from '../../measurement/render-overlay';

export const attemptStates = ['queued', 'measuring', 'graded', 'needs-retake', 'failed'] as const satisfies readonly AttemptState[];
export type { AttemptState, QualityReport };

/** One photo a student submitted for a drill, its readings and its mark. */
@Entity({ name: 'attempts' })
export class Attempt {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'student_id', type: 'uuid' })
  studentId: string;

  @Column({ name: 'drill_id', type: 'uuid' })
  drillId: string;

  /** Null for practice outside any assignment. */
  @Column({ name: 'assignment_id', type: 'uuid', nullable: true })
  assignmentId: string | null;

  @Column({ type: 'enum', enum: attemptStates, enumName: 'attempt_state', default: 'queued' })
  state: AttemptState;

  /** Storage key of the stored photo (metadata stripped). */
  @Column({ name: 'photo_key', type: 'text' })
  photoKey: string;

  /**
   * Where the overlay PNG is (or will be) stored. Set when the photo was measured; the picture
   * itself is drawn from `overlayPlan` the first time someone opens it.
   */
  @Column({ name: 'overlay_key', type: 'text', nullable: true })
  overlayKey: string | null;

  /** What the overlay draws (`measurement/render-overlay.ts`); not loaded unless asked for. */
  @Column({ name: 'overlay_plan', type: 'jsonb', nullable: true, select: false })
  overlayPlan?: OverlayPlan | null;

  @Column({ name: 'photo_bytes', type: 'integer' })
  photoBytes: number;

  @Column({ type: 'jsonb', default: { errors: [], warnings: [] } })
  quality: QualityReport;

  @Column({ name: 'failure_reason', type: 'text', nullable: true })
  failureReason: string | null;

  @Column({ type: 'jsonb', nullable: true })
  readings: Reading[] | null;

  /** The machine mark, as grading computed it (kept even when a teacher overrides). */
  @Column({ type: 'jsonb', nullable: true })
  mark: Mark | null;

  @Column({ type: 'integer', nullable: true })
  score: number | null;

  @Column({ type: 'boolean', nullable: true })
  pass: boolean | null;

  @Column({ name: 'override_score', type: 'integer', nullable: true })
  overrideScore: number | null;

  @Column({ name: 'override_pass', type: 'boolean', nullable: true })
  overridePass: boolean | null;

  @Column({ name: 'override_comment', type: 'text', nullable: true })
  overrideComment: string | null;

  @Column({ name: 'overridden_by_id', type: 'uuid', nullable: true })
  overriddenById: string | null;

  @Column({ name: 'overridden_at', type: 'timestamptz', nullable: true })
  overriddenAt: Date | null;

  @Column({ type: 'integer', default: 0 })
  tries: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'graded_at', type: 'timestamptz', nullable: true })
  gradedAt: Date | null;
}
