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

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
