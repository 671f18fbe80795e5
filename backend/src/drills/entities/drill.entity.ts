import { drillKinds, type DrillKind, type Target, type Tolerance } from '@mixmark/common';
import { Column, CreateDateColumn, DeleteDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export interface AllowedPaint {
  name: string;
  pigments: string[];
}

/** An exercise: a kind, its targets (CIELAB D65), a tolerance, instructions and the palette it allows. */
@Entity({ name: 'drills' })
export class Drill {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId: string;

  @Column({ type: 'text' })
  title: string;

  @Column({ type: 'enum', enum: drillKinds, enumName: 'drill_kind' })
  kind: DrillKind;

  @Column({ type: 'text', default: '' })
  instructions: string;

  @Column({ type: 'jsonb' })
  targets: Target[];

  @Column({ type: 'jsonb', default: {} })
  tolerance: Partial<Tolerance>;

  @Column({ type: 'jsonb', default: [] })
  palette: AllowedPaint[];

  @Column({ type: 'enum', enum: ['private', 'public'], enumName: 'drill_visibility', default: 'private' })
  visibility: 'private' | 'public';

  /** Soft delete: attempts and assignments keep pointing at the drill they were made for. */
  @DeleteDateColumn({ name: 'deleted_at', type: 'timestamptz', nullable: true })
  deletedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
