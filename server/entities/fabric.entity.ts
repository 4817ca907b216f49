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

  @Column({ type: 'real', default: 0 })
  shrinkagePercent: number;

  /** One-way print or napped pile: every piece keeps one direction. */
  @Column({ type: 'boolean', default: false })
  isDirectional: boolean;

  @Column({ type: 'integer', default: 0 })
  pricePerMetreMinor: number;

  @Column({ type: 'integer', nullable: true })
  supplierId: number | null;

  /** Most plies the cutting knife and the fabric allow in one lay. */
  @Column({ type: 'integer', default: 40 })
  maxPlies: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
