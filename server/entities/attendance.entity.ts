import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Minutes a person was at work on a day, for efficiency (earned ÷ attended minutes). */
@Entity('attendance')
@Index(['studioId', 'userId', 'day'], { unique: true })
export class AttendanceEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @Column({ type: 'integer' })
  userId: number;

  @Column({ type: 'varchar', length: 10 })
  day: string;

  @Column({ type: 'real' })
  minutes: number;
}
