import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

export interface LayRollLine {
  rollId: number;
  label: string;
  shadeLot: string;
  plies: number;
  expectedRemnantMm: number;
  actualPlies?: number;
  actualRemnantMm?: number;
  /** Length the lay took from the roll as recorded at the cut (roll on hand before − remnant measured after), mm. */
  takenMm?: number;
  note?: string;
}

/** One correction of a cut lay's record. */
export interface LayCorrection {
  at: string;
  byUserId: number;
  by: string;
  reason: string;
  changes: string[];
}

@Entity('lays')
@Index(['studioId', 'cutPlanId', 'seq'], { unique: true })
export class LayEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  cutPlanId: number;

  @Column({ type: 'integer' })
  batchId: number;

  @Column({ type: 'integer' })
  seq: number;

  @Column({ type: 'simple-json' })
  ratio: Record<string, number>;

  @Column({ type: 'integer' })
  plies: number;

  @Column({ type: 'real' })
  markerLengthMm: number;

  @Column({ type: 'real' })
  endAllowanceMm: number;

  @Column({ type: 'integer', nullable: true })
  markerId: number | null;

  @Column({ type: 'varchar', length: 24 })
  spreadingMode: string;

  @Column({ type: 'simple-json' })
  rolls: LayRollLine[];

  /** `retired`: dropped when the batch was planned again (the lay stays readable, nothing more is done with it). */
  @Column({ type: 'varchar', length: 12, default: 'planned' })
  status: 'planned' | 'cut' | 'retired';

  @Column({ type: 'text', default: '' })
  flaws: string;

  /** Corrections of the record after the cut, oldest first; each is in the audit log too. */
  @Column({ type: 'simple-json', nullable: true })
  corrections: LayCorrection[] | null;

  @Column({ type: TIMESTAMP, nullable: true })
  cutAt: Date | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
