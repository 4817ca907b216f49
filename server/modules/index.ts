import type { Env } from '../env';
import { createAuditModule } from './audit/audit.module';
import { createAuthModule } from './auth/auth.module';
import { createBatchesModule } from './batches/batches.module';
import { createCostingModule } from './costing/costing.module';
import { createCuttingModule } from './cutting/cutting.module';
import { createFloorModule } from './floor/floor.module';
import { createGradingModule } from './grading/grading.module';
import { createLineModule } from './line/line.module';
import { createMailModule } from './mail/mail.module';
import type { MarkerQueueOptions } from './markers/marker-queue';
import { createMarkersModule } from './markers/markers.module';
import type { ApiModule, ModuleContext } from './module';
import { createPayModule } from './pay/pay.module';
import { createPurchasingModule } from './purchasing/purchasing.module';
import { createSearchModule } from './search/search.module';
import { createStudiosModule } from './studios/studios.module';
import { createStylesModule } from './styles/styles.module';
import { createUploadsModule } from './uploads/uploads.module';
import { createUsersModule } from './users/users.module';

export interface ModuleOptions {
  /** Sign-in limits (always set: loadEnv gives them defaults). */
  limits: Pick<Env, 'LOGIN_RATE_LIMIT' | 'LOGIN_LOCK_AFTER' | 'LOGIN_IP_FAILURE_LIMIT'>;
  /** Worker entry, overrun and per-studio cap of the marker queue (tests lower them). */
  markerQueue?: MarkerQueueOptions;
}

/**
 * Builds every area of the API once, in the order their needs run (the audit trail first, grading's pieces
 * before markers and cutting…), and hands each the services of the others it needs, typed. The one loop is
 * cutting ⇄ markers at run time: cut plans read finished markers' lengths, and the marker queue calls
 * cutting's completion hook; that hook and the fabric lookup are bound late, so neither area imports the other.
 */
export function createModules(base: Omit<ModuleContext, 'audit'>, opts: ModuleOptions) {
  const audit = createAuditModule(base.ds);
  const ctx: ModuleContext = { ...base, audit: audit.services.audit };
  const users = createUsersModule(ctx);
  const studio = createStudiosModule(ctx);
  const auth = createAuthModule(ctx, { users: users.services.users, studios: studio.services.studios, limits: opts.limits });
  const stylesModule = createStylesModule(ctx);
  const { styles } = stylesModule.services;
  const batchesModule = createBatchesModule(ctx, { styles });
  const { batches } = batchesModule.services;
  const mail = createMailModule(ctx);
  const uploads = createUploadsModule(ctx);
  const grading = createGradingModule(ctx, { styles, studios: studio.services.studios });
  const { cuttingPieces } = grading.services;
  const costing = createCostingModule(ctx, { cuttingPieces });
  const markers = createMarkersModule(ctx, {
    styles,
    batches,
    cuttingPieces,
    fabrics: { get: (studioId, id) => cutting.services.fabrics.get(studioId, id) },
    onMarkerDone: (studioId, markerId) => cutting.services.onMarkerDone(studioId, markerId),
    queueOptions: opts.markerQueue,
  });
  const cutting = createCuttingModule(ctx, {
    batches,
    cuttingPieces,
    markers: markers.services.repository,
    labourCostPerMinute: costing.services.labourCostPerMinute,
  });
  const line = createLineModule(ctx, { styles, batches });
  const floor = createFloorModule(ctx);
  const pay = createPayModule(ctx, { floor: floor.services.progress });
  const purchasing = createPurchasingModule(ctx, { costing: costing.services.costing, mail: mail.services.mail });
  const search = createSearchModule(ctx);
  return {
    /** Mount order: auth before every area, the areas sharing /api/styles and /api/batches in this order. */
    modules: { auth, users, studio, styles: stylesModule, batches: batchesModule, audit, mail, uploads, grading, markers, cutting, line, floor, pay, costing, purchasing, search } satisfies Record<string, ApiModule>,
    /** Each area's services another area, createApp or a test reads; nothing else. */
    services: {
      audit: audit.services,
      auth: auth.services,
      users: users.services,
      studio: studio.services,
      styles: stylesModule.services,
      batches: batchesModule.services,
      mail: mail.services,
      grading: grading.services,
      markers: markers.services,
      cutting: cutting.services,
      floor: floor.services,
      pay: pay.services,
      costing: costing.services,
    },
  };
}
