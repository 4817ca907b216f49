import { Initial1796168535359 } from './1796168535359-Initial';
import { PayoutAccount1796181395083 } from './1796181395083-PayoutAccount';
import { FloorSignInAndBundleNumbers1796361960738 } from './1796361960738-FloorSignInAndBundleNumbers';
import { PayoutFreezeAndLogPayPeriod1796362059995 } from './1796362059995-PayoutFreezeAndLogPayPeriod';
import { RollReservations1796362119816 } from './1796362119816-RollReservations';
import { SkillsAndMachines1796363634850 } from './1796363634850-SkillsAndMachines';
import { ManyProcesses1796363770917 } from './1796363770917-ManyProcesses';
import { CostingLabourBasis1796365596933 } from './1796365596933-CostingLabourBasis';
import { StyleComposition1796367105713 } from './1796367105713-StyleComposition';
import { StudioLanguageAndTimeZone1796372876444 } from './1796372876444-StudioLanguageAndTimeZone';
import { OperationTimeStudy1796373145103 } from './1796373145103-OperationTimeStudy';
import { PayRules1796373684413 } from './1796373684413-PayRules';
import { FabricPricesShrinkageAndCorrections1796374281784 } from './1796374281784-FabricPricesShrinkageAndCorrections';
import { WorkingCalendar1796374772013 } from './1796374772013-WorkingCalendar';
import { StudioNumbers1796437123459 } from './1796437123459-StudioNumbers';
import { OrderReceiptKeys1796443579000 } from './1796443579000-OrderReceiptKeys';

/** PostgreSQL migrations, generated from the same entities (`DATABASE_URL=postgres://… npm run db:generate -- Name`). */
export const postgresMigrations: Function[] = [Initial1796168535359, PayoutAccount1796181395083, FloorSignInAndBundleNumbers1796361960738, PayoutFreezeAndLogPayPeriod1796362059995, RollReservations1796362119816, SkillsAndMachines1796363634850, ManyProcesses1796363770917, CostingLabourBasis1796365596933, StyleComposition1796367105713, StudioLanguageAndTimeZone1796372876444, OperationTimeStudy1796373145103, PayRules1796373684413, FabricPricesShrinkageAndCorrections1796374281784, WorkingCalendar1796374772013, StudioNumbers1796437123459, OrderReceiptKeys1796443579000];
