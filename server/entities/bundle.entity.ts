import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('bundles')
@Index(['studioId', 'batchId', 'number'], { unique: true })
@Index(['studioId', 'numberScope', 'number'], { unique: true })
export class BundleEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  batchId: number;

  @Column({ type: 'integer' })
  layId: number;

  /** The number on the ticket: unique in the studio (see numberScope), counted on across batches. */
  @Column({ type: 'integer' })
  number: number;

  /**
   * 0: `number` is unique in the studio (every bundle cut since numbers became studio-wide). A bundle cut
   * before then that shares its number with another batch's keeps the number printed on its ticket and
   * holds its batch id here, so that number is unique only with its batch and is always typed with it.
   */
  @Column({ type: 'integer', default: 0 })
  numberScope: number;

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
