import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';
import type { PayPeriodLine, PayPeriodRules } from '../../shared/schemas/pay';

@Entity('pay_periods')
@Index(['studioId', 'number'], { unique: true })
export class PayPeriodEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  /** The period's number in its studio: 1 for a studio's first period, never reused; the id stays for URLs. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 10 })
  fromDay: string;

  @Column({ type: 'varchar', length: 10 })
  toDay: string;

  @Column({ type: 'varchar', length: 12, default: 'approved' })
  status: 'approved' | 'paid';

  @Column({ type: 'integer' })
  approvedBy: number;

  /**
   * Per person: pieces and the amount in minor units (piece pay + overtime premium + minimum-wage top-up), with
   * those parts; the parts are absent on periods approved before pay rules.
   */
  @Column({ type: 'simple-json' })
  lines: PayPeriodLine[];

  /** The pay rules and scheduled minutes per day the period was approved with, so a re-run computes the same lines. */
  @Column({ type: 'simple-json', nullable: true })
  rules: PayPeriodRules | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
