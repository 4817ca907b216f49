import type { BatchRepository } from './batches/batch.repository';
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
import type { StyleRepository } from './styles/style.repository';
import { createUploadsModule } from './uploads/uploads.module';

export interface FeatureModuleOptions {
  styles: StyleRepository;
  batches: BatchRepository;
  /** Worker entry, overrun and per-studio cap of the marker queue (tests lower them). */
  markerQueue?: MarkerQueueOptions;
}

/**
 * Builds every feature area once, in the order their needs run (grading's pieces before markers and
 * cutting, cutting's fabrics before markers…), and hands each the services of the others it needs, typed.
 * The one loop is cutting ⇄ markers at run time: cut plans read finished markers' lengths, and the marker
 * queue calls cutting's completion hook; the hook is bound late, so neither area imports the other's setup.
 */
export function createFeatureModules(ctx: ModuleContext, opts: FeatureModuleOptions) {
  const { styles, batches } = opts;
  const mail = createMailModule(ctx);
  const uploads = createUploadsModule(ctx);
  const grading = createGradingModule(ctx, { styles });
  const { cuttingPieces } = grading.services;
  const costing = createCostingModule(ctx, { cuttingPieces });
  const markers = createMarkersModule(ctx, {
    styles,
    batches,
    cuttingPieces,
    fabrics: { get: (studioId, id) => cutting.services.fabrics.get(studioId, id) },
    onMarkerDone: (studioId, markerId) => cutting.services.cutting.onMarkerDone(studioId, markerId),
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
  return {
    /** Mount order (mail first: others send through it). */
    modules: { mail, uploads, grading, markers, cutting, line, floor, pay, costing, purchasing } satisfies Record<string, ApiModule>,
    services: {
      mail: mail.services,
      grading: grading.services,
      markers: markers.services,
      cutting: cutting.services,
      line: line.services,
      floor: floor.services,
      pay: pay.services,
      costing: costing.services,
      purchasing: purchasing.services,
    },
  };
}
