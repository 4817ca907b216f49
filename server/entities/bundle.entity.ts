import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('bundles')
@Index(['studioId', 'batchId', 'number'], { unique: true })
export class BundleEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  batchId: number;

  @Column({ type: 'integer' })
  layId: number;

  /** Number within the batch, from 1. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 12 })
  size: string;

  @Column({ type: 'varchar', length: 40 })
  shadeLot: string;

  @Column({ type: 'integer' })
  plyFrom: number;

  @Column({ type: 'integer' })
  plyTo: number;

  /** Garments in the bundle. */
  @Column({ type: 'integer' })
  pieces: number;

  /** Operation id → times it was sent back for rework (0 when never). */
  @Column({ type: 'simple-json' })
  reopened: Record<string, number>;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
