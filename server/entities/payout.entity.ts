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

  @Column({ type: 'varchar', length: 12, default: 'pending' })
  status: 'pending' | 'paid' | 'failed';

  /** Sent to the payments service; the same key never pays twice. */
  @Column({ type: 'varchar', length: 80 })
  idempotencyKey: string;

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
