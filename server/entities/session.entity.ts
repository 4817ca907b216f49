import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

@Entity('sessions')
export class SessionEntity {
  @PrimaryColumn({ type: 'varchar', length: 128 })
  id: string;

  /** Expiry as epoch milliseconds. */
  @Index()
  @Column({ type: 'bigint' })
  expiresAt: number;

  @Column({ type: 'text' })
  data: string;
}
