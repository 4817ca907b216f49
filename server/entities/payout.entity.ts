import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('payouts')
@Index(['payPeriodId', 'userId'], { unique: true })
export class PayoutEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  payPeriodId: number;

  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'integer' })
  amountMinor: number;

  @Column({ type: 'varchar', length: 3 })
  currency: string;

  /** to_check: the payments service gave no clear answer; it may have paid, so it is never retried with a new key. */
  @Column({ type: 'varchar', length: 12, default: 'pending' })
  status: 'pending' | 'paid' | 'failed' | 'to_check';

  /** Made once, stored before the first call and sent on every retry: the same key never pays twice. */
  @Column({ type: 'varchar', length: 80 })
  idempotencyKey: string;

  /** The account frozen at the first attempt; a retry sends it again even if the person's account changed since. */
  @Column({ type: 'varchar', length: 120, default: '' })
  destination: string;

  /** The description frozen with the key, so a retry sends exactly the first request's parameters. */
  @Column({ type: 'varchar', length: 250, default: '' })
  description: string;

  @Column({ type: 'varchar', length: 120, default: '' })
  providerRef: string;

  @Column({ type: 'text', default: '' })
  error: string;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
