import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';
import type { Role } from '../../shared/auth/permissions';
import { StudioEntity } from './studio.entity';

@Entity('users')
export class UserEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  @ManyToOne(() => StudioEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'studioId' })
  studio?: StudioEntity;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Sign-in name: an e-mail or a username, unique across the installation. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 200 })
  email: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @Column({ type: 'varchar', length: 255 })
  passwordHash: string;

  @Column({ type: 'varchar', length: 255, nullable: true })
  pinHash: string | null;

  @Column({ type: 'boolean', default: false })
  mustChangePassword: boolean;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  /** Failed password sign-ins since the last good one. */
  @Column({ type: 'integer', default: 0 })
  failedLogins: number;

  @Column({ type: TIMESTAMP, nullable: true })
  lockedUntil: Date | null;

  /** Failed floor PIN sign-ins, counted apart from password failures so PIN guesses never lock the password form. */
  @Column({ type: 'integer', default: 0 })
  pinFailures: number;

  @Column({ type: TIMESTAMP, nullable: true })
  pinLockedUntil: Date | null;

  /** Bumped on password change or deactivation; sessions carrying an older value are dropped. */
  @Column({ type: 'integer', default: 1 })
  sessionVersion: number;

  /**
   * The person's connected account at the payments service (e.g. `acct_…`), set by the owner; live
   * payouts go there. Empty: test payouts use a derived one, live payouts are refused until it is set.
   */
  @Column({ type: 'varchar', length: 64, default: '' })
  payoutAccount: string;

  /**
   * Machine types the person can run, each with their pace (1.0 = standard minutes, 0.8 = 25 % slower).
   * Null: the defaults for their role (shared/schemas/people.ts, defaultSkills).
   */
  @Column({ type: 'simple-json', nullable: true })
  skills: Record<string, number> | null;

  /** The person's own language (`en`, `fr`); null: the studio's. */
  @Column({ type: 'varchar', length: 8, nullable: true })
  language: 'en' | 'fr' | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
