import { Initial1796168535359 } from './1796168535359-Initial';
import { PayoutAccount1796181395083 } from './1796181395083-PayoutAccount';
import { CostingLabourBasis1796365596933 } from './1796365596933-CostingLabourBasis';

/** PostgreSQL migrations, generated from the same entities (`DATABASE_URL=postgres://… npm run db:generate -- Name`). */
export const postgresMigrations: Function[] = [Initial1796168535359, PayoutAccount1796181395083, CostingLabourBasis1796365596933];
