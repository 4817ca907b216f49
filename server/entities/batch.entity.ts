import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';
import { StyleEntity } from './style.entity';

@Entity('batches')
@Index(['studioId', 'number'], { unique: true })
export class BatchEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  /** The batch's number in its studio (B-0007): 1 for a studio's first batch, never reused; the id stays for URLs. */
  @Column({ type: 'integer' })
  number: number;

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
