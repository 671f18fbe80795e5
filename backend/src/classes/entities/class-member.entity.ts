import { CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A student on a class's roster. */
@Entity({ name: 'class_members' })
export class ClassMember {
  @PrimaryColumn({ name: 'class_id', type: 'uuid' })
  classId: string;

  @PrimaryColumn({ name: 'student_id', type: 'uuid' })
  studentId: string;

  @CreateDateColumn({ name: 'joined_at', type: 'timestamptz' })
  joinedAt: Date;
}
