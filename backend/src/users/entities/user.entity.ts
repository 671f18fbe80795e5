import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  type Relation,
} from 'typeorm';
import { Studio } from '../../studios/entities/studio.entity';

export const userRoles = ['admin', 'teacher', 'student'] as const;
export type UserRole = (typeof userRoles)[number];

/** A person with a sign-in: a teacher, a student (or self-learner), or an admin. */
@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased; unique. */
  @Column({ type: 'text', unique: true })
  email: string;

  @Column({ name: 'display_name', type: 'text' })
  displayName: string;

  @Column({ type: 'enum', enum: userRoles, enumName: 'user_role', default: 'student' })
  role: UserRole;

  @Column({ name: 'password_hash', type: 'text', select: false })
  passwordHash: string;

  /** Whether the weekly progress digest is e-mailed to this person (on by default). */
  @Column({ name: 'weekly_digest', type: 'boolean', default: true })
  weeklyDigest: boolean;

  @ManyToOne(() => Studio, (studio) => studio.members, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'studio_id' })
  studio: Relation<Studio> | null;

  @Column({ name: 'studio_id', type: 'uuid', nullable: true })
  studioId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
