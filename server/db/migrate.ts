/**
 * `npm run db:migrate`: bring the configured database (DATABASE_URL when set, else the SQLite file at
 * DATABASE_PATH) up to date and exit. Prints one JSON line: the database and the migrations it ran now.
 */
import { loadEnv } from '../env';
import { createDataSource } from './data-source';

const env = loadEnv();
const target = env.DATABASE_URL || env.DATABASE_PATH;
const ds = createDataSource(target);
await ds.initialize();
const ran = await ds.runMigrations({ transaction: 'each' });
const shown = env.DATABASE_URL ? env.DATABASE_URL.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:[redacted]@') : env.DATABASE_PATH;
console.log(JSON.stringify({ database: shown, driver: ds.options.type, ran: ran.map((m) => m.name) }));
await ds.destroy();
