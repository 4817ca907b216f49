import type { Options, Store, IncrementResponse, ClientRateLimitInfo } from 'express-rate-limit';
import type { Redis } from 'ioredis';
import { redisConnection } from '../jobs/redis-connection';
import type { SignInThrottleRepository } from '../modules/auth/sign-in-throttle.repository';

/**
 * Where sign-in attempts are counted, so every web process sees the same counts: the database by
 * default, Redis when REDIS_URL is set. The lock-out after repeated failures lives on the person's row
 * (server/modules/auth), which every process reads; this covers the per-address limiters in front of it.
 */
export interface ThrottleCounter {
  /** Count one attempt; the count and the end of its window. */
  hit(key: string, windowMs: number): Promise<{ hits: number; resetAtMs: number }>;
  peek(key: string): Promise<{ hits: number; resetAtMs: number } | null>;
  undo(key: string): Promise<void>;
  reset(key: string): Promise<void>;
  close(): Promise<void>;
}

/** Ended windows are purged at most this often. */
const PURGE_EVERY_MS = 10 * 60 * 1000;

export function databaseThrottleCounter(repo: SignInThrottleRepository, now: () => number = Date.now): ThrottleCounter {
  let purgedAt = 0;
  return {
    async hit(key, windowMs) {
      const at = now();
      if (at - purgedAt > PURGE_EVERY_MS) {
        purgedAt = at;
        await repo.purge(at);
      }
      return repo.hit(key, at, windowMs);
    },
    peek: (key) => repo.peek(key, now()),
    undo: (key) => repo.undo(key),
    reset: (key) => repo.reset(key),
    async close() {},
  };
}

// INCR and the window's expiry in one script, so a window always ends even if a process dies between them.
const HIT_SCRIPT = `local hits = redis.call('INCR', KEYS[1])
if hits == 1 or redis.call('PTTL', KEYS[1]) < 0 then redis.call('PEXPIRE', KEYS[1], ARGV[1]) end
return {hits, redis.call('PTTL', KEYS[1])}`;
const UNDO_SCRIPT = `if (tonumber(redis.call('GET', KEYS[1]) or '0') > 0) then redis.call('DECR', KEYS[1]) end return 1`;

export function redisThrottleCounter(redisUrl: string, now: () => number = Date.now): ThrottleCounter {
  let redis: Redis | undefined;
  const client = () => (redis ??= redisConnection(redisUrl));
  const k = (key: string) => `seamrun:sign-in:${key}`;
  return {
    async hit(key, windowMs) {
      const [hits, ttl] = (await client().eval(HIT_SCRIPT, 1, k(key), windowMs)) as [number, number];
      return { hits, resetAtMs: now() + Math.max(ttl, 0) };
    },
    async peek(key) {
      const [hits, ttl] = await Promise.all([client().get(k(key)), client().pttl(k(key))]);
      return hits === null ? null : { hits: Number(hits), resetAtMs: now() + Math.max(ttl, 0) };
    },
    async undo(key) {
      await client().eval(UNDO_SCRIPT, 1, k(key));
    },
    async reset(key) {
      await client().del(k(key));
    },
    async close() {
      redis?.disconnect();
      redis = undefined;
    },
  };
}

/** An express-rate-limit store over a shared counter; one per limiter, told apart by `prefix`. */
export class SharedThrottleStore implements Store {
  /** Counts are shared between processes, so express-rate-limit must not assume they are its own. */
  readonly localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly counter: ThrottleCounter,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const row = await this.counter.peek(`${this.prefix}|${key}`);
    return row ? { totalHits: row.hits, resetTime: new Date(row.resetAtMs) } : undefined;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const { hits, resetAtMs } = await this.counter.hit(`${this.prefix}|${key}`, this.windowMs);
    return { totalHits: hits, resetTime: new Date(resetAtMs) };
  }

  async decrement(key: string) {
    await this.counter.undo(`${this.prefix}|${key}`);
  }

  async resetKey(key: string) {
    await this.counter.reset(`${this.prefix}|${key}`);
  }
}

/** The counter a server uses: Redis with REDIS_URL, else its database. */
export function createThrottleCounter(deps: { repo: SignInThrottleRepository; redisUrl?: string }): ThrottleCounter {
  return deps.redisUrl ? redisThrottleCounter(deps.redisUrl) : databaseThrottleCounter(deps.repo);
}
