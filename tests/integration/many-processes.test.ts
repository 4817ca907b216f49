import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { MarkerEntity } from '../../server/entities';
import { redisConnection } from '../../server/modules/markers/marker-queue-redis';
import type { MarkerJobInput } from '../../server/modules/markers/marker-input';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { mm } from '../../shared/units/units';
import { freshDatabaseTarget } from '../fixtures/fresh-database';
import { DEMO, DEMO_PASSWORD, TEST_TODAY } from '../fixtures/test-app';

/**
 * Two web processes (the real server entry, each on its own port) on one database: the SQLite file by
 * default; with TEST_DATABASE_URL a PostgreSQL database, and with TEST_REDIS_URL one Redis shared by both
 * (sign-in counts and the job queues there, with two `npm run worker` processes running the jobs).
 */
const redisUrl = process.env.TEST_DATABASE_URL ? process.env.TEST_REDIS_URL : undefined;
const dir = mkdtempSync(join(tmpdir(), 'seamrun-many-'));
const children: ChildProcess[] = [];
let target = '';
let a = '';
let b = '';

const LOCK_AFTER = 3;
const RATE_LIMIT = 4;

function databaseEnv(): NodeJS.ProcessEnv {
  return target.includes('://') ? { DATABASE_URL: target } : { DATABASE_PATH: target, DATABASE_URL: '' };
}

function spawnEntry(entry: string, extra: NodeJS.ProcessEnv, ready: RegExp): Promise<string> {
  return new Promise((resolve, reject) => {
    const proc = spawn(process.execPath, ['--import', 'tsx', entry], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        ...databaseEnv(),
        REDIS_URL: redisUrl ?? '',
        SEED_DEMO: 'false',
        LOCAL_SMTP_PORT: '0',
        LOCAL_PAYMENTS_PORT: '0',
        ...extra,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    children.push(proc);
    let out = '';
    const timer = setTimeout(() => reject(new Error(`${entry} did not start:\n${out}`)), 90_000);
    proc.stdout!.on('data', (d) => {
      out += String(d);
      const m = ready.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve((m[1] ?? '').replace('localhost', '127.0.0.1'));
      }
    });
    proc.stderr!.on('data', (d) => (out += String(d)));
    proc.on('exit', (code) => reject(new Error(`${entry} exited ${code}:\n${out}`)));
  });
}

const startWeb = () =>
  spawnEntry(
    'server/dev.ts',
    { PORT: '0', HOST: '127.0.0.1', LOGIN_LOCK_AFTER: String(LOCK_AFTER), LOGIN_RATE_LIMIT: String(RATE_LIMIT), LOG_LEVEL: 'silent' },
    /running at (http:\/\/localhost:\d+)/,
  );

/** A small job of rectangles that runs for its whole one-second budget. */
const job: MarkerJobInput = {
  engine: {
    stripWidth: mm(1000),
    gap: mm(0),
    pieces: [
      { id: 'a', polygon: [{ x: 0, y: 0 }, { x: 300, y: 0 }, { x: 300, y: 200 }, { x: 0, y: 200 }], quantity: 6 },
      { id: 'b', polygon: [{ x: 0, y: 0 }, { x: 250, y: 0 }, { x: 125, y: 180 }], quantity: 5 },
    ],
  },
  seed: 7,
  seconds: 1,
  labels: { a: { size: 'M', name: 'panel' }, b: { size: 'M', name: 'gusset' } },
};
const MARKERS = 4;

beforeAll(async () => {
  target = process.env.TEST_DATABASE_URL ? await freshDatabaseTarget() : join(dir, 'shared.sqlite');
  const ds = await openDatabase(target);
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  // Marker jobs left queued, as a restart finds them: both processes resume every one at start-up.
  for (let i = 0; i < MARKERS; i++) {
    await ds.getRepository(MarkerEntity).save({
      studioId: 1, styleId: 1, ratio: { M: 1 }, widthMm: 1000, inputHash: `many-processes-${i}`,
      status: 'queued', input: { ...job, seed: 7 + i }, result: null, error: '',
    });
  }
  await ds.destroy();
  if (redisUrl) {
    // Sign-in counts outlive a run in Redis (15-minute windows): start from none.
    const redis = redisConnection(redisUrl);
    const keys = await redis.keys('seamrun:sign-in:*');
    if (keys.length) await redis.del(...keys);
    redis.disconnect();
    const worker = () => spawnEntry('server/worker.ts', {}, /"ready":true/);
    await Promise.all([worker(), worker()]);
  }
  [a, b] = await Promise.all([startWeb(), startWeb()]);
}, 120_000);

afterAll(() => {
  for (const c of children) c.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

const post = (base: string, path: string, body: unknown, cookie?: string) =>
  fetch(`${base}${path}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
    body: JSON.stringify(body),
  });
const me = (base: string, cookie: string) => fetch(`${base}/api/auth/me`, { headers: { cookie } });

describe(`two web processes on one ${redisUrl ? 'PostgreSQL database and one Redis' : process.env.TEST_DATABASE_URL ? 'PostgreSQL database' : 'SQLite file'}`, () => {
  it('keeps a lock-out reached through one process on the other', async () => {
    for (let i = 0; i < LOCK_AFTER; i++) {
      const wrong = await post(a, '/api/auth/login', { email: DEMO.cutter, password: `wrong-${i}-password` });
      expect(wrong.status).toBe(401);
    }
    const right = await post(b, '/api/auth/login', { email: DEMO.cutter, password: DEMO_PASSWORD });
    expect(right.status).toBe(429);
    expect((await right.json()).error.code).toBe('locked');
  });

  it('counts sign-in attempts from one address across both processes', async () => {
    // No such account, so nothing locks: only the per-address limit can refuse.
    const email = 'nobody@elsewhere.example';
    const statuses: number[] = [];
    for (let i = 0; i <= RATE_LIMIT; i++) {
      const res = await post(i % 2 ? b : a, '/api/auth/login', { email, password: 'not-the-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([...Array<number>(RATE_LIMIT).fill(401), 429]);
  });

  it('refuses on the other process, within a second, a session signed out on one', async () => {
    const login = await post(a, '/api/auth/login', { email: DEMO.owner, password: DEMO_PASSWORD });
    expect(login.status).toBe(200);
    const cookie = login.headers.get('set-cookie')!.split(';')[0];
    expect((await me(b, cookie)).status).toBe(200); // B has now read (and briefly remembers) the session
    expect((await post(a, '/api/auth/logout', {}, cookie)).status).toBe(200);
    expect((await me(a, cookie)).status).toBe(401);
    // The stated bound: a process remembers a session it read for at most 1 s (server/auth/session-store.ts).
    await new Promise((r) => setTimeout(r, 1100));
    expect((await me(b, cookie)).status).toBe(401);
  });

  it('runs each marker job once though both processes queued it', async () => {
    const ds = await openDatabase(target);
    const repo = ds.getRepository(MarkerEntity);
    const started = Date.now();
    let rows = await repo.find({ order: { id: 'ASC' } });
    while (rows.some((m) => m.status === 'queued' || m.status === 'running') && Date.now() - started < 60_000) {
      await new Promise((r) => setTimeout(r, 250));
      rows = await repo.find({ order: { id: 'ASC' } });
    }
    await ds.destroy();
    expect(rows).toHaveLength(MARKERS);
    expect(rows.map((m) => [m.id, m.status, m.runs])).toEqual(rows.map((m) => [m.id, 'done', 1]));
  }, 90_000);

  it('stops a marker running in one process when it is cancelled through the other', async () => {
    const login = await post(a, '/api/auth/login', { email: DEMO.owner, password: DEMO_PASSWORD });
    const cookie = login.headers.get('set-cookie')!.split(';')[0];
    const created = await post(a, '/api/markers', { styleId: 1, batchId: 1, fabricId: 1, ratio: { XS: 3, S: 3, M: 3 }, seconds: 120 }, cookie);
    expect(created.status).toBe(202); // accepted: queued
    const id: number = (await created.json()).marker.id;
    const read = async (base: string) => (await (await fetch(`${base}/api/markers/${id}?drawing=false`, { headers: { cookie } })).json()).marker;
    const started = Date.now();
    while ((await read(a)).status !== 'running' && Date.now() - started < 30_000) await new Promise((r) => setTimeout(r, 200));
    expect((await post(b, `/api/markers/${id}/cancel`, {}, cookie)).status).toBe(200);
    // The outcome is stored by the run itself when it stops (until then the stored time is 0).
    let marker = await read(b);
    const cancelled = Date.now();
    while (!(marker.elapsedMs > 0) && Date.now() - cancelled < 30_000) {
      await new Promise((r) => setTimeout(r, 250));
      marker = await read(b);
    }
    expect(marker.status).toBe('cancelled');
    // Stopped long before its 120 s budget: the run noticed the cancellation (within one lease renewal, 5 s).
    expect(marker.elapsedMs).toBeGreaterThan(0);
    expect(marker.elapsedMs).toBeLessThan(60_000);
  }, 90_000);
});
