import type { DataSource } from 'typeorm';

/** What each area's demo seeder receives; seeders run in order, after the foundation seed. */
export interface SeedContext {
  ds: DataSource;
  studioId: number;
  styleId: number;
  batchId: number;
  ownerId: number;
  today: Date;
  /** Seconds a seeded marker may take (kept short so start-up stays quick). */
  nestingSeconds: number;
}
