import { costingModule } from './costing/costing.module';
import { cuttingModule } from './cutting/cutting.module';
import { floorModule } from './floor/floor.module';
import { gradingModule } from './grading/grading.module';
import { lineModule } from './line/line.module';
import { mailModule } from './mail/mail.module';
import { markersModule } from './markers/markers.module';
import type { ApiModule } from './module';
import { payModule } from './pay/pay.module';
import { purchasingModule } from './purchasing/purchasing.module';
import { searchModule } from './search/search.module';
import { uploadsModule } from './uploads/uploads.module';

/** Feature modules in mount order (mail first: others send through it). */
export const FEATURE_MODULES: ApiModule[] = [
  mailModule,
  uploadsModule,
  gradingModule,
  markersModule,
  cuttingModule,
  lineModule,
  floorModule,
  payModule,
  costingModule,
  purchasingModule,
  searchModule,
];
