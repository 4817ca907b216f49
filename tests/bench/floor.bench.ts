/**
 * Floor logging under load: `npm run bench:floor`.
 *
 * Starts the real server (migrations + demo seed; NODE_ENV=test so no demo markers are nested in the
 * background during the run) in a child process on loopback with a temporary SQLite file, or with
 * `-- --postgres postgres://…` a new database on that PostgreSQL server. It adds a bench style with 8
 * operations and one batch of 1500 bundles per run, signs in the six demo machinists, then drives
 * POST /api/floor/logs over keep-alive HTTP with 20 and then 100 concurrent clients, each log a distinct
 * bundle operation, in two modes:
 * - closed: each client sends its next log as soon as the last is answered, so `rps` is the most the
 *   server takes (and by Little's law mean latency = clients / rps);
 * - paced: the clients together offer BENCH_RATE (500) logs/s on a timetable, latency counted from when
 *   each log was due, so p99 says how a floor logging at that rate is served.
 * One request in 20 re-sends an already answered idempotency key (a phone retrying), which must replay,
 * not double. Afterwards the acknowledged logs are compared with the database: `lost` = acknowledged keys
 * missing from it, `doubled` = rows beyond one per bundle operation or rows no acknowledgement accounts for.
 * Prints one JSON object per run. BENCH_LEVELS, BENCH_MODES, BENCH_SECONDS and BENCH_RATE override;
 * BENCH_DEBUG, BENCH_PROFILE, BENCH_QUERIES and BENCH_HEAP_SAMPLE=file turn on diagnostics (slow
 * requests and GC pauses, a CPU profile, time per SQL text, allocations that outlive young collections).
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import http from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { PerformanceObserver } from 'node:perf_hooks';
import pg from 'pg';
import { createPostgresDatabase } from '../fixtures/fresh-database';

const LEVELS = (process.env.BENCH_LEVELS ?? '20,100').split(',').map(Number);
/** closed: as fast as the server answers; paced: a fixed offered load of BENCH_RATE logs/s. */
const MODES = (process.env.BENCH_MODES ?? 'closed,paced').split(',') as ('closed' | 'paced')[];
const PACED_RATE = Number(process.env.BENCH_RATE ?? 500);
/** `--postgres postgres://user@host/admin-db` (or BENCH_DATABASE_URL): run on a new database on that server. */
const POSTGRES_ADMIN_URL = (() => {
  const i = process.argv.indexOf('--postgres');
  return i > 0 ? process.argv[i + 1] : (process.env.BENCH_DATABASE_URL ?? '');
})();
const BUNDLES_PER_LEVEL = 2000;
const OPS = 8;
const SECONDS_PER_LEVEL = Number(process.env.BENCH_SECONDS ?? 6);
const WARMUP_SECONDS = Number(process.env.BENCH_WARMUP_SECONDS ?? 4);

async function serve(target: string) {
  const { startServer } = await import('../../server/index');
  const { BatchEntity, BundleEntity, OperationEntity, StyleEntity } = await import('../../server/entities');
  const { port, ds } = await startServer({
    PORT: '0', HOST: '127.0.0.1', NODE_ENV: 'test', ...(target.startsWith('postgres') ? { DATABASE_URL: target } : { DATABASE_PATH: target }), LOGIN_RATE_LIMIT: '10000',
    NESTING_SECONDS: '1', LOCAL_SMTP_PORT: '0', LOCAL_PAYMENTS_PORT: '0',
  });
  const style = await ds.getRepository(StyleEntity).save({ studioId: 1, code: 'BENCH-1', name: 'Bench tee', description: '', sizeRun: ['M'], baseSize: 'M', status: 'approved' });
  await ds.getRepository(OperationEntity).save(
    Array.from({ length: OPS }, (_, i) => ({ studioId: 1, styleId: style.id, seq: i + 1, code: `OP${String(i + 1).padStart(2, '0')}`, name: `Bench operation ${i + 1}`, section: 'sewing' as const, machineType: 'lockstitch', sam: 0.5, predecessors: i ? [`OP${String(i).padStart(2, '0')}`] : [], pieceRateMinor: 500 })),
  );
  const batches: number[] = [];
  for (let l = 0; l < LEVELS.length * MODES.length + 1; l++) {
    const number = ((await ds.getRepository(BatchEntity).maximum('number', { studioId: 1 })) ?? 0) + 1;
    const batch = await ds.getRepository(BatchEntity).save({ studioId: 1, number, styleId: style.id, quantities: { M: BUNDLES_PER_LEVEL * 10 }, dueDate: '2030-01-01', status: 'sewing', notes: 'bench' });
    batches.push(batch.id);
    // Each bench batch numbers its bundles from 1 and is always sent with its batch id: scoped to the batch,
    // as bundles cut before numbers were studio-wide are (bundle.entity.ts, numberScope).
    const rows = Array.from({ length: BUNDLES_PER_LEVEL }, (_, i) => ({ studioId: 1, batchId: batch.id, numberScope: batch.id, layId: 0, number: i + 1, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }));
    for (let i = 0; i < rows.length; i += 300) await ds.getRepository(BundleEntity).insert(rows.slice(i, i + 300));
  }
  const ops = (await ds.getRepository(OperationEntity).findBy({ styleId: style.id })).map((o) => o.id);
  if (process.env.BENCH_HEAP_SAMPLE) {
    // Sample allocations that outlive young-generation collections (kept until a full GC or still live):
    // what the server promotes to the old generation while logging.
    const { Session } = await import('node:inspector/promises');
    const inspector = new Session();
    inspector.connect();
    await inspector.post('HeapProfiler.startSampling', { samplingInterval: 16384, includeObjectsCollectedByMajorGC: true, includeObjectsCollectedByMinorGC: false });
    process.on('SIGTERM', async () => {
      const { profile } = (await inspector.post('HeapProfiler.stopSampling')) as { profile: unknown };
      const { writeFileSync } = await import('node:fs');
      writeFileSync(process.env.BENCH_HEAP_SAMPLE!, JSON.stringify(profile));
      process.exit(0);
    });
  } else if (process.env.BENCH_QUERIES) {
    // Time each SQL text the server runs (BENCH_QUERIES=1): which statements the log path spends on.
    const runner = ds.createQueryRunner() as unknown as { query: (q: string, p?: unknown[], s?: boolean) => Promise<unknown> };
    const stats = new Map<string, { n: number; ms: number; max: number }>();
    const original = runner.query.bind(runner);
    runner.query = async (q, p, st) => {
      const t0 = performance.now();
      try {
        return await original(q, p, st);
      } finally {
        const ms = performance.now() - t0;
        const e = stats.get(q) ?? { n: 0, ms: 0, max: 0 };
        stats.set(q, { n: e.n + 1, ms: e.ms + ms, max: Math.max(e.max, ms) });
      }
    };
    process.on('SIGTERM', () => {
      for (const [q, e] of [...stats].sort((a, b) => b[1].ms - a[1].ms).slice(0, 15))
        console.error(e.n, e.ms.toFixed(0), (e.ms / e.n).toFixed(3), e.max.toFixed(1), q.slice(0, 140));
      process.exit(0);
    });
  } else
    process.on('SIGTERM', () => {
      if (process.env.BENCH_DEBUG) {
        (globalThis as { gc?: () => void }).gc?.();
        const t = (globalThis as unknown as { __sqlt?: Map<string, number[]> }).__sqlt;
        for (const [q, e] of t ?? []) console.error(e[0], e[1].toFixed(0), (e[1] / e[0]).toFixed(3), e[2].toFixed(1), q.slice(0, 90));
        console.error(`server heap after the run: ${Math.round(process.memoryUsage().heapUsed / 1e6)} MB`);
      }
      process.exit(0);
    });
  process.stdout.write(`${JSON.stringify({ ready: true, port, batches, ops })}\n`);
}

const agent = new http.Agent({ keepAlive: true, maxSockets: 256 });

function send(port: number, method: string, path: string, body: unknown, cookie: string) {
  const payload = body === undefined ? undefined : JSON.stringify(body);
  return new Promise<{ status: number; body: string; headers: http.IncomingHttpHeaders }>((resolve, reject) => {
    const req = http.request({ host: '127.0.0.1', port, method, path, agent, headers: { 'content-type': 'application/json', cookie, ...(payload ? { 'content-length': Buffer.byteLength(payload) } : {}) } }, (res) => {
      let data = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (data += c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: data, headers: res.headers }));
    });
    req.on('error', reject);
    if (payload) req.write(payload);
    req.end();
  });
}

async function signIn(port: number, email: string) {
  const res = await send(port, 'POST', '/api/auth/login', { email, password: 'seamrun-demo' }, '');
  if (res.status !== 200) throw new Error(`sign-in failed ${res.status} ${res.body}`);
  return String(res.headers['set-cookie']?.[0] ?? '').split(';')[0];
}

const pct = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? 0;

/** CPU milliseconds the server process has used so far (Linux /proc; null elsewhere). */
function cpuMs(pid: number | undefined): number | null {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // utime + stime, in clock ticks of 1/100 s
  } catch {
    return null;
  }
}

/** Bundle operations not yet logged, per batch: each log the bench sends is a new one. */
const cursors = new Map<number, number>();

interface DriveOptions {
  concurrency: number;
  seconds: number;
  maxRequests?: number;
  /** Paced (open-loop) run: this many logs per second in all, spread over the clients. */
  rate?: number;
}

/**
 * Send logs from `concurrency` clients. Closed loop: each client sends its next log when the last one is
 * answered (the most the server can take). Paced: each client sends on a fixed timetable, and a log's
 * latency counts from when it was due, so a server that falls behind is charged for the queue it causes
 * (no coordinated omission).
 */
async function drive(port: number, cookies: string[], batchId: number, ops: number[], o: DriveOptions) {
  const pairs: { bundleNumber: number; operationId: number }[] = [];
  for (const operationId of ops) for (let n = 1; n <= BUNDLES_PER_LEVEL; n++) pairs.push({ bundleNumber: n, operationId });
  const maxRequests = o.maxRequests ?? Infinity;
  const acked = new Map<string, number>();
  const latencies: number[] = [];
  let errors = 0, replays = 0, requests = 0;
  const started = performance.now();
  const deadline = started + o.seconds * 1000;
  const interval = o.rate ? (1000 * o.concurrency) / o.rate : 0;
  async function client(c: number) {
    const cookie = cookies[c % cookies.length];
    // A phone retries only its own logs, under its own sign-in.
    const mine: string[] = [];
    let due = started + (interval * c) / o.concurrency;
    while (requests < maxRequests) {
      if (interval) {
        if (due >= deadline) break;
        const wait = due - performance.now();
        if (wait > 0) await new Promise((r) => setTimeout(r, wait));
      } else if (performance.now() >= deadline) break;
      const retry = requests % 20 === 19 && mine.length > 0;
      let body: Record<string, unknown>;
      if (retry) {
        const key = mine[(requests * 7919) % mine.length];
        const [, b, op] = key.split(':');
        body = { batchId, bundleNumber: Number(b), operationId: Number(op), idempotencyKey: key };
      } else {
        const next = cursors.get(batchId) ?? 0;
        if (next >= pairs.length) break;
        cursors.set(batchId, next + 1);
        const p = pairs[next];
        body = { batchId, ...p, idempotencyKey: `bench-${batchId}:${p.bundleNumber}:${p.operationId}` };
      }
      requests += 1;
      const t0 = interval ? due : performance.now();
      due += interval;
      try {
        const res = await send(port, 'POST', '/api/floor/logs', body, cookie);
        const ms = performance.now() - t0;
        latencies.push(ms);
        if (process.env.BENCH_DEBUG && ms > Number(process.env.BENCH_SLOW_MS ?? 200)) console.error('slow', o.rate ? 'paced' : 'closed', c, retry, Math.round(t0 - started), Math.round(ms));
        if (res.status === 201) {
          const id = JSON.parse(res.body).log.id as number;
          const key = String(body.idempotencyKey);
          if (acked.has(key)) {
            replays += 1;
            if (acked.get(key) !== id) errors += 1;
          } else {
            acked.set(key, id);
            mine.push(key);
          }
        } else {
          errors += 1;
          if (errors <= 3 && process.env.BENCH_DEBUG) console.error(res.status, res.body.slice(0, 200));
        }
      } catch (e) {
        errors += 1;
        if (errors <= 3 && process.env.BENCH_DEBUG) console.error(e);
      }
    }
  }
  await Promise.all(Array.from({ length: o.concurrency }, (_, c) => client(c)));
  const elapsed = (performance.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  return { acked, requests, replays, errors, rps: requests / elapsed, p50: pct(latencies, 50), p99: pct(latencies, 99) };
}

interface Row { id: number; k: string; b: number; o: number }
const COMPARE_SQL =
  'SELECT w.id, w."idempotencyKey" AS k, w."bundleId" AS b, w."operationId" AS o FROM work_logs w JOIN bundles u ON u.id = w."bundleId" WHERE u."batchId" = ';

/** The work logs the database holds for a batch, read straight from it (not through the server). */
async function storedLogs(target: string, batchId: number): Promise<Row[]> {
  if (target.startsWith('postgres')) {
    const client = new pg.Client({ connectionString: target });
    await client.connect();
    try {
      return (await client.query(`${COMPARE_SQL}$1`, [batchId])).rows as Row[];
    } finally {
      await client.end();
    }
  }
  const db = new Database(target, { readonly: true });
  try {
    return db.prepare(`${COMPARE_SQL}?`).all(batchId) as Row[];
  } finally {
    db.close();
  }
}

/** `lost` = acknowledged logs the database does not hold as answered; `doubled` = rows beyond one per bundle operation, or rows no acknowledgement accounts for. */
async function compare(target: string, batchId: number, acked: Map<string, number>) {
  const rows = await storedLogs(target, batchId);
  const byKey = new Map(rows.map((r) => [r.k, Number(r.id)]));
  let lost = 0;
  for (const [k, id] of acked) if (byKey.get(k) !== id) lost += 1;
  const distinctOps = new Set(rows.map((r) => `${r.b}:${r.o}`)).size;
  const unaccounted = rows.filter((r) => !acked.has(r.k)).length;
  return { lost, doubled: rows.length - distinctOps + unaccounted };
}

/** A new, empty PostgreSQL database on the server of `admin` (whose user may create databases). */
async function freshPostgres(admin: string) {
  const name = `seamrun_bench_${Date.now().toString(36)}`;
  const url = await createPostgresDatabase(admin, name);
  return {
    url,
    async drop() {
      const c = new pg.Client({ connectionString: admin });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await c.end();
    },
  };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'seamrun-bench-'));
  const postgres = POSTGRES_ADMIN_URL ? await freshPostgres(POSTGRES_ADMIN_URL) : null;
  const target = postgres?.url ?? join(dir, 'bench.sqlite');
  const profile = [...(process.env.BENCH_PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_PROFILE}`] : []), ...(process.env.BENCH_SERVER_FLAGS?.split(' ').filter(Boolean) ?? [])];
  const child = spawn(process.execPath, [...process.execArgv, ...profile, fileURLToPath(import.meta.url), '--serve', target], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: { ...process.env, SCRYPT_LOG_N: '10', DATABASE_URL: postgres?.url ?? '' },
  });
  try {
    const info = await new Promise<{ port: number; batches: number[]; ops: number[] }>((resolve, reject) => {
      let buf = '';
      child.stdout.on('data', (c: Buffer) => {
        buf += c.toString();
        const lines = buf.split('\n');
        buf = lines.pop() ?? '';
        for (const line of lines) {
          if (line.startsWith('{"ready"')) resolve(JSON.parse(line));
          else if (process.env.BENCH_DEBUG) console.error(`server: ${line}`);
        }
      });
      child.on('exit', (code) => reject(new Error(`server exited ${code}`)));
    });
    const emails = Array.from({ length: 6 }, (_, i) => `machinist${i + 1}@tamarind.example`);
    const cookies = await Promise.all(emails.map((e) => signIn(info.port, e)));
    const warm = info.batches[0];
    // Warm up (JIT, caches, the garbage the seed left) at the lowest level for WARMUP_SECONDS, unmeasured.
    await drive(info.port, cookies, warm, info.ops, { concurrency: LEVELS[0], seconds: WARMUP_SECONDS });
    const database = postgres ? 'postgresql' : 'sqlite';
    let b = 1;
    for (const concurrency of LEVELS) {
      for (const mode of MODES) {
        // Every client opens its connection before the clock starts: a level measures logging, not TCP set-up.
        await drive(info.port, cookies, warm, info.ops, { concurrency, seconds: 30, maxRequests: 2 * concurrency });
        const batchId = info.batches[b++];
        const rate = mode === 'paced' ? PACED_RATE : undefined;
        const cpu0 = cpuMs(child.pid);
        const client0 = process.cpuUsage();
        const r = await drive(info.port, cookies, batchId, info.ops, { concurrency, seconds: SECONDS_PER_LEVEL, rate });
        const cpu1 = cpuMs(child.pid);
        const client1 = process.cpuUsage(client0);
        const clientCpuMsPerLog = Number(((client1.user + client1.system) / 1000 / r.requests).toFixed(3));
        const serverCpuMsPerLog = cpu0 === null || cpu1 === null ? null : Number(((cpu1 - cpu0) / r.requests).toFixed(3));
        const { lost, doubled } = await compare(target, batchId, r.acked);
        console.log(JSON.stringify({ database, mode, concurrency, ...(rate ? { offered: rate } : {}), requests: r.requests, rps: Math.round(r.rps), p50: Number(r.p50.toFixed(2)), p99: Number(r.p99.toFixed(2)), errors: r.errors, lost, doubled, replays: r.replays, serverCpuMsPerLog, clientCpuMsPerLog }));
      }
    }
  } finally {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
    agent.destroy();
    await postgres?.drop();
    rmSync(dir, { recursive: true, force: true });
  }
}

/** BENCH_DEBUG: print this process's garbage-collection pauses over 5 ms, to tell a server stall from a client one. */
function watchPauses(who: string) {
  if (!process.env.BENCH_DEBUG) return;
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) if (e.duration > 5) console.error(`gc ${who} ${(e as unknown as { detail?: { kind?: number } }).detail?.kind} ${e.duration.toFixed(1)} ms`);
  }).observe({ entryTypes: ['gc'] });
}

watchPauses(process.argv[2] === '--serve' ? 'server' : 'client');
if (process.argv[2] === '--serve') await serve(process.argv[3]);
else await main();
