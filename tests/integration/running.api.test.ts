import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createDataSource, openDatabase, PendingMigrationsError } from '../../server/db/data-source';
import { loadEnv } from '../../server/env';
import { createLogger } from '../../server/observability/logger';
import { seedDemoStudio } from '../../server/seed/demo-studio';
import { freshDatabaseTarget, isPostgresRun } from '../fixtures/fresh-database';
import { DEMO, DEMO_PASSWORD, TEST_TODAY } from '../fixtures/test-app';

/** A built client in a temporary folder: index.html and one content-hashed asset, as Vite writes them. */
function fakeClient() {
  const dir = mkdtempSync(join(tmpdir(), 'seamrun-client-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Seamrun</title>');
  writeFileSync(join(dir, 'assets', 'index-Ab12Cd34.js'), 'console.log(1)');
  writeFileSync(join(dir, 'manifest.webmanifest'), '{}');
  return dir;
}

/** An app whose request log lines are collected as parsed JSON. */
async function appWithLog(clientDir = '/nonexistent') {
  const ds = await openDatabase(await freshDatabaseTarget());
  await seedDemoStudio(ds, { password: DEMO_PASSWORD, pinPrefix: '40', today: TEST_TODAY });
  const lines: Record<string, unknown>[] = [];
  const stream = new Writable({
    write(chunk, _enc, cb) {
      for (const l of String(chunk).split('\n').filter(Boolean)) lines.push(JSON.parse(l));
      cb();
    },
  });
  const env = loadEnv({ NODE_ENV: 'test', LOGIN_RATE_LIMIT: '1000' });
  const app = createApp({ ds, env, clientDir, logger: createLogger({ level: 'info', stream }) });
  return { app, ds, lines };
}

describe('running Seamrun for real', () => {
  it('serves hashed assets immutable for a year and index.html no-cache, the SPA fallback included', async () => {
    const { app } = await appWithLog(fakeClient());
    const asset = await request(app).get('/assets/index-Ab12Cd34.js');
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const index = await request(app).get('/index.html');
    expect(index.headers['cache-control']).toBe('no-cache');
    const fallback = await request(app).get('/batches/12');
    expect(fallback.status).toBe(200);
    expect(fallback.headers['cache-control']).toBe('no-cache');
    const manifest = await request(app).get('/manifest.webmanifest');
    expect(manifest.headers['cache-control']).toBe('public, max-age=3600');
  });

  it('writes one JSON line per request with its id, studio, person, status and time, and no password', async () => {
    const { app, lines } = await appWithLog();
    const agent = request.agent(app);
    const login = await agent.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
    expect(login.status).toBe(200);
    const me = await agent.get('/api/auth/me');
    const id = me.headers['x-request-id'];
    expect(id).toMatch(/^[0-9a-f-]{36}$/);
    const line = lines.find((l) => (l.req as { id: string } | undefined)?.id === id)!;
    expect(line).toMatchObject({
      level: 30,
      req: { method: 'GET', path: '/api/auth/me' },
      res: { status: 200 },
      studioId: login.body.user.studioId ?? expect.any(Number),
      personId: login.body.user.id,
    });
    expect(typeof line.responseTime).toBe('number');
    const all = JSON.stringify(lines);
    expect(all).not.toContain(DEMO_PASSWORD);
    expect(all).not.toContain('seamrun.sid');
  });

  it('returns the request id in a header and in every error answer, keeping a sane id from the proxy', async () => {
    const { app } = await appWithLog();
    const missing = await request(app).get('/api/no-such-route').set('X-Request-Id', 'edge-7f3a9c21');
    expect(missing.status).toBe(404);
    expect(missing.headers['x-request-id']).toBe('edge-7f3a9c21');
    expect(missing.body.error.requestId).toBe('edge-7f3a9c21');
    const hostile = await request(app).get('/api/auth/me').set('X-Request-Id', 'spoofed id; "<script>');
    expect(hostile.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const bad = await request(app).post('/api/auth/login').send({ email: 'not-an-email' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.requestId).toBe(bad.headers['x-request-id']);
  });

  it('answers liveness and readiness without a session, readiness checking the database', async () => {
    const { app, ds } = await appWithLog();
    expect((await request(app).get('/api/health')).body).toEqual({ ok: true });
    const ready = await request(app).get('/api/health/ready');
    expect(ready.status).toBe(200);
    expect(ready.body).toMatchObject({ ready: true, database: { ok: true }, jobs: 'in-process' });
    await ds.destroy();
    const down = await request(app).get('/api/health/ready');
    expect(down.status).toBe(503);
    expect(down.body).toMatchObject({ ready: false, database: { ok: false } });
  });

  it.skipIf(isPostgresRun())('stops a start without migrate-on-start when migrations are pending, naming them', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'seamrun-pending-')), 'db.sqlite');
    const ds = createDataSource(file);
    await ds.initialize();
    await ds.runMigrations({ transaction: 'each' });
    const [last] = await ds.query('SELECT name FROM migrations ORDER BY id DESC LIMIT 1');
    await ds.destroy();
    // Pretend the database was last migrated by the previous release.
    const older = createDataSource(file);
    await older.initialize();
    await older.undoLastMigration({ transaction: 'each' });
    await older.destroy();

    await expect(openDatabase(file, { migrate: false })).rejects.toThrow(PendingMigrationsError);
    await expect(openDatabase(file, { migrate: false })).rejects.toThrow(last.name);
    const migrated = await openDatabase(file, { migrate: true });
    await migrated.destroy();
    const again = await openDatabase(file, { migrate: false });
    await again.destroy();
  });
});
