import { Column, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

/** A style's size chart, base pieces and grade rules, stored as the grading core's plain data. */
@Entity('grading_sets')
@Index(['studioId', 'styleId'], { unique: true })
export class GradingSetEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @Column({ type: 'simple-json' })
  sizeChart: unknown;

  @Column({ type: 'simple-json' })
  pieces: unknown;

  @Column({ type: 'simple-json' })
  gradeRules: unknown;

  @Column({ type: 'simple-json' })
  eases: unknown;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
