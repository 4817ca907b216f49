import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';
import { StyleEntity } from './style.entity';

@Entity('batches')
export class BatchEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  styleId: number;

  @ManyToOne(() => StyleEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'styleId' })
  style?: StyleEntity;

  /** Size label → garments to make. */
  @Column({ type: 'simple-json' })
  quantities: Record<string, number>;

  /** Calendar date, YYYY-MM-DD. */
  @Column({ type: 'varchar', length: 10 })
  dueDate: string;

  @Column({ type: 'varchar', length: 16, default: 'planned' })
  status: 'planned' | 'cutting' | 'sewing' | 'finishing' | 'shipped' | 'cancelled';

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
