import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';
import { FabricEntity } from './fabric.entity';

@Entity('rolls')
@Index(['studioId', 'label'], { unique: true })
export class RollEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  fabricId: number;

  @ManyToOne(() => FabricEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'fabricId' })
  fabric?: FabricEntity;

  @Column({ type: 'varchar', length: 40 })
  label: string;

  @Column({ type: 'real' })
  lengthMm: number;

  /** The supplier's ticket length when the roll came from a packing list; plans take allowances off it until the roll is measured. */
  @Column({ type: 'real', nullable: true })
  ticketLengthMm: number | null;

  @Column({ type: 'real' })
  widthMm: number;

  @Column({ type: 'varchar', length: 40 })
  shadeLot: string;

  @Column({ type: 'varchar', length: 10 })
  receivedDate: string;

  @Column({ type: 'real' })
  remainingMm: number;

  /** Length held by lays not yet cut: the sum of the roll's `held` reservations. Free = remaining − reserved. */
  @Column({ type: 'real', default: 0 })
  reservedMm: number;

  /** A short end kept as stock. */
  @Column({ type: 'boolean', default: false })
  isRemnant: boolean;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
