import type { BatchRepository } from '../batches/batch.repository';
import type { CuttingPieceSource } from '../grading/graded-pieces';
import type { ApiModule, ModuleContext } from '../module';
import type { StyleRepository } from '../styles/style.repository';
import type { MarkerDoneHook } from './marker-job';
import type { MarkerJobInput } from './marker-input';
import { createMarkerQueue, type MarkerQueue, type MarkerQueueOptions } from './marker-queue';
import { createRedisMarkerQueue } from './marker-queue-redis';
import { createMarkerRepository } from './marker.repository';
import { markerRoutes } from './marker.routes';
import { createMarkerService, type FabricLookup } from './marker.service';

/** How often an in-process queue looks for jobs no live process holds (queued elsewhere, or orphaned). */
const SWEEP_EVERY_MS = 10_000;

export interface MarkersModuleDeps {
  styles: StyleRepository;
  batches: BatchRepository;
  fabrics: FabricLookup;
  cuttingPieces: CuttingPieceSource;
  /** Called when a marker is stored as done; the cutting area links it to its planned lays. */
  onMarkerDone: MarkerDoneHook;
  /** Worker entry, overrun and per-studio cap of the queue (tests lower them). */
  queueOptions?: MarkerQueueOptions;
}

/** The markers area: the nesting job queue and /api/markers. The queue starts on first use. */
export function createMarkersModule(ctx: ModuleContext, deps: MarkersModuleDeps) {
  const markers = createMarkerRepository(ctx.ds);
  let queue: MarkerQueue | undefined;
  let sweep: NodeJS.Timeout | undefined;
  /** REDIS_URL moves the runs to worker processes (`npm run worker`); otherwise they run in-process. */
  const getQueue = () =>
    (queue ??= ctx.env.REDIS_URL
      ? createRedisMarkerQueue(ctx.env.REDIS_URL, deps.queueOptions)
      : createMarkerQueue(markers, { onDone: deps.onMarkerDone, ...deps.queueOptions }));
  const service = createMarkerService({
    markers,
    styles: deps.styles,
    batches: deps.batches,
    fabrics: deps.fabrics,
    cuttingPieces: deps.cuttingPieces,
    queue: getQueue,
    audit: ctx.audit,
    defaultSeconds: ctx.env.NESTING_SECONDS ?? 20,
    now: ctx.now,
  });
  return {
    name: 'markers',
    /** `queue()` is the running queue (tests wait on its `idle()`); `repository` answers the cutting area's marker lengths. */
    services: { queue: getQueue, repository: markers },
    mount(api) {
      api.use('/markers', markerRoutes(service));
    },
    /**
     * Resume the jobs no live process holds: queued (the seed queues the demo markers) or left running by a
     * process that died. Other web processes on the same database may queue the same ones; each run claims
     * its job first, so it runs once. Without Redis, every process sweeps again now and then for jobs a
     * process that died had queued or was running (their lease ran out); with Redis, BullMQ does that.
     */
    async start() {
      const resume = async () => {
        const jobs = ctx.env.REDIS_URL ? await markers.unfinished() : await markers.claimable(Date.now());
        for (const m of jobs) getQueue().enqueue(m.studioId, m.id, m.input as MarkerJobInput);
      };
      await resume();
      if (!ctx.env.REDIS_URL) {
        clearInterval(sweep);
        sweep = setInterval(() => void resume().catch(() => undefined), SWEEP_EVERY_MS);
        sweep.unref();
      }
    },
    async stop() {
      clearInterval(sweep);
      sweep = undefined;
      await queue?.stop();
    },
  } satisfies ApiModule & { services: unknown };
}
