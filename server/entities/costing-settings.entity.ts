import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** The owner's costing assumptions for one style. Rates are per garment or per minute. */
@Entity('costing_settings')
@Index(['studioId', 'styleId'], { unique: true })
export class CostingSettingsEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @Column({ type: 'integer' })
  labourCostPerMinuteMinor: number;

  @Column({ type: 'real', default: 0 })
  overheadPercent: number;

  @Column({ type: 'real', default: 3 })
  wastagePercent: number;

  @Column({ type: 'real', default: 20 })
  marginPercent: number;

  @Column({ type: 'real', default: 2 })
  retailMultiplier: number;

  /** How labour is costed for this style on every costing view and the workbook: standard minutes or piece rates. */
  @Column({ type: 'varchar', length: 12, default: 'sam' })
  labourBasis: 'sam' | 'piece-rates';
}
