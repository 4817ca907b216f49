import request from 'supertest';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { startSessionPurge } from '../../server/auth/session-purge';
import { openDatabase } from '../../server/db/data-source';
import { loadEnv } from '../../server/env';
import { startServer } from '../../server/index';
import { createSessionRepository } from '../../server/modules/sessions/session.repository';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { freshDatabaseTarget } from '../fixtures/fresh-database';

afterEach(() => {
  vi.useRealTimers();
});

describe('production start', () => {
  it('refuses to start with NODE_ENV=production on the built-in session secret', async () => {
    expect(() => loadEnv({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET: the built-in development secret is refused/);
    await expect(startServer({ NODE_ENV: 'production', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: ':memory:', SESSION_SECRET: undefined })).rejects.toThrow(/SESSION_SECRET/);
  });

  it('does not seed the demo studio in production unless SEED_DEMO=true asks for it', () => {
    const secret = 'a-long-random-production-secret';
    expect(loadEnv({ NODE_ENV: 'production', SESSION_SECRET: secret }).SEED_DEMO).toBe(false);
    expect(loadEnv({ NODE_ENV: 'production', SESSION_SECRET: secret, SEED_DEMO: 'true' }).SEED_DEMO).toBe(true);
    expect(loadEnv({ NODE_ENV: 'development' }).SEED_DEMO).toBe(true);
    expect(loadEnv({ NODE_ENV: 'development', SEED_DEMO: 'false' }).SEED_DEMO).toBe(false);
  });

  it('starts empty in production with its own secret and no SEED_DEMO', async () => {
    const s = await startServer({
      // Production migrates as its own step; a fresh in-memory database asks for it at start.
      NODE_ENV: 'production', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: ':memory:', SEED_DEMO: undefined, MIGRATE_ON_START: 'true',
      SESSION_SECRET: 'a-long-random-production-secret', LOCAL_SMTP_PORT: '0', LOCAL_PAYMENTS_PORT: '0',
    });
    try {
      expect(s.seeded).toBe(false);
      const res = await request(s.server).post('/api/auth/login').send({ email: DEMO.owner, password: 'seamrun-demo' });
      expect(res.status).toBe(401);
    } finally {
      await s.stop();
    }
  });
});

describe('expired sessions', () => {
  it('are deleted at start and again on each interval, live ones kept', async () => {
    const ds = await openDatabase(await freshDatabaseTarget());
    const sessions = createSessionRepository(ds);
    let clock = 1_000_000;
    await sessions.save('old', '{}', clock - 1);
    await sessions.save('live', '{}', clock + 10_000);
    const count = async () => (await ds.query('SELECT "id" FROM "sessions" ORDER BY "id"')).map((r: { id: string }) => r.id);
    vi.useFakeTimers();
    const purge = await startSessionPurge(sessions, { everyMs: 60_000, now: () => clock });
    expect(await count()).toEqual(['live']);
    clock += 20_000;
    await vi.advanceTimersByTimeAsync(60_000);
    // The interval's delete is real I/O on PostgreSQL: wait for it with real timers.
    vi.useRealTimers();
    await expect.poll(count).toEqual([]);
    purge.stop();
    await ds.destroy();
  });
});

describe('temporary password', () => {
  it('must be replaced by a different password, after which the temporary one no longer signs in', async () => {
    const { app } = await buildTestApp();
    const owner = await signIn(app, DEMO.owner);
    const temporary = 'handed-over-123';
    const made = await owner.post('/api/users').send({ name: 'New Cutter', email: 'newcutter@tamarind.example', role: 'cutter', temporaryPassword: temporary });
    expect(made.status).toBe(201);
    const person = await signIn(app, 'newcutter@tamarind.example', temporary);
    expect((await person.get('/api/batches')).body.error.code).toBe('password_change_required');

    const same = await person.post('/api/auth/password').send({ currentPassword: temporary, newPassword: temporary });
    expect(same.status).toBe(400);
    expect(same.body.error.fields.newPassword).toMatch(/differ/);
    expect((await person.get('/api/batches')).body.error.code).toBe('password_change_required');

    const changed = await person.post('/api/auth/password').send({ currentPassword: temporary, newPassword: 'my-own-secret-42' });
    expect(changed.status).toBe(200);
    expect(changed.body.user.mustChangePassword).toBe(false);
    expect((await person.get('/api/batches')).status).toBe(200);
    expect((await request(app).post('/api/auth/login').send({ email: 'newcutter@tamarind.example', password: temporary })).status).toBe(401);
    await signIn(app, 'newcutter@tamarind.example', 'my-own-secret-42');
  });

  it('is not asked of a machinist signed in with their floor PIN, but still of the same person on the password form', async () => {
    const { app } = await buildTestApp();
    const owner = await signIn(app, DEMO.owner);
    const made = await owner.post('/api/users').send({ name: 'New Machinist', email: 'newmachinist@tamarind.example', role: 'machinist', temporaryPassword: 'handed-over-456', pin: '8642' });
    expect(made.status).toBe(201);
    const floor = request.agent(app);
    expect((await floor.post('/api/auth/pin').send({ email: 'newmachinist@tamarind.example', pin: '8642' })).status).toBe(200);
    expect((await floor.get('/api/auth/me')).body.user.mustChangePassword).toBe(false);
    expect((await floor.get('/api/floor/me/today')).status).toBe(200);
    const desk = await signIn(app, 'newmachinist@tamarind.example', 'handed-over-456');
    expect((await desk.get('/api/auth/me')).body.user.mustChangePassword).toBe(true);
    expect((await desk.get('/api/floor/me/today')).body.error.code).toBe('password_change_required');
  });
});
