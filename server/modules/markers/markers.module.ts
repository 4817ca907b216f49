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
  /** Resume the jobs a stopped server left queued or running (the seed queues the demo markers). */
  async start(ctx) {
    const getQueue = ctx.services.get('markers:get-queue') as () => MarkerQueue;
    const markers = createMarkerRepository(ctx.ds);
    for (const m of await markers.unfinished()) {
      await markers.update(m.studioId, m.id, { status: 'queued' });
      getQueue().enqueue(m.studioId, m.id, m.input as MarkerJobInput);
    }
  },
  async stop() {
    await current.queue?.stop();
  },
};
