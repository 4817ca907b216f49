import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('pay_periods')
export class PayPeriodEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 10 })
  fromDay: string;

  @Column({ type: 'varchar', length: 10 })
  toDay: string;

  @Column({ type: 'varchar', length: 12, default: 'approved' })
  status: 'approved' | 'paid';

  @Column({ type: 'integer' })
  approvedBy: number;

  /** Per person: pieces, amount in minor units, log ids covered. */
  @Column({ type: 'simple-json' })
  lines: { userId: number; name: string; pieces: number; amountMinor: number }[];

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
