import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

/**
 * Roll length held for one lay of a cut plan: `held` while the lay waits, `released` when its plan is
 * replaced or its batch retired, `consumed` when the lay is cut (with what the cut really took).
 * The ledger of who took which roll; `rolls.reservedMm` is the running sum of the held rows.
 */
@Entity('roll_reservations')
@Index(['studioId', 'rollId', 'status'])
@Index(['studioId', 'cutPlanId'])
export class RollReservationEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  rollId: number;

  @Column({ type: 'integer' })
  cutPlanId: number;

  @Column({ type: 'integer' })
  layId: number;

  @Column({ type: 'integer' })
  batchId: number;

  /** Length held for the lay's plies on this roll, mm. */
  @Column({ type: 'real' })
  lengthMm: number;

  @Column({ type: 'varchar', length: 10, default: 'held' })
  status: 'held' | 'released' | 'consumed';

  /** On a consumed reservation: on hand before the cut less the measured remnant, mm. */
  @Column({ type: 'real', nullable: true })
  consumedMm: number | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @Column({ type: TIMESTAMP, nullable: true })
  settledAt: Date | null;
}
