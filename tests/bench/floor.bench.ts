/**
 * Floor logging under load: `npm run bench:floor`.
 *
 * Starts the real server (migrations + demo seed; NODE_ENV=test so no demo markers are nested in the
 * background during the run) in a child process on loopback with a temporary file
 * database, adds a bench style with 8 operations and one batch of 1500 bundles per concurrency level, signs
 * in the six demo machinists, then drives POST /api/floor/logs over keep-alive HTTP with 20 and then 100
 * concurrent clients, each log a distinct bundle operation. One request in 20 re-sends an already answered
 * idempotency key (a phone retrying), which must replay, not double. Afterwards the acknowledged logs are
 * compared with the database: `lost` = acknowledged keys missing from it, `doubled` = rows beyond one per
 * bundle operation or rows no acknowledgement accounts for. Prints one JSON object per level.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import http from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';

const LEVELS = (process.env.BENCH_LEVELS ?? "20,100").split(",").map(Number);
const BUNDLES_PER_LEVEL = 1500;
const OPS = 8;
const SECONDS_PER_LEVEL = Number(process.env.BENCH_SECONDS ?? 6);
const WARMUP = 300;

async function serve(dbPath: string) {
  const { startServer } = await import('../../server/index');
  const { BatchEntity, BundleEntity, OperationEntity, StyleEntity } = await import('../../server/entities');
  const { port, ds } = await startServer({
    PORT: '0', HOST: '127.0.0.1', NODE_ENV: 'test', DATABASE_PATH: dbPath, LOGIN_RATE_LIMIT: '10000',
    NESTING_SECONDS: '1', LOCAL_SMTP_PORT: '0', LOCAL_PAYMENTS_PORT: '0',
  });
  const style = await ds.getRepository(StyleEntity).save({ studioId: 1, code: 'BENCH-1', name: 'Bench tee', description: '', sizeRun: ['M'], baseSize: 'M', status: 'approved' });
  await ds.getRepository(OperationEntity).save(
    Array.from({ length: OPS }, (_, i) => ({ studioId: 1, styleId: style.id, seq: i + 1, code: `OP${String(i + 1).padStart(2, '0')}`, name: `Bench operation ${i + 1}`, section: 'sewing' as const, machineType: 'lockstitch', sam: 0.5, predecessors: i ? [`OP${String(i).padStart(2, '0')}`] : [], pieceRateMinor: 500 })),
  );
  const batches: number[] = [];
  for (let l = 0; l < LEVELS.length + 1; l++) {
    const batch = await ds.getRepository(BatchEntity).save({ studioId: 1, styleId: style.id, quantities: { M: BUNDLES_PER_LEVEL * 10 }, dueDate: '2030-01-01', status: 'sewing', notes: 'bench' });
    batches.push(batch.id);
    const rows = Array.from({ length: BUNDLES_PER_LEVEL }, (_, i) => ({ studioId: 1, batchId: batch.id, layId: 0, number: i + 1, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }));
    for (let i = 0; i < rows.length; i += 300) await ds.getRepository(BundleEntity).insert(rows.slice(i, i + 300));
  }
  const ops = (await ds.getRepository(OperationEntity).findBy({ styleId: style.id })).map((o) => o.id);
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

async function drive(port: number, cookies: string[], batchId: number, ops: number[], concurrency: number, seconds: number, maxRequests = Infinity) {
  const pairs: { bundleNumber: number; operationId: number }[] = [];
  for (const operationId of ops) for (let n = 1; n <= BUNDLES_PER_LEVEL; n++) pairs.push({ bundleNumber: n, operationId });
  let next = 0;
  const acked = new Map<string, number>();
  const latencies: number[] = [];
  let errors = 0, replays = 0, requests = 0;
  const deadline = Date.now() + seconds * 1000;
  const started = process.hrtime.bigint();
  async function client(c: number) {
    const cookie = cookies[c % cookies.length];
    // A phone retries only its own logs, under its own sign-in.
    const mine: string[] = [];
    while (Date.now() < deadline && requests < maxRequests) {
      const retry = requests % 20 === 19 && mine.length > 0;
      let body: Record<string, unknown>;
      if (retry) {
        const key = mine[(requests * 7919) % mine.length];
        const [, b, o] = key.split(':');
        body = { batchId, bundleNumber: Number(b), operationId: Number(o), idempotencyKey: key };
      } else {
        if (next >= pairs.length) break;
        const p = pairs[next++];
        body = { batchId, ...p, idempotencyKey: `bench-${batchId}:${p.bundleNumber}:${p.operationId}` };
      }
      requests += 1;
      const t0 = process.hrtime.bigint();
      try {
        const res = await send(port, 'POST', '/api/floor/logs', body, cookie);
        latencies.push(Number(process.hrtime.bigint() - t0) / 1e6);
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
  await Promise.all(Array.from({ length: concurrency }, (_, c) => client(c)));
  const elapsed = Number(process.hrtime.bigint() - started) / 1e9;
  latencies.sort((a, b) => a - b);
  return { acked, requests, replays, errors, rps: requests / elapsed, p50: pct(latencies, 50), p99: pct(latencies, 99) };
}

function compare(dbPath: string, batchId: number, acked: Map<string, number>) {
  const db = new Database(dbPath, { readonly: true });
  const rows = db
    .prepare('SELECT w.id, w.idempotencyKey AS k, w.bundleId AS b, w.operationId AS o FROM work_logs w JOIN bundles u ON u.id = w.bundleId WHERE u.batchId = ?')
    .all(batchId) as { id: number; k: string; b: number; o: number }[];
  db.close();
  const byKey = new Map(rows.map((r) => [r.k, r.id]));
  let lost = 0;
  for (const [k, id] of acked) if (byKey.get(k) !== id) lost += 1;
  const distinctOps = new Set(rows.map((r) => `${r.b}:${r.o}`)).size;
  const unaccounted = rows.filter((r) => !acked.has(r.k)).length;
  return { lost, doubled: rows.length - distinctOps + unaccounted };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'seamrun-bench-'));
  const dbPath = join(dir, 'bench.sqlite');
  const child = spawn(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), '--serve', dbPath], { stdio: ['ignore', 'pipe', 'inherit'], env: { ...process.env, SCRYPT_LOG_N: '10' } });
  try {
    const info = await new Promise<{ port: number; batches: number[]; ops: number[] }>((resolve, reject) => {
      let buf = '';
      child.stdout.on('data', (c: Buffer) => {
        buf += c.toString();
        for (const line of buf.split('\n')) if (line.startsWith('{"ready"')) resolve(JSON.parse(line));
      });
      child.on('exit', (code) => reject(new Error(`server exited ${code}`)));
    });
    const emails = Array.from({ length: 6 }, (_, i) => `machinist${i + 1}@tamarind.example`);
    const cookies = await Promise.all(emails.map((e) => signIn(info.port, e)));
    await drive(info.port, cookies, info.batches[0], info.ops, 10, 30, WARMUP);
    const results = [];
    for (const [i, concurrency] of LEVELS.entries()) {
      const batchId = info.batches[i + 1];
      const r = await drive(info.port, cookies, batchId, info.ops, concurrency, SECONDS_PER_LEVEL);
      const { lost, doubled } = compare(dbPath, batchId, r.acked);
      results.push({ concurrency, requests: r.requests, rps: Math.round(r.rps), p50: Number(r.p50.toFixed(2)), p99: Number(r.p99.toFixed(2)), errors: r.errors, lost, doubled, replays: r.replays });
    }
    for (const r of results) console.log(JSON.stringify(r));
  } finally {
    child.kill('SIGTERM');
    agent.destroy();
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[2] === '--serve') await serve(process.argv[3]);
else await main();
