/** `npm run db:migrate`: bring the configured database up to date and exit. */
import { loadEnv } from '../env';
import { openDatabase } from './data-source';

const env = loadEnv();
const ds = await openDatabase(env.DATABASE_PATH);
const applied = await ds.query('SELECT name FROM migrations ORDER BY id');
console.log(JSON.stringify({ database: env.DATABASE_PATH, migrations: applied.map((m: { name: string }) => m.name) }));
await ds.destroy();
