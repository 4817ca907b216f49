import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('suppliers')
export class SupplierEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 120, default: '' })
  contact: string;

  @Column({ type: 'varchar', length: 200 })
  email: string;

  @Column({ type: 'integer', default: 7 })
  leadTimeDays: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
