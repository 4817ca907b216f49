import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Env } from '../env';
import type { JobRunner } from '../jobs/job-runner';
import type { AuditRepository } from './audit/audit.repository';

/** What every feature module receives from createApp. */
export interface ModuleContext {
  ds: DataSource;
  env: Partial<Env> & Pick<Env, 'NODE_ENV'>;
  audit: AuditRepository;
  now: () => Date;
  /** Runs the long jobs (cut-order solve, documents, mail) in-process or on `npm run worker` processes. */
  jobs: JobRunner;
  /** Services other modules expose (e.g. 'mail', 'jobs'); set in register, read lazily. */
  services: Map<string, unknown>;
}

/**
 * A feature area of the API: mounts its routes under /api and may run background services
 * (a job queue, a local SMTP server) that start with the server and stop with it.
 */
export interface ApiModule {
  name: string;
  register(api: Router, ctx: ModuleContext): void;
  start?(ctx: ModuleContext): Promise<void>;
  stop?(): Promise<void>;
}
