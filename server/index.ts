import 'reflect-metadata';
import type { Server } from 'node:http';
import { startBackupSchedule } from './db/backup-schedule';
import { openDatabase } from './db/data-source';
import { startWalCheckpointer } from './db/wal-checkpointer';
import { startSessionPurge } from './auth/session-purge';
import { createSessionRepository } from './modules/sessions/session.repository';
import { createApp, type AppControl } from './app';
import { loadEnv, shouldMigrateOnStart, type Env } from './env';
import { logger } from './observability/logger';
import { DEMO_PEOPLE, demoPin, seedDemoStudio } from './seed/demo-studio';

/** env → data source → migrations → expired sessions purged → seed → listen. */
export async function startServer(overrides: Partial<NodeJS.ProcessEnv> = {}) {
  const env: Env = loadEnv({ ...process.env, ...overrides });
  const ds = await openDatabase(env.DATABASE_URL || env.DATABASE_PATH, { migrate: shouldMigrateOnStart(env) });
  const checkpointer = env.DATABASE_URL ? null : await startWalCheckpointer(ds, env.DATABASE_PATH);
  const sessionPurge = await startSessionPurge(createSessionRepository(ds));
  const seeded = env.SEED_DEMO
    ? await seedDemoStudio(ds, {
        password: env.DEMO_PASSWORD,
        pinPrefix: env.DEMO_PIN_PREFIX,
        today: new Date(),
        nestingSeconds: Math.min(env.NESTING_SECONDS, 6),
      })
    : false;
  const control: { current?: AppControl } = {};
  const app = createApp({ ds, env, control });
  await control.current!.start();
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(env.PORT, env.HOST, () => resolve(s));
  });
  const backups = startBackupSchedule(env, logger);
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : env.PORT;
  const stop = async () => {
    backups.stop();
    await control.current!.stop();
    sessionPurge.stop();
    await new Promise((r) => server.close(r));
    await checkpointer?.stop();
    if (ds.isInitialized) await ds.destroy();
  };
  return { server, ds, env, port, seeded, stop };
}

export function printBanner(port: number, env: Env, seeded: boolean) {
  const lines = [
    '',
    `Seamrun is running at http://localhost:${port}`,
    seeded ? 'Demo studio "Tamarind Row Studio" seeded.' : 'Using the existing database.',
    `Demo sign-ins (password: ${env.DEMO_PASSWORD}):`,
    ...DEMO_PEOPLE.map(
      (p) => `  ${p.role.padEnd(10)} ${p.email.padEnd(30)}${p.pin ? ` PIN ${demoPin(env.DEMO_PIN_PREFIX, p.pin)}` : ''}`,
    ),
    '',
  ];
  console.log(lines.join('\n'));
}
