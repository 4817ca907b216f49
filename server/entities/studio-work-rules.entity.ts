import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A studio's pay rules (and, beside them, its working calendar): one row per studio, made on first save. Seamrun
 * computes with the values the studio enters and defers to local law for what they must be.
 */
@Entity('studio_work_rules')
@Index(['studioId'], { unique: true })
export class StudioWorkRulesEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  /** Top each person up to the minimum wage for their attended hours, per pay period. */
  @Column({ type: 'boolean', default: false })
  minimumWageOn: boolean;

  /** Minimum wage per hour, exact decimal minor units ("15000" or "15000.5"); empty when not entered. */
  @Column({ type: 'varchar', length: 24, default: '' })
  minimumHourlyMinor: string;

  /** Premium on hours beyond the calendar's, % of the regular hourly rate; 0 = no premium. */
  @Column({ type: 'integer', default: 0 })
  overtimePremiumPercent: number;

  /** IANA time zone of the studio: its days (today, pay days, the schedule's dates) are days there. */
  @Column({ type: 'varchar', length: 64, default: 'UTC' })
  timeZone: string;

  /** Working weekdays, 0 = Sunday … 6 = Saturday. Null: not entered (Monday to Friday). */
  @Column({ type: 'simple-json', nullable: true })
  workdays: number[] | null;

  /** Shift start and end, `HH:mm` local; empty: not entered (the studio's working day hours). */
  @Column({ type: 'varchar', length: 5, default: '' })
  shiftStart: string;

  @Column({ type: 'varchar', length: 5, default: '' })
  shiftEnd: string;

  /** Unpaid break minutes inside the shift. */
  @Column({ type: 'integer', default: 0 })
  breakMinutes: number;

  /** Non-working dates, `yyyy-MM-dd`. */
  @Column({ type: 'simple-json', nullable: true })
  holidays: string[] | null;

  /** Most overtime hours a week the studio allows; null: none entered. */
  @Column({ type: 'real', nullable: true })
  overtimeLimitHoursPerWeek: number | null;
}
