import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Sign-in attempts counted per key (address and account) in a fixed window, shared by every web process
 * that uses this database (server/auth/throttle-store.ts; Redis holds them instead when configured).
 */
@Entity('sign_in_throttles')
export class SignInThrottleEntity {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  key: string;

  @Column({ type: 'integer' })
  hits: number;

  /** End of the current window, epoch milliseconds. */
  @Index()
  @Column({ type: 'bigint' })
  resetAtMs: number;
}
