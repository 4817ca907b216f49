import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

@Entity('studios')
export class StudioEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** ISO 4217 code, e.g. KES. */
  @Column({ type: 'varchar', length: 3 })
  currency: string;

  @Column({ type: 'varchar', length: 8, default: 'metric' })
  unitSystem: 'metric' | 'imperial';

  /** The studio's language for screens and documents (a person may pick their own): `en` or `fr`. */
  @Column({ type: 'varchar', length: 8, default: 'en' })
  language: 'en' | 'fr';

  /** IANA time zone the studio works in (`Africa/Nairobi`); dates and times are shown there. */
  @Column({ type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  @Column({ type: 'real', default: 8 })
  workingDayHours: number;

  /** Machines on the floor by type (`{ lockstitch: 4 }`); a type not listed is not limited. Null: none listed. */
  @Column({ type: 'simple-json', nullable: true })
  machines: Record<string, number> | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
