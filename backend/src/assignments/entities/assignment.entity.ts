import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A drill given to a class with a due date. */
@Entity({ name: 'assignments' })
export class Assignment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'class_id', type: 'uuid' })
  classId: string;

  @Column({ name: 'drill_id', type: 'uuid' })
  drillId: string;

  @Column({ name: 'due_at', type: 'timestamptz' })
  dueAt: Date;

  @Column({ type: 'text', default: '' })
  note: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
