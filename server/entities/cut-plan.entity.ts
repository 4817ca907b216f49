import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('cut_plans')
export class CutPlanEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  batchId: number;

  @Column({ type: 'integer' })
  fabricId: number;

  /** The planning core's input and result, as plain data. */
  @Column({ type: 'simple-json' })
  input: unknown;

  @Column({ type: 'simple-json' })
  result: unknown;

  @Column({ type: 'real' })
  fabricUsedMm: number;

  @Column({ type: 'real' })
  lowerBoundMm: number;

  @Column({ type: 'varchar', length: 12, default: 'draft' })
  status: 'draft' | 'released' | 'superseded';

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
