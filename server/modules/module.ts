import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Env } from '../env';
import type { JobRunner } from '../jobs/job-runner';
import type { AuditRepository } from './audit/audit.repository';

/** What every module's setup receives from createApp: the data source stops here, in the setup files. */
export interface ModuleContext {
  ds: DataSource;
  env: Partial<Env> & Pick<Env, 'NODE_ENV'>;
  audit: AuditRepository;
  now: () => Date;
  /** Runs the long jobs (cut-order solve, documents, mail) in-process or on `npm run worker` processes. */
  jobs: JobRunner;
}

/**
 * An area of the API as createApp holds it. Each area's `create<Area>Module(ctx, deps)` builds its
 * repositories once, hands them to its services, and returns them as `services` beside this: its routes
 * (mounted under /api) and the background work (a job queue, a local SMTP server) that starts with the
 * server and stops with it. Whatever one area needs of another comes in through `deps`, typed.
 */
export interface ApiModule {
  name: string;
  mount(api: Router): void;
  start?(): Promise<void>;
  stop?(): Promise<void>;
}
