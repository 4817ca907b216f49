import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { addFreshBundles } from '../fixtures/fresh-bundles';

const dir = mkdtempSync(join(tmpdir(), 'seamrun-crash-'));
const dbPath = join(dir, 'crash.sqlite');
let child: ChildProcess | undefined;
afterAll(() => {
  child?.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

/** Start the real server in its own process and wait for its banner; resolves with its base URL. */
function startServerProcess(): Promise<{ proc: ChildProcess; base: string }> {
  return new Promise((resolve, reject) => {
    const proc = spawn(process.execPath, ['--import', 'tsx', 'server/dev.ts'], {
      env: {
        ...process.env,
        NODE_ENV: 'test',
        PORT: '0',
        HOST: '127.0.0.1',
        DATABASE_PATH: dbPath,
        SCRYPT_LOG_N: '10',
        LOGIN_RATE_LIMIT: '1000',
        LOCAL_SMTP_PORT: '0',
        LOCAL_PAYMENTS_PORT: '0',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${out}`)), 90_000);
    proc.stdout!.on('data', (d) => {
      out += String(d);
      const m = /running at (http:\/\/localhost:\d+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve({ proc, base: m[1].replace('localhost', '127.0.0.1') });
      }
    });
    proc.stderr!.on('data', (d) => (out += String(d)));
    proc.on('exit', (code) => reject(new Error(`server exited ${code}:\n${out}`)));
  });
}

async function signInByPin(base: string, email: string, pin: string) {
  const res = await fetch(`${base}/api/auth/pin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, pin }),
  });
  expect(res.status).toBe(200);
  return res.headers.get('set-cookie')!.split(';')[0];
}

// Reads the SQLite file after the crash; the PostgreSQL run relies on the server's own durability.
describe.skipIf(Boolean(process.env.TEST_DATABASE_URL))('fault: SIGKILL while bundle logs are written', () => {
  it('keeps every acknowledged log and passes the integrity check after a restart', async () => {
    const first = await startServerProcess();
    child = first.proc;
    const cookie = await signInByPin(first.base, 'machinist1@tamarind.example', '4011');
    const lookup = await fetch(`${first.base}/api/floor/bundles/lookup?number=1`, { headers: { cookie } });
    expect(lookup.status).toBe(200);
    const bundle = await lookup.json();
    const ops: { id: number }[] = (bundle.bundle ?? bundle).operations;
    // Fresh bundles of the demo batch, so every log below is a first log.
    const batchId = bundle.batchId ?? bundle.bundle?.batchId;
    const bundles = Array.from({ length: 10 }, (_, i) => 9000 + i);
    addFreshBundles(dbPath, batchId, bundles);
    const sewingOps = ops.filter((o) => (o as { section?: string }).section === 'sewing');

    const acknowledged: string[] = [];
    let sent = 0;
    const statuses: Record<number, number> = {};
    const send = async (bundleNumber: number, operationId: number) => {
      const idempotencyKey = `crash-${bundleNumber}-${operationId}`;
      sent++;
      try {
        const res = await fetch(`${first.base}/api/floor/logs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', cookie },
          body: JSON.stringify({ bundleNumber, batchId, operationId, idempotencyKey }),
        });
        statuses[res.status] = (statuses[res.status] ?? 0) + 1;
        if (res.status === 201 || res.status === 200) acknowledged.push(idempotencyKey);
      } catch {
        // the connection died with the server: not acknowledged, so not owed
      }
    };
    const jobs = bundles.flatMap((b) => sewingOps.map((o) => () => send(b, o.id)));
    const killAfter = Math.floor(jobs.length / 3);
    let killed = false;
    const runners = Array.from({ length: 8 }, async () => {
      while (jobs.length && !killed) {
        await jobs.shift()!();
        if (acknowledged.length >= killAfter && !killed) {
          killed = true;
          first.proc.kill('SIGKILL');
        }
      }
    });
    await Promise.all(runners);
    expect(killed, JSON.stringify({ statuses, ops: ops.length })).toBe(true);
    await new Promise((r) => first.proc.once('exit', r).once('close', r) && setTimeout(r, 500));

    const second = await startServerProcess();
    child = second.proc;
    second.proc.kill('SIGTERM');
    const db = new Database(dbPath, { readonly: true });
    const [check] = db.pragma('integrity_check') as { integrity_check: string }[];
    const keys = new Set(
      (db.prepare('SELECT idempotencyKey FROM work_logs').all() as { idempotencyKey: string }[]).map((r) => r.idempotencyKey),
    );
    db.close();
    expect(check.integrity_check).toBe('ok');
    const lost = acknowledged.filter((k) => !keys.has(k));
    console.log(JSON.stringify({ sent, acknowledged: acknowledged.length, stored: keys.size, lost: lost.length }));
    expect(lost).toEqual([]);
  });
});
