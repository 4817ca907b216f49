import type { ApiModule, ModuleContext } from '../module';
import { createMarkerQueue, type MarkerQueue, type MarkerQueueOptions } from './marker-queue';
import { createRedisMarkerQueue } from './marker-queue-redis';
import type { MarkerJobInput } from './marker-input';
import { createMarkerRepository } from './marker.repository';
import { linkMarkerToLays } from './link-lays';
import { markerRoutes } from './marker.routes';
import { createMarkerService, type MarkerService } from './marker.service';

/** ctx.services key of the marker service (start, read, cancel markers). */
export const MARKER_SERVICE_KEY = 'markers';
/** ctx.services key of the marker queue (tests wait on `idle()`). */
export const MARKER_QUEUE_KEY = 'markers:queue';
/** ctx.services key a test may set before the first job to pass MarkerQueueOptions (worker entry, overrun). */
export const MARKER_QUEUE_OPTIONS_KEY = 'markers:queue-options';

let current: { queue?: MarkerQueue; ctx?: ModuleContext } = {};
let sweep: NodeJS.Timeout | undefined;

/** How often an in-process queue looks for jobs no live process holds (queued elsewhere, or orphaned). */
const SWEEP_EVERY_MS = 10_000;

/** The markers area: the nesting job queue and /api/markers. The queue starts on first use. */
export const markersModule: ApiModule = {
  name: 'markers',
  register(api, ctx) {
    const markers = createMarkerRepository(ctx.ds);
    let queue: MarkerQueue | undefined;
    const getQueue = () => {
      const extra = ctx.services.get(MARKER_QUEUE_OPTIONS_KEY) as MarkerQueueOptions | undefined;
      // REDIS_URL moves the runs to worker processes (`npm run worker`); otherwise they run in-process.
      queue ??= ctx.env.REDIS_URL
        ? createRedisMarkerQueue(ctx.env.REDIS_URL, extra)
        : createMarkerQueue(markers, { onDone: (studioId, id) => linkMarkerToLays(ctx.ds, studioId, id), ...extra });
      ctx.services.set(MARKER_QUEUE_KEY, queue);
      current = { queue, ctx };
      return queue;
    };
    const service: MarkerService = createMarkerService({
      ds: ctx.ds, markers, queue: getQueue, audit: ctx.audit, defaultSeconds: ctx.env.NESTING_SECONDS ?? 20,
    });
    ctx.services.set(MARKER_SERVICE_KEY, service);
    ctx.services.set('markers:get-queue', getQueue);
    current = { ctx };
    api.use('/markers', markerRoutes(ctx.ds, service));
  },
  /**
   * Resume the jobs no live process holds: queued (the seed queues the demo markers) or left running by a
   * process that died. Other web processes on the same database may queue the same ones; each run claims
   * its job first, so it runs once. Without Redis, every process sweeps again now and then for jobs a
   * process that died had queued or was running (their lease ran out); with Redis, BullMQ does that.
   */
  async start(ctx) {
    const getQueue = ctx.services.get('markers:get-queue') as () => MarkerQueue;
    const markers = createMarkerRepository(ctx.ds);
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
    await current.queue?.stop();
  },
};
