import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('audit_entries')
@Index(['studioId', 'createdAt'])
export class AuditEntryEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer', nullable: true })
  userId: number | null;

  @Column({ type: 'varchar', length: 120, default: '' })
  userName: string;

  /** e.g. create, update, deactivate, log, approve. */
  @Column({ type: 'varchar', length: 40 })
  action: string;

  @Column({ type: 'varchar', length: 40 })
  entity: string;

  @Column({ type: 'integer', nullable: true })
  entityId: number | null;

  @Column({ type: 'text', default: '' })
  before: string;

  @Column({ type: 'text', default: '' })
  after: string;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
