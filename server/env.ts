import { existsSync } from 'node:fs';
import { z } from 'zod';

// A `.env` file beside package.json fills variables the environment does not set (Node's own reader,
// no banner). Must run before any module reads process.env at load time (entity column types do).
if (existsSync('.env') && process.env.NODE_ENV !== 'test' && !process.env.VITEST) process.loadEnvFile('.env');

/** The session secret a fresh checkout runs with; never accepted with NODE_ENV=production. */
export const DEVELOPMENT_SESSION_SECRET = 'dev-only-session-secret-change-me';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  DATABASE_PATH: z.string().default('data/seamrun.sqlite'),
  /** postgres://… switches to PostgreSQL; empty keeps the embedded SQLite file. */
  DATABASE_URL: z.string().default(''),
  /** redis://… moves long jobs to BullMQ workers (`npm run worker`); empty keeps the in-process queue. */
  REDIS_URL: z.string().default(''),
  SESSION_SECRET: z.string().min(16).default(DEVELOPMENT_SESSION_SECRET),
  TRUST_PROXY: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
  DEMO_PASSWORD: z.string().min(8).default('seamrun-demo'),
  DEMO_PIN_PREFIX: z.string().regex(/^\d{2}$/).default('40'),
  /** Seed the demo studio into an empty database; unset means yes, except with NODE_ENV=production. */
  SEED_DEMO: z.enum(['true', 'false']).optional(),
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).default(30),
  LOGIN_LOCK_AFTER: z.coerce.number().int().min(1).default(8),
  /** Failed sign-ins (any account) one address may make per 15 minutes. */
  LOGIN_IP_FAILURE_LIMIT: z.coerce.number().int().min(1).default(100),
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).default(5 * 1024 * 1024),
  NESTING_SECONDS: z.coerce.number().min(1).max(3600).default(20),
  SMTP_URL: z.string().default(''),
  MAIL_FROM: z.string().default('Seamrun <no-reply@seamrun.local>'),
  LOCAL_SMTP_PORT: z.coerce.number().int().min(0).default(2525),
  PAYMENTS_SECRET_KEY: z.string().default(''),
  /**
   * Run pending migrations when the server starts. Default: yes, except with NODE_ENV=production, where
   * `npm run db:migrate` is its own deployment step and a start against a database that is behind stops.
   */
  MIGRATE_ON_START: z.enum(['true', 'false']).optional(),
  /** pino level: fatal, error, warn, info, debug, trace or silent (default info; silent under tests). */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  LOCAL_PAYMENTS_PORT: z.coerce.number().int().min(0).default(12111),
  /** SQLite file of the local payments stand-in's keys and transfers; empty: beside DATABASE_PATH (memory in tests). */
  LOCAL_PAYMENTS_PATH: z.string().default(''),
  /** Hours between scheduled online backups; 0 turns them off. Default 24 (off under NODE_ENV=test). */
  BACKUP_EVERY_HOURS: z.coerce.number().min(0).max(24 * 365).optional(),
  /** How many scheduled backups to keep; older ones are deleted. */
  BACKUP_KEEP: z.coerce.number().int().min(1).default(14),
  /** Folder of the scheduled backups (default: backups/ beside the SQLite file, or data/backups). */
  BACKUP_DIR: z.string().default(''),
});

/**
 * Production refuses the built-in session secret (anyone could sign a session cookie with it) and only
 * seeds the demo studio, with its published passwords, when SEED_DEMO=true says so.
 */
const checkedEnvSchema = envSchema
  .superRefine((e, ctx) => {
    if (e.NODE_ENV === 'production' && e.SESSION_SECRET === DEVELOPMENT_SESSION_SECRET) {
      ctx.addIssue({
        code: 'custom',
        path: ['SESSION_SECRET'],
        message: 'the built-in development secret is refused with NODE_ENV=production; set a long random value (e.g. `openssl rand -hex 32`)',
      });
    }
  })
  .transform(({ SEED_DEMO, ...e }) => ({ ...e, SEED_DEMO: SEED_DEMO === undefined ? e.NODE_ENV !== 'production' : SEED_DEMO === 'true' }));

export type Env = z.infer<typeof checkedEnvSchema>;

/** Whether this start migrates: MIGRATE_ON_START when set, else everywhere but production. */
export const shouldMigrateOnStart = (env: Env) =>
  env.MIGRATE_ON_START ? env.MIGRATE_ON_START === 'true' : env.NODE_ENV !== 'production';

/** Parse process.env once; a readable failure names every bad variable. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = checkedEnvSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
