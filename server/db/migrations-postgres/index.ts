import { Initial1796168535359 } from './1796168535359-Initial';

/** PostgreSQL migrations, generated from the same entities (`DATABASE_URL=postgres://… npm run db:generate -- Name`). */
export const postgresMigrations: Function[] = [Initial1796168535359];
