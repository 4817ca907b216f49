import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import Database from 'better-sqlite3';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { addFreshBundles } from '../fixtures/fresh-bundles';
import { createApp } from '../../server/app';
import { hasPgDump, takeBackupIfDue } from '../../server/db/backup-schedule';
import { openDatabase } from '../../server/db/data-source';
import { restoreDatabase } from '../../server/db/restore';
import { BundleEntity, OperationEntity } from '../../server/entities';
import { loadEnv } from '../../server/env';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { createPostgresDatabase, freshDatabaseTarget } from '../fixtures/fresh-database';
import { DEMO, DEMO_PASSWORD, signIn, TEST_TODAY } from '../fixtures/test-app';

const dir = mkdtempSync(join(tmpdir(), 'seamrun-drill-'));
const dbPath = join(dir, 'live.sqlite');
let child: ChildProcess | undefined;
afterAll(() => {
  child?.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

function startServerProcess(): Promise<string> {
  return new Promise((resolve, reject) => {
    const proc = spawn(process.execPath, ['--import', 'tsx', 'server/dev.ts'], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        PORT: '0',
        HOST: '127.0.0.1',
        DATABASE_PATH: dbPath,
        DATABASE_URL: '',
        SCRYPT_LOG_N: '10',
        LOGIN_RATE_LIMIT: '1000',
        LOCAL_SMTP_PORT: '0',
        LOCAL_PAYMENTS_PORT: '0',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child = proc;
    let out = '';
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${out}`)), 90_000);
    proc.stdout!.on('data', (d) => {
      out += String(d);
      const m = /running at (http:\/\/localhost:\d+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve(m[1].replace('localhost', '127.0.0.1'));
      }
    });
    proc.stderr!.on('data', (d) => (out += String(d)));
    proc.on('exit', (code) => reject(new Error(`server exited ${code}:\n${out}`)));
  });
}

type Row = Record<string, unknown>;

// The backup runs in this process on its own connection while the server process writes, as the
// schedule runs beside requests in production; the copy must still be one consistent moment.
describe.skipIf(Boolean(process.env.TEST_DATABASE_URL))('restore drill: a scheduled backup taken while floor logs are written', () => {
  it('restores into a new file that passes the integrity check and holds every log it has whole', async () => {
    const base = await startServerProcess();
    const login = await fetch(`${base}/api/auth/pin`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'machinist1@tamarind.example', pin: '4011' }),
    });
    expect(login.status).toBe(200);
    const cookie = login.headers.get('set-cookie')!.split(';')[0];
    const lookup = await (await fetch(`${base}/api/floor/bundles/lookup?number=1`, { headers: { cookie } })).json();
    const batchId: number = lookup.batchId ?? lookup.bundle?.batchId;
    const ops: { id: number; section?: string }[] = (lookup.bundle ?? lookup).operations;
    const sewingOps = ops.filter((o) => o.section !== 'finishing');

    // Fresh bundles, so every log below is a first log.
    const bundles = Array.from({ length: 12 }, (_, i) => 8000 + i);
    addFreshBundles(dbPath, batchId, bundles);

    const acknowledged = new Set<string>();
    const jobs = bundles.flatMap((b) => sewingOps.map((o) => ({ b, o: o.id })));
    let stop = false;
    let inFlight = 0;
    const writers = Array.from({ length: 6 }, async () => {
      while (jobs.length && !stop) {
        const { b, o } = jobs.shift()!;
        const idempotencyKey = `drill-${b}-${o}`;
        inFlight++;
        const res = await fetch(`${base}/api/floor/logs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', cookie },
          body: JSON.stringify({ bundleNumber: b, batchId, operationId: o, idempotencyKey }),
        }).finally(() => inFlight--);
        if (res.status === 201 || res.status === 200) acknowledged.add(idempotencyKey);
      }
    });
    while (acknowledged.size < 20) await new Promise((r) => setTimeout(r, 20));
    const before = new Set(acknowledged);
    const writingDuringBackup = inFlight;
    const plan = { database: dbPath, dir: join(dir, 'backups'), everyMs: 60 * 60 * 1000, keep: 3 };
    const backup = await takeBackupIfDue(plan);
    const after = new Set(acknowledged);
    stop = true;
    await Promise.all(writers);
    expect(backup).not.toBeNull();
    expect(writingDuringBackup, 'floor logs in flight when the backup began').toBeGreaterThan(0);

    const restoredPath = join(dir, 'restored.sqlite');
    await restoreDatabase(backup!, restoredPath);
    const restored = new Database(restoredPath, { readonly: true });
    const live = new Database(dbPath, { readonly: true });
    const [check] = restored.pragma('integrity_check') as { integrity_check: string }[];
    expect(check.integrity_check).toBe('ok');
    expect(restored.pragma('foreign_key_check')).toEqual([]);

    const logs = restored.prepare(`SELECT * FROM work_logs WHERE idempotencyKey LIKE 'drill-%' ORDER BY id`).all() as Row[];
    const keys = logs.map((l) => String(l.idempotencyKey));
    // Everything acknowledged before the copy began is in it; nothing in it was never acknowledged.
    expect([...before].filter((k) => !keys.includes(k))).toEqual([]);
    expect(keys.filter((k) => !acknowledged.has(k))).toEqual([]);
    // Each log in the copy is whole: the same row as in the live database, pointing at rows the copy holds.
    const liveRow = live.prepare('SELECT * FROM work_logs WHERE id = ?');
    const bundleIn = restored.prepare('SELECT id FROM bundles WHERE id = ?');
    const operationIn = restored.prepare('SELECT id FROM operations WHERE id = ?');
    const userIn = restored.prepare('SELECT id FROM users WHERE id = ?');
    for (const log of logs) {
      expect(log).toEqual(liveRow.get(log.id));
      expect(bundleIn.get(log.bundleId)).toBeDefined();
      expect(operationIn.get(log.operationId)).toBeDefined();
      expect(userIn.get(log.userId)).toBeDefined();
    }
    // The copy is a moment in time: the logs it holds are the first ones written, with no gap.
    const liveIds = (live.prepare(`SELECT id FROM work_logs WHERE idempotencyKey LIKE 'drill-%' ORDER BY id`).all() as { id: number }[]).map((r) => r.id);
    expect(logs.map((l) => l.id)).toEqual(liveIds.slice(0, logs.length));
    console.log(JSON.stringify({ inFlightAtStart: writingDuringBackup, acknowledgedBefore: before.size, inBackup: logs.length, acknowledgedAfter: after.size, total: acknowledged.size }));
    restored.close();
    live.close();
  }, 120_000);
});

const admin = process.env.TEST_DATABASE_URL;
describe.skipIf(!admin || !hasPgDump())('restore drill on PostgreSQL: a scheduled pg_dump taken while floor logs are written', () => {
  it('restores into a new database that holds every log acknowledged before the dump began, each one whole', async () => {
    const target = await freshDatabaseTarget();
    const ds = await openDatabase(target);
    await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
    const app = createApp({ ds, env: loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000' }), clientDir: '/nonexistent' });
    const machinist = await signIn(app, DEMO.machinist);
    const ops = (await ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } })).filter((o) => o.section !== 'finishing');
    const bundles = ds.getRepository(BundleEntity);
    const numbers = Array.from({ length: 12 }, (_, i) => 8000 + i);
    await bundles.save(numbers.map((number) => bundles.create({ studioId: 1, batchId: 1, layId: 0, number, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} })));

    const acknowledged = new Set<string>();
    const jobs = numbers.flatMap((b) => ops.map((o) => ({ b, o: o.id })));
    let stop = false;
    let inFlight = 0;
    const writers = Array.from({ length: 4 }, async () => {
      while (jobs.length && !stop) {
        const { b, o } = jobs.shift()!;
        const idempotencyKey = `drill-${b}-${o}`;
        inFlight++;
        const res = await Promise.resolve(machinist.post('/api/floor/logs').send({ bundleNumber: b, batchId: 1, operationId: o, idempotencyKey })).finally(() => inFlight--);
        if (res.status === 201 || res.status === 200) acknowledged.add(idempotencyKey);
      }
    });
    while (acknowledged.size < 20) await new Promise((r) => setTimeout(r, 20));
    const before = new Set(acknowledged);
    const writingDuringBackup = inFlight;
    const backup = await takeBackupIfDue({ database: target, dir: join(dir, 'pg-backups'), everyMs: 60 * 60 * 1000, keep: 3 });
    stop = true;
    await Promise.all(writers);
    expect(backup).toMatch(/\.dump$/);
    expect(writingDuringBackup, 'floor logs in flight when the backup began').toBeGreaterThan(0);

    const restoredUrl = await createPostgresDatabase(admin!, `seamrun_r_${Date.now()}`);
    await promisify(execFile)('pg_restore', ['--no-owner', `--dbname=${restoredUrl}`, backup!]);
    const restored = new pg.Client({ connectionString: restoredUrl });
    const live = new pg.Client({ connectionString: target });
    await Promise.all([restored.connect(), live.connect()]);
    const q = `SELECT * FROM work_logs WHERE "idempotencyKey" LIKE 'drill-%' ORDER BY id`;
    const logs = (await restored.query(q)).rows as Row[];
    const liveLogs = (await live.query(q)).rows as Row[];
    const keys = logs.map((l) => String(l.idempotencyKey));
    expect([...before].filter((k) => !keys.includes(k))).toEqual([]);
    expect(keys.filter((k) => !acknowledged.has(k))).toEqual([]);
    const liveById = new Map(liveLogs.map((l) => [l.id, l]));
    for (const log of logs) expect(log).toEqual(liveById.get(log.id));
    const orphans = await restored.query(
      `SELECT w.id FROM work_logs w LEFT JOIN bundles b ON b.id = w."bundleId" LEFT JOIN operations o ON o.id = w."operationId" LEFT JOIN users u ON u.id = w."userId" WHERE b.id IS NULL OR o.id IS NULL OR u.id IS NULL`,
    );
    expect(orphans.rows).toEqual([]);
    console.log(JSON.stringify({ inFlightAtStart: writingDuringBackup, acknowledgedBefore: before.size, inBackup: logs.length, total: acknowledged.size }));
    await Promise.all([restored.end(), live.end()]);
    await ds.destroy();
  }, 120_000);
});

