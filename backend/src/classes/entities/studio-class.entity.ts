import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A class a teacher runs: a roster of students who get assignments. */
@Entity({ name: 'classes' })
export class StudioClass {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'teacher_id', type: 'uuid' })
  teacherId: string;

  @Column({ name: 'studio_id', type: 'uuid', nullable: true })
  studioId: string | null;

  @Column({ type: 'text' })
  name: string;

  /** The short code students type to join (see `classCodePattern` in common). */
  @Column({ type: 'text', unique: true })
  code: string;

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
