import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

export type MarkerStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

@Entity('markers')
@Index(['studioId', 'inputHash'])
export class MarkerEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @Column({ type: 'integer', nullable: true })
  batchId: number | null;

  @Column({ type: 'integer', nullable: true })
  fabricId: number | null;

  /** Size → garments in this marker. */
  @Column({ type: 'simple-json' })
  ratio: Record<string, number>;

  @Column({ type: 'real' })
  widthMm: number;

  /** SHA-256 of the engine input: an unchanged marker is never recomputed. */
  @Column({ type: 'varchar', length: 64 })
  inputHash: string;

  @Column({ type: 'varchar', length: 12, default: 'queued' })
  status: MarkerStatus;

  @Column({ type: 'real', nullable: true })
  lengthMm: number | null;

  @Column({ type: 'real', nullable: true })
  utilisation: number | null;

  @Column({ type: 'real', default: 0 })
  elapsedMs: number;

  /** The engine's input (pieces, quantities) and its placements, for drawing and export. */
  @Column({ type: 'simple-json', nullable: true })
  input: unknown;

  @Column({ type: 'simple-json', nullable: true })
  result: unknown;

  @Column({ type: 'text', default: '' })
  error: string;

  /** Times a process has claimed this job to run it (one claim per run; 1 when it ran once). */
  @Column({ type: 'integer', default: 0 })
  runs: number;

  /** The claim of the process running the job; only it may store the outcome. */
  @Column({ type: 'varchar', length: 40, nullable: true })
  claimToken: string | null;

  /**
   * Until when the claim holds (epoch ms), renewed while the run lives: a 'running' job whose lease ran
   * out lost its process and may be claimed again by another.
   */
  @Column({ type: 'bigint', nullable: true })
  leaseExpiresAtMs: number | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
