import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

/** One operation done on one bundle. Unique per bundle, operation and attempt: logged once. */
@Entity('work_logs')
@Index(['bundleId', 'operationId', 'attempt'], { unique: true })
@Index(['studioId', 'userId', 'createdAt'])
export class WorkLogEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  bundleId: number;

  @Column({ type: 'integer' })
  operationId: number;

  /** 0 for the first time; rework after a failed check counts up and is not paid again. */
  @Column({ type: 'integer', default: 0 })
  attempt: number;

  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'integer' })
  pieces: number;

  @Column({ type: 'real' })
  earnedMinutes: number;

  /** This log's own pay rounded to minor units, for the floor's running figures; pay lines use `pieceRate`. */
  @Column({ type: 'integer', default: 0 })
  payMinor: number;

  /**
   * The operation's exact piece rate when logged (decimal minor units per piece), frozen so a later rate change
   * does not reprice done work. Empty on logs made before exact rates: their pay is `payMinor`.
   */
  @Column({ type: 'varchar', length: 24, default: '' })
  pieceRate: string;

  /** Sent by the device so a retried log is never doubled. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 80 })
  idempotencyKey: string;

  /** pass | fail for quality checks; empty otherwise. */
  @Column({ type: 'varchar', length: 8, default: '' })
  outcome: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  defect: string;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  /** The approved pay period that paid this log; null until one claims it (a late log goes to the next one). */
  @Index()
  @Column({ type: 'integer', nullable: true })
  payPeriodId: number | null;
}
