import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('fabrics')
export class FabricEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  composition: string;

  /** Cuttable width, selvedges excluded. */
  @Column({ type: 'real' })
  widthMm: number;

  /** The larger of the two shrinkages below, for older readers. */
  @Column({ type: 'real', default: 0 })
  shrinkagePercent: number;

  /** Shrinkage along the grain (warp), percent of the unwashed length: pieces are cut 1 ÷ (1 − s) longer. */
  @Column({ type: 'real', default: 0 })
  shrinkageLengthPercent: number;

  /** Shrinkage across the grain (weft), percent of the unwashed width. */
  @Column({ type: 'real', default: 0 })
  shrinkageWidthPercent: number;

  /** One-way print or napped pile: every piece keeps one direction. */
  @Column({ type: 'boolean', default: false })
  isDirectional: boolean;

  /** Rate per metre (rounded to the minor unit when the price is per yard), for weighing and older readers. */
  @Column({ type: 'integer', default: 0 })
  pricePerMetreMinor: number;

  /** The price exactly as the supplier quotes it, per `priceUnit`: 2 yd at 4 000 a yard costs 8 000. */
  @Column({ type: 'integer', default: 0 })
  priceMinor: number;

  @Column({ type: 'varchar', length: 5, default: 'metre' })
  priceUnit: 'metre' | 'yard';

  @Column({ type: 'integer', nullable: true })
  supplierId: number | null;

  /** Most plies the cutting knife and the fabric allow in one lay. */
  @Column({ type: 'integer', default: 40 })
  maxPlies: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
