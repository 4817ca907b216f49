import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { OperationTimeStudy } from '../../shared/schemas/line';

@Entity('operations')
@Index(['studioId', 'styleId', 'seq'])
export class OperationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @Column({ type: 'integer' })
  seq: number;

  /** Short code within the style, e.g. OP05. */
  @Column({ type: 'varchar', length: 12 })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 12 })
  section: 'cutting' | 'sewing' | 'finishing';

  @Column({ type: 'varchar', length: 24 })
  machineType: string;

  /** Standard allowed minutes per garment. */
  @Column({ type: 'real' })
  sam: number;

  /** Codes of operations that must be done first. */
  @Column({ type: 'simple-json' })
  predecessors: string[];

  /** The piece rate rounded to whole minor units (costing's estimate); the exact rate is `pieceRate`. */
  @Column({ type: 'integer', nullable: true })
  pieceRateMinor: number | null;

  /**
   * The exact piece rate, minor units per piece as decimal text with up to 6 places ("0.125"). Null on rows saved
   * before exact rates: their rate is `pieceRateMinor`.
   */
  @Column({ type: 'varchar', length: 24, nullable: true })
  pieceRate: string | null;

  /** The time-study sheet that last set `sam` (elements, observations, allowances, result); null when typed in. */
  @Column({ type: 'simple-json', nullable: true })
  timeStudy: OperationTimeStudy | null;
}
