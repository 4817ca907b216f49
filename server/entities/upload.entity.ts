import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('uploads')
export class UploadEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'varchar', length: 24 })
  kind: 'sketch' | 'photo' | 'swatch' | 'packing-list' | 'measurements';

  @Column({ type: 'integer', nullable: true })
  styleId: number | null;

  @Column({ type: 'varchar', length: 200 })
  originalName: string;

  @Column({ type: 'varchar', length: 80 })
  mimeType: string;

  @Column({ type: 'integer' })
  size: number;

  /** Path under data/uploads; never taken from the client. */
  @Column({ type: 'varchar', length: 200 })
  storedName: string;

  @Column({ type: 'integer' })
  uploadedBy: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
