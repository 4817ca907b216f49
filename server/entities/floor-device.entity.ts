import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

/**
 * A studio tablet the owner bound to the floor: it shows the studio's floor list and a PIN pad. The device
 * keeps a long random token in an httpOnly cookie; only its SHA-256 is stored here.
 */
@Entity('floor_devices')
export class FloorDeviceEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  /** Hex SHA-256 of the device token. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ type: 'varchar', length: 80 })
  label: string;

  /** The owner who bound it. */
  @Column({ type: 'integer' })
  createdById: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
