import { Initial1796168535359 } from './1796168535359-Initial';
import { PayoutAccount1796181395083 } from './1796181395083-PayoutAccount';
import { ManyProcesses1796363770917 } from './1796363770917-ManyProcesses';

/** PostgreSQL migrations, generated from the same entities (`DATABASE_URL=postgres://… npm run db:generate -- Name`). */
export const postgresMigrations: Function[] = [Initial1796168535359, PayoutAccount1796181395083, ManyProcesses1796363770917];
