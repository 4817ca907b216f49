import { Redis } from 'ioredis';

/**
 * The one way the server connects to Redis (REDIS_URL): the job runner, the marker queue, the sign-in
 * throttle and the readiness probe. BullMQ needs `maxRetriesPerRequest: null` on the connections it blocks on.
 */
export const redisConnection = (url: string) => new Redis(url, { maxRetriesPerRequest: null });
