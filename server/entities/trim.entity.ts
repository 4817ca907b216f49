import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One line of a style's bill of materials (buttons, interfacing, thread, labels, packaging). */
@Entity('trims')
@Index(['studioId', 'styleId'])
export class TrimEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  unit: string;

  /** Quantity per garment, a decimal in the trim's unit. */
  @Column({ type: 'real' })
  quantityPerGarment: number;

  @Column({ type: 'integer' })
  unitPriceMinor: number;

  @Column({ type: 'integer', nullable: true })
  supplierId: number | null;

  @Column({ type: 'real', default: 0 })
  inStock: number;
}
