import type { Lab } from '@mixmark/common';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const paintOpacities = ['transparent', 'semi-transparent', 'semi-opaque', 'opaque'] as const;
export const paintStainings = ['non-staining', 'low', 'medium', 'high'] as const;

/** A paint a user owns: their own name for it and its Colour Index pigment codes. */
@Entity({ name: 'paints' })
export class Paint {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text', array: true, default: () => "'{}'" })
  pigments: string[];

  @Column({ type: 'enum', enum: paintOpacities, enumName: 'paint_opacity', nullable: true })
  opacity: (typeof paintOpacities)[number] | null;

  @Column({ type: 'enum', enum: paintStainings, enumName: 'paint_staining', nullable: true })
  staining: (typeof paintStainings)[number] | null;

  @Column({ type: 'boolean', default: false })
  granulating: boolean;

  @Column({ name: 'swatch_lab', type: 'jsonb', nullable: true })
  swatchLab: Lab | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
