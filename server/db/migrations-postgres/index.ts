import { Initial1796168535359 } from './1796168535359-Initial';
import { PayoutAccount1796181395083 } from './1796181395083-PayoutAccount';
import { SkillsAndMachines1796363634850 } from './1796363634850-SkillsAndMachines';

/** PostgreSQL migrations, generated from the same entities (`DATABASE_URL=postgres://… npm run db:generate -- Name`). */
export const postgresMigrations: Function[] = [Initial1796168535359, PayoutAccount1796181395083, SkillsAndMachines1796363634850];
