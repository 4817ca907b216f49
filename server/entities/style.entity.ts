import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('styles')
@Index(['studioId', 'code'], { unique: true })
export class StyleEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 24 })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', default: '' })
  description: string;

  /** Ordered size labels of the run. */
  @Column({ type: 'simple-json' })
  sizeRun: string[];

  @Column({ type: 'varchar', length: 12 })
  baseSize: string;

  @Column({ type: 'varchar', length: 16, default: 'draft' })
  status: 'draft' | 'sampling' | 'approved' | 'archived';

  /** Blocks the pieces are drafted from and the seams checked ({ preset, blocks, seams? }, shared/schemas/style-composition); null = not chosen yet. */
  @Column({ type: 'simple-json', nullable: true })
  composition: { preset: string | null; blocks: unknown[]; seams?: unknown[] | null } | null;

  /** Fabric id per material of the style ({ self: 3, lining: 5 }); null = none linked (every piece on any fabric). */
  @Column({ type: 'simple-json', nullable: true })
  materialFabrics: Record<string, number> | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
